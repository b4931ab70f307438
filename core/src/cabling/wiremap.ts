/**
 * Wiremap of a 4-pair cable from the conductor colours seen at each end's pins, plus what a tester found
 * (shorts, and opens in the middle of the cable that the colours cannot show).
 */
import { InvalidInputError, requireOneOf, type Verdict } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import {
  isConductorColour,
  PIN_SCHEMES,
  SIGNAL_PAIRS,
  twistedPairOf,
  type ConductorColour,
  type PinScheme,
} from './pin-schemes.js';

export type WiremapFaultKind = 'open' | 'short' | 'reversed' | 'crossed' | 'split' | 'miswired';

export type CableEnd = 'near' | 'far';

export interface WiremapFault {
  readonly kind: WiremapFaultKind;
  /** Pin numbers (1–8) involved, ascending. */
  readonly pins: readonly number[];
  /** The end that differs from the scheme, where only one does. */
  readonly end?: CableEnd;
  readonly note: string;
}

/** Colour at pins 1–8 of one end; null where the pin has no conductor. */
export type EndColours = readonly (ConductorColour | null)[];

export interface WiremapInput {
  readonly scheme: PinScheme;
  readonly nearEnd: EndColours;
  readonly farEnd: EndColours;
  /** Pairs of near-end pins the tester found shorted together. */
  readonly shorts?: readonly (readonly [number, number])[];
  /** Near-end pins with no continuity although both ends are terminated (a break along the cable). */
  readonly opens?: readonly number[];
}

export interface WiremapResult {
  readonly verdict: Verdict;
  readonly faults: readonly WiremapFault[];
  /** map[i] is the far-end pin reached from near-end pin i + 1; null when open. */
  readonly map: readonly (number | null)[];
  readonly source: string;
  readonly note: string;
}

const PIN_COUNT = 8;

export function classifyWiremap(input: WiremapInput, rules: RuleSet = DEFAULT_RULE_SET): WiremapResult {
  const scheme = requireOneOf('scheme', input.scheme, ['T568A', 'T568B'] as const);
  const near = readEnd('nearEnd', input.nearEnd);
  const far = readEnd('farEnd', input.farEnd);
  const shorts = readShorts(input.shorts ?? []);
  const broken = new Set(readPins('opens', input.opens ?? []));
  const expected = PIN_SCHEMES[scheme];
  const source = `${rules.cabling.wiremapSource}; ${rules.cabling.pinAssignmentSource}`;

  const map = near.map((colour, i) => {
    if (colour === null || broken.has(i + 1)) return null;
    const farIndex = far.indexOf(colour);
    return farIndex === -1 ? null : farIndex + 1;
  });

  const faults: WiremapFault[] = [];

  map.forEach((to, i) => {
    if (to !== null) return;
    const pin = i + 1;
    if (near[i] === null) {
      faults.push({ kind: 'open', pins: [pin], end: 'near', note: `Pin ${pin} has no conductor at the near end.` });
    } else if (broken.has(pin)) {
      faults.push({ kind: 'open', pins: [pin], note: `Pin ${pin} has no continuity: the conductor is broken along the cable.` });
    } else {
      faults.push({ kind: 'open', pins: [pin], end: 'far', note: `The ${near[i]} conductor on pin ${pin} is not terminated at the far end.` });
    }
  });

  for (const [a, b] of shorts) {
    faults.push({ kind: 'short', pins: [a, b], note: `Pins ${a} and ${b} are shorted together.` });
  }

  const continuity: WiremapFault[] = [];
  const crossedSeen = new Set<string>();
  const swapped = new Set<number>();
  for (const [p, q] of SIGNAL_PAIRS) {
    const mp = map[p - 1] ?? null;
    const mq = map[q - 1] ?? null;
    if (mp === p && mq === q) {
      const cp = near[p - 1];
      const cq = near[q - 1];
      if (cp && cq && twistedPairOf(cp) !== twistedPairOf(cq)) {
        continuity.push({
          kind: 'split',
          pins: [p, q],
          note: `Pins ${p} and ${q} connect through, but on ${cp} and ${cq}, which are from different twisted pairs.`,
        });
      }
      continue;
    }
    if (mp === q && mq === p) {
      continuity.push({ kind: 'reversed', pins: [p, q], note: `The two wires of the pair on pins ${p} and ${q} are swapped at one end.` });
      continue;
    }
    const target = mp !== null && mq !== null ? SIGNAL_PAIRS.find(([x, y]) => (x === mp && y === mq) || (x === mq && y === mp)) : undefined;
    if (target !== undefined) {
      const pins = [p, q, target[0], target[1]].sort((x, y) => x - y);
      const key = pins.join(',');
      if (!crossedSeen.has(key)) {
        crossedSeen.add(key);
        continuity.push({
          kind: 'crossed',
          pins,
          note: `The pair on pins ${p},${q} lands on pins ${target[0]},${target[1]} at the other end.`,
        });
      }
      continue;
    }
    const wrong = [p, q].filter((pin) => {
      const to = map[pin - 1] ?? null;
      return to !== null && to !== pin && !swapped.has(pin);
    });
    // Two wires of different pairs traded places at one end: one fault, not a miswire at each pin.
    for (const pin of [...wrong]) {
      const to = map[pin - 1] ?? null;
      if (to === null || swapped.has(pin) || map[to - 1] !== pin) continue;
      swapped.add(pin);
      swapped.add(to);
      const pins = [pin, to].sort((x, y) => x - y);
      continuity.push({
        kind: 'crossed',
        pins,
        note: `The wires on pins ${pins[0]} and ${pins[1]} have traded places, crossing pair ${pairOf(pins[0]!)} with pair ${pairOf(pins[1]!)}.`,
      });
    }
    wrong.splice(0, wrong.length, ...wrong.filter((pin) => !swapped.has(pin)));
    if (wrong.length > 0) {
      continuity.push({
        kind: 'miswired',
        pins: wrong,
        note: `${wrong.map((pin) => `Near-end pin ${pin} reaches far-end pin ${map[pin - 1]}`).join(', ')}.`,
      });
    }
  }

  const nearDiff = schemeDifferences(near, expected);
  const farDiff = schemeDifferences(far, expected);
  for (const fault of continuity) {
    const onNear = fault.pins.some((pin) => nearDiff.has(pin));
    const onFar = fault.pins.some((pin) => farDiff.has(pin));
    faults.push(onNear !== onFar ? { ...fault, end: onNear ? 'near' : 'far' } : fault);
  }

  // What no fault above explains: an end terminated consistently, but not to the scheme.
  const covered = new Set(faults.flatMap((f) => f.pins));
  for (const [end, diff] of [['near', nearDiff], ['far', farDiff]] as const) {
    const pins = [...diff].filter((pin) => !covered.has(pin)).sort((x, y) => x - y);
    if (pins.length > 0) {
      faults.push({
        kind: 'miswired',
        pins,
        end,
        note: `At the ${end} end, pin${pins.length === 1 ? '' : 's'} ${pins.join(',')} do${pins.length === 1 ? 'es' : ''} not follow ${scheme}.`,
      });
    }
  }

  const nothingRecorded = near.every((c) => c === null) && far.every((c) => c === null) && shorts.length === 0;
  const verdict: Verdict = nothingRecorded ? 'check' : faults.length === 0 ? 'pass' : 'fail';
  const note =
    verdict === 'check'
      ? 'Record the conductor colours at each end to check the wiremap.'
      : verdict === 'pass'
        ? `All eight conductors connect pin to pin and both ends follow ${scheme}.`
        : `The wiremap fails: ${faults.map(describeFault).join('; ')}.`;

  return { verdict, faults, map, source, note };
}

/** The signal pair a pin belongs to, as its pins: "1,2". */
function pairOf(pin: number): string {
  return (SIGNAL_PAIRS.find(([a, b]) => a === pin || b === pin) ?? [pin]).join(',');
}

function describeFault(fault: WiremapFault): string {
  const words: Readonly<Record<WiremapFaultKind, string>> = {
    open: 'open',
    short: 'short',
    reversed: 'reversed pair',
    crossed: 'crossed pairs',
    split: 'split pair',
    miswired: 'miswired',
  };
  return `${words[fault.kind]} on pin${fault.pins.length === 1 ? '' : 's'} ${fault.pins.join(',')}${fault.end ? ` (${fault.end} end)` : ''}`;
}

function schemeDifferences(end: readonly (ConductorColour | null)[], expected: readonly ConductorColour[]): Set<number> {
  const pins = new Set<number>();
  end.forEach((colour, i) => {
    if (colour !== null && colour !== expected[i]) pins.add(i + 1);
  });
  return pins;
}

function readEnd(field: string, end: unknown): (ConductorColour | null)[] {
  if (!Array.isArray(end) || end.length !== PIN_COUNT) {
    throw new InvalidInputError(field, `must list the colour (or null) at each of the ${PIN_COUNT} pins`);
  }
  const seen = new Set<ConductorColour>();
  return end.map((colour: unknown, i) => {
    if (colour === null || colour === undefined) return null;
    if (!isConductorColour(colour)) {
      throw new InvalidInputError(`${field}[${i}]`, `${JSON.stringify(colour)} is not a conductor colour`);
    }
    if (seen.has(colour)) {
      throw new InvalidInputError(`${field}[${i}]`, `${colour} appears on more than one pin`);
    }
    seen.add(colour);
    return colour;
  });
}

function readPins(field: string, pins: unknown): number[] {
  if (!Array.isArray(pins)) throw new InvalidInputError(field, 'must be a list of pin numbers');
  return pins.map((pin: unknown, i) => {
    if (typeof pin !== 'number' || !Number.isInteger(pin) || pin < 1 || pin > PIN_COUNT) {
      throw new InvalidInputError(`${field}[${i}]`, `must be a pin number from 1 to ${PIN_COUNT}`);
    }
    return pin;
  });
}

function readShorts(shorts: unknown): [number, number][] {
  if (!Array.isArray(shorts)) throw new InvalidInputError('shorts', 'must be a list of pin pairs');
  const seen = new Set<string>();
  const result: [number, number][] = [];
  shorts.forEach((pair: unknown, i) => {
    const field = `shorts[${i}]`;
    if (!Array.isArray(pair) || pair.length !== 2) throw new InvalidInputError(field, 'must be a pair of pin numbers');
    const [a, b] = readPins(field, pair).sort((x, y) => x - y) as [number, number];
    if (a === b) throw new InvalidInputError(field, 'a pin cannot be shorted to itself');
    const key = `${a},${b}`;
    if (!seen.has(key)) {
      seen.add(key);
      result.push([a, b]);
    }
  });
  return result;
}
