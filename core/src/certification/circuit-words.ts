/**
 * How a circuit's kind and protective device are named on every screen: the phone's circuit details, the office's
 * circuit editing and its list of a site's circuits all read these, so a fuse is never called two things.
 */
import { CIRCUIT_KINDS, PROTECTIVE_DEVICES } from '../sync/entities.js';

export const CIRCUIT_KIND_WORDS: Readonly<Record<(typeof CIRCUIT_KINDS)[number], string>> = {
  ring: 'Ring final',
  radial: 'Radial',
  lighting: 'Lighting',
  other: 'Other',
};

export const PROTECTIVE_DEVICE_WORDS: Readonly<Record<(typeof PROTECTIVE_DEVICES)[number], string>> = {
  B: 'Type B circuit-breaker',
  C: 'Type C circuit-breaker',
  D: 'Type D circuit-breaker',
  'BS 88-2': 'BS 88-2 fuse',
  'BS 88-3': 'BS 88-3 fuse',
  'BS 3036': 'BS 3036 semi-enclosed fuse',
  'BS 1362': 'BS 1362 cartridge fuse',
};

const isKind = (kind: string): kind is (typeof CIRCUIT_KINDS)[number] => (CIRCUIT_KINDS as readonly string[]).includes(kind);

/** "Ring final"; a kind an older version recorded is shown as it was written, and none as a dash. */
export function circuitKindWords(kind: string | null | undefined): string {
  if (!kind) return '—';
  return isKind(kind) ? CIRCUIT_KIND_WORDS[kind] : kind;
}

/** "Type B 32 A", "BS 88-3 30 A": the device with its rating, a question mark where the rating is not recorded. */
export function deviceAndRating(circuit: { readonly deviceType?: string | null; readonly deviceRatingA?: number | null }): string {
  const { deviceType, deviceRatingA } = circuit;
  if (!deviceType) return '—';
  return `${/^[BCD]$/.test(deviceType) ? `Type ${deviceType}` : deviceType} ${deviceRatingA ?? '?'} A`;
}
