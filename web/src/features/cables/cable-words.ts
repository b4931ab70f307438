import type { ConductorColour, WiremapFault } from '@wiretrail/core';

export const MEDIUM_WORDS: Record<string, string> = {
  Cat5e: 'Cat5e', Cat6: 'Cat6', Cat6A: 'Cat6A', coax: 'Coax', speaker: 'Speaker cable', HDMI: 'HDMI', fibre: 'Fibre', other: 'Other',
};
export const CABLE_STATUS_WORDS: Record<string, string> = {
  unidentified: 'Not yet identified', traced: 'Traced', terminated: 'Terminated', tested: 'Tested',
};
export const cableStatusWords = (status: string | null) => (status ? (CABLE_STATUS_WORDS[status] ?? status) : '—');
export const TRACE_METHOD_WORDS: Record<string, string> = {
  'tone-and-probe': 'Tone and probe', continuity: 'Continuity tester', tdr: 'TDR', visual: 'Seen end to end',
};
export const LINK_KIND_WORDS: Record<string, string> = { 'permanent-link': 'Permanent link (≤ 90 m)', channel: 'Channel, with cords (≤ 100 m)' };
/** Offered as suggestions; anything else may be typed. */
export const TERMINATIONS = ['Keystone jack', 'Faceplate module', 'Patch panel port', 'RJ45 plug', 'Surface box', 'F connector', 'Binding post'];

export const COLOUR_WORDS: Record<ConductorColour, string> = {
  'white-orange': 'white/orange', orange: 'orange', 'white-green': 'white/green', green: 'green',
  'white-blue': 'white/blue', blue: 'blue', 'white-brown': 'white/brown', brown: 'brown',
};
export const colourWords = (c: ConductorColour | null) => (c ? COLOUR_WORDS[c] : 'no conductor');

export const FAULT_WORDS: Record<WiremapFault['kind'], string> = {
  open: 'Open', short: 'Short', reversed: 'Reversed pair', crossed: 'Crossed pairs', split: 'Split pair', miswired: 'Miswired',
};

/** "Crossed pairs, pins 1, 2, 3, 6 (near end)". */
export function faultWords(f: WiremapFault): string {
  return `${FAULT_WORDS[f.kind] ?? f.kind}, pin${f.pins.length === 1 ? '' : 's'} ${f.pins.join(', ')}${f.end ? ` (${f.end} end)` : ''}`;
}
