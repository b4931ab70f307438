import { WALL_LIMITS } from '@wiretrail/core';
import { parseReading } from '@/lib/readings';

/** The figures typed about the wall and the cable in it, each with its own field message. */
export type WallFigure = 'widthMm' | 'heightMm' | 'thicknessMm' | 'depthMm';

export const WALL_FIGURE_LABELS: Readonly<Record<WallFigure, string>> = {
  widthMm: 'Wall width',
  heightMm: 'Wall height',
  thicknessMm: 'Wall thickness',
  depthMm: 'Cable depth',
};

/** What the other figures and the drawing already say, against which a typed figure is judged. */
export interface WallSoFar {
  readonly thicknessMm: number | null;
  readonly depthMm: number;
  /** The furthest the point or the route reaches along and up the wall (mm). */
  readonly reachMm: { readonly x: number; readonly y: number };
}

/**
 * Why a typed figure cannot stand, or null when it can: never dropped in silence. Bounds are core's WALL_LIMITS, the
 * same the safe-zone check refuses beyond.
 */
export function wallFigureProblem(field: WallFigure, text: string, soFar: WallSoFar): string | null {
  const label = WALL_FIGURE_LABELS[field];
  const value = parseReading(text);
  if (value === null) {
    if (field === 'thicknessMm') return null;
    return field === 'depthMm' ? 'Enter how deep the cable is below this face of the wall.' : `Enter the ${label.toLowerCase()}.`;
  }
  if (Number.isNaN(value)) return `${label} must be a number of millimetres, like ${field === 'depthMm' ? 25 : field === 'thicknessMm' ? 100 : 2400}.`;
  if (value < 0) return `${label} cannot be negative.`;
  const { min, max } = WALL_LIMITS[field];
  if (value < min) return `${label} must be at least ${min} mm.`;
  if (value > max) return `${label} above ${max} mm is not a real ${field === 'depthMm' ? 'depth' : 'wall'}; check the figure.`;
  if (field === 'depthMm' && soFar.thicknessMm !== null && value > soFar.thicknessMm) return `The cable cannot be deeper than the ${soFar.thicknessMm} mm wall.`;
  if (field === 'thicknessMm' && value < soFar.depthMm) return `The wall cannot be thinner than the ${soFar.depthMm} mm the cable is deep.`;
  if (field === 'widthMm' && value < soFar.reachMm.x) return `The point and route reach ${soFar.reachMm.x} mm along: undo them first to make the wall narrower.`;
  if (field === 'heightMm' && value < soFar.reachMm.y) return `The point and route reach ${soFar.reachMm.y} mm up: undo them first to make the wall lower.`;
  return null;
}
