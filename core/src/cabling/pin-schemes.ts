/**
 * T568A and T568B: which conductor colour lands on each pin of an 8-position modular jack or plug.
 */

export type ConductorColour =
  | 'white-orange'
  | 'orange'
  | 'white-green'
  | 'green'
  | 'white-blue'
  | 'blue'
  | 'white-brown'
  | 'brown';

export type PinScheme = 'T568A' | 'T568B';

/** Eight colours, for pins 1 to 8. */
export type PinMap = readonly [
  ConductorColour,
  ConductorColour,
  ConductorColour,
  ConductorColour,
  ConductorColour,
  ConductorColour,
  ConductorColour,
  ConductorColour,
];

export const CONDUCTOR_COLOURS: readonly ConductorColour[] = [
  'white-blue',
  'blue',
  'white-orange',
  'orange',
  'white-green',
  'green',
  'white-brown',
  'brown',
];

/** ANSI/TIA-568 T568A, pins 1–8. */
export const T568A: PinMap = Object.freeze([
  'white-green',
  'green',
  'white-orange',
  'blue',
  'white-blue',
  'orange',
  'white-brown',
  'brown',
] as const);

/** ANSI/TIA-568 T568B, pins 1–8: T568A with the orange and green pairs swapped. */
export const T568B: PinMap = Object.freeze([
  'white-orange',
  'orange',
  'white-green',
  'blue',
  'white-blue',
  'green',
  'white-brown',
  'brown',
] as const);

export const PIN_SCHEMES: Readonly<Record<PinScheme, PinMap>> = Object.freeze({ T568A, T568B });

/** The pins that carry one signal, as pairs of pin numbers. */
export const SIGNAL_PAIRS: readonly (readonly [number, number])[] = Object.freeze([
  [1, 2],
  [3, 6],
  [4, 5],
  [7, 8],
] as const);

/** Twisted pair numbers by colour: 1 blue, 2 orange, 3 green, 4 brown. */
export function twistedPairOf(colour: ConductorColour): 1 | 2 | 3 | 4 {
  switch (colour) {
    case 'white-blue':
    case 'blue':
      return 1;
    case 'white-orange':
    case 'orange':
      return 2;
    case 'white-green':
    case 'green':
      return 3;
    case 'white-brown':
    case 'brown':
      return 4;
  }
}

export function isConductorColour(value: unknown): value is ConductorColour {
  return typeof value === 'string' && (CONDUCTOR_COLOURS as readonly string[]).includes(value);
}
