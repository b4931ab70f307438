import { CIRCUIT_KINDS, PROTECTIVE_DEVICES } from '@wiretrail/core';

export const CIRCUIT_KIND_WORDS: Record<(typeof CIRCUIT_KINDS)[number], string> = {
  ring: 'Ring final',
  radial: 'Radial',
  lighting: 'Lighting',
  other: 'Other',
};

export const DEVICE_WORDS: Record<(typeof PROTECTIVE_DEVICES)[number], string> = {
  B: 'Type B circuit-breaker',
  C: 'Type C circuit-breaker',
  D: 'Type D circuit-breaker',
  'BS 88-2': 'BS 88-2 fuse',
  'BS 88-3': 'BS 88-3 fuse',
  'BS 3036': 'BS 3036 semi-enclosed fuse',
  'BS 1362': 'BS 1362 cartridge fuse',
};

export const kindWords = (kind: string | null) => (kind ? (CIRCUIT_KIND_WORDS[kind as keyof typeof CIRCUIT_KIND_WORDS] ?? kind) : '—');

/** "Type B 32 A", "BS 88-3 30 A". */
export function deviceWords(c: { deviceType: string | null; deviceRatingA: number | null }): string {
  if (!c.deviceType) return '—';
  return /^[BCD]$/.test(c.deviceType) ? `Type ${c.deviceType} ${c.deviceRatingA ?? '?'} A` : `${c.deviceType} ${c.deviceRatingA ?? '?'} A`;
}
