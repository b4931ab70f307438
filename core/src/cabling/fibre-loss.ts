/**
 * A Tier 1 (light source and power meter) loss budget for an optical fibre link, and the verdict on a measured loss.
 * The allowances are the maxima ANSI/TIA-568.3-D gives for cabled fibre, mated connector pairs and splices.
 */
import { type CheckResult, InvalidInputError, requireNonNegative, roundTo } from '../check.js';

export const FIBRE_MODES = ['multimode', 'singlemode'] as const;
export type FibreMode = (typeof FIBRE_MODES)[number];

/** Where a single-mode cable runs: inside a building, or outside plant, which TIA allows less attenuation. */
export type FibrePlant = 'inside' | 'outside';

interface Sourced {
  readonly value: number;
  readonly source: string;
}

const TIA = 'ANSI/TIA-568.3-D';

/** Maximum cabled fibre attenuation, dB/km, by mode and wavelength (nm). */
export const FIBRE_ATTENUATION_DB_PER_KM: Readonly<Record<FibreMode, Readonly<Record<number, Sourced>>>> = {
  multimode: {
    850: { value: 3.0, source: `${TIA}, cabled multimode fibre at 850 nm (from memory)` },
    1300: { value: 1.5, source: `${TIA}, cabled multimode fibre at 1300 nm (from memory)` },
  },
  singlemode: {
    1310: { value: 1.0, source: `${TIA}, inside plant single-mode cable at 1310 nm (from memory)` },
    1550: { value: 1.0, source: `${TIA}, inside plant single-mode cable at 1550 nm (from memory)` },
  },
};

const OUTSIDE_PLANT_DB_PER_KM: Sourced = { value: 0.5, source: `${TIA}, outside plant single-mode cable at 1310 and 1550 nm (from memory)` };

/** Maximum loss of one mated connector pair, dB. */
export const CONNECTOR_PAIR_LOSS_DB: Sourced = { value: 0.75, source: `${TIA}, mated connector pair (from memory)` };
/** Maximum loss of one splice (fusion or mechanical), dB. */
export const SPLICE_LOSS_DB: Sourced = { value: 0.3, source: `${TIA}, splice (from memory)` };

export interface FibreLinkInput {
  readonly lengthM: number;
  readonly mode: FibreMode;
  readonly wavelengthNm: number;
  /** Mated connector pairs in the link, the two at its ends included. */
  readonly connectorPairs: number;
  readonly splices: number;
  /** Single-mode only; inside unless said. */
  readonly plant?: FibrePlant;
}

export interface FibreLossBudget {
  /** The most the link may lose, dB. */
  readonly allowedDb: number;
  readonly fibreDb: number;
  readonly connectorsDb: number;
  readonly splicesDb: number;
  readonly sources: readonly string[];
}

function wholeCount(field: string, value: unknown): number {
  const n = requireNonNegative(field, value);
  if (!Number.isInteger(n)) throw new InvalidInputError(field, `must be a whole number, got ${n}`);
  return n;
}

/** The allowed loss: length × attenuation + connector pairs × 0.75 dB + splices × 0.3 dB. */
export function fibreLossBudget(input: FibreLinkInput): FibreLossBudget {
  const lengthM = requireNonNegative('lengthM', input.lengthM);
  const table = FIBRE_ATTENUATION_DB_PER_KM[input.mode];
  if (!table) throw new InvalidInputError('mode', `must be multimode or singlemode, got ${String(input.mode)}`);
  const perKm = input.mode === 'singlemode' && input.plant === 'outside' ? OUTSIDE_PLANT_DB_PER_KM : table[input.wavelengthNm];
  if (!perKm || !table[input.wavelengthNm]) {
    throw new InvalidInputError('wavelengthNm', `for ${input.mode} fibre must be one of ${Object.keys(table).join(' or ')} nm, got ${input.wavelengthNm}`);
  }
  const pairs = wholeCount('connectorPairs', input.connectorPairs);
  const splices = wholeCount('splices', input.splices);
  const fibreDb = (lengthM / 1000) * perKm.value;
  const connectorsDb = pairs * CONNECTOR_PAIR_LOSS_DB.value;
  const splicesDb = splices * SPLICE_LOSS_DB.value;
  return {
    allowedDb: roundTo(fibreDb + connectorsDb + splicesDb, 3),
    fibreDb: roundTo(fibreDb, 3),
    connectorsDb: roundTo(connectorsDb, 3),
    splicesDb: roundTo(splicesDb, 3),
    sources: [perKm.source, CONNECTOR_PAIR_LOSS_DB.source, SPLICE_LOSS_DB.source],
  };
}

export type FibreLinkCheck = CheckResult & { readonly marginDb: number | null; readonly budget: FibreLossBudget };

/** A measured loss against the budget: a pass with its margin, or a fail by how much it is over. */
export function checkFibreLink(input: FibreLinkInput & { readonly measuredLossDb: number | null }): FibreLinkCheck {
  const budget = fibreLossBudget(input);
  const source = budget.sources.join('; ');
  if (input.measuredLossDb === null || input.measuredLossDb === undefined) {
    return { verdict: 'check', value: null, limit: budget.allowedDb, unit: 'dB', source, note: `No loss measured yet: the budget is ${budget.allowedDb} dB.`, marginDb: null, budget };
  }
  const measured = requireNonNegative('measuredLossDb', input.measuredLossDb);
  const marginDb = roundTo(budget.allowedDb - measured, 3);
  const ok = marginDb >= 0;
  return {
    verdict: ok ? 'pass' : 'fail',
    value: measured,
    limit: budget.allowedDb,
    unit: 'dB',
    source,
    note: ok
      ? `${measured} dB lost against a budget of ${budget.allowedDb} dB: ${marginDb} dB to spare.`
      : `${measured} dB lost is ${roundTo(-marginDb, 3)} dB over the budget of ${budget.allowedDb} dB: clean and inspect the end faces, then test again.`,
    marginDb,
    budget,
  };
}
