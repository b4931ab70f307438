export const ACTION_WORDS: Record<string, string> = { add: 'New point', move: 'Moved', remove: 'Taken out', replace: 'Replaced' };
export const CONNECTION_WORDS: Record<string, string> = {
  'ring-extension': 'Ring extended through it',
  'unfused-spur': 'Unfused spur',
  'fused-spur': 'Fused spur (fused connection unit)',
  radial: 'On a radial',
};
/** Offered as suggestions; anything else may be typed. */
export const ACCESSORIES = [
  'Twin socket-outlet',
  'Single socket-outlet',
  'Twin socket-outlet with USB',
  'Switched fused connection unit',
  'Unswitched fused connection unit',
  'Cooker control unit',
  'Flex outlet plate',
  'Light switch',
  'Ceiling rose',
  'Junction box',
];

/** What the action moves: where the point was, where it is now. */
export const hasFrom = (action: string) => action === 'move' || action === 'remove' || action === 'replace';
export const hasTo = (action: string) => action !== 'remove';

/** A fixed appliance through a fused connection unit needs its load to choose the fuse. */
export const needsFuse = (connection: string, accessory: string) => connection === 'fused-spur' || /fused connection unit/i.test(accessory);

export const SUPPLIES_WORDS: Record<string, string> = {
  sockets: 'Socket-outlets',
  lighting: 'Lighting',
  shower: 'A shower',
  cooker: 'A cooker',
  'fixed-equipment': 'Fixed equipment',
  'outdoor-mobile': 'Equipment used outdoors',
};
export const LOCATION_WORDS: Record<string, string> = { indoors: 'Indoors', bathroom: 'A room with a bath or shower', outdoors: 'Outdoors' };

/** A first guess from the accessory, which the technician can change. */
export function suppliesOf(accessory: string): '' | 'sockets' | 'lighting' | 'fixed-equipment' {
  if (/socket/i.test(accessory)) return 'sockets';
  if (/light|ceiling rose/i.test(accessory)) return 'lighting';
  if (/connection unit|cooker|flex outlet/i.test(accessory)) return 'fixed-equipment';
  return '';
}
