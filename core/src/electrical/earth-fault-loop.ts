/**
 * Maximum earth fault loop impedance (Zs) for a protective device, and the verdict for a measured Zs.
 */
import {
  InvalidInputError,
  optionalReading,
  requireFinite,
  roundTo,
  type CheckResult,
  type Reading,
} from '../check.js';
import type { DisconnectionTimeS, ProtectiveDevice, RuleSet, SourcedLimit, ZsTable } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

export interface MaxZsInput {
  /** Circuit-breaker type B, C or D; fuses are named by standard ('BS 88-3', ...) where a rule set tabulates them. */
  readonly device: ProtectiveDevice;
  readonly ratingA: number;
  /** 0.4 s for final circuits, 5 s for distribution circuits (TN systems). */
  readonly disconnectionS?: DisconnectionTimeS;
}

export interface MaxZs {
  readonly maxZsOhm: number;
  readonly source: string;
}

const DISCONNECTION_TIMES: readonly DisconnectionTimeS[] = [0.4, 5];

function lookupMaxZs(input: MaxZsInput, rules: RuleSet): MaxZs {
  const disconnectionS = input.disconnectionS ?? 0.4;
  if (!DISCONNECTION_TIMES.includes(disconnectionS)) {
    throw new InvalidInputError('disconnectionS', `must be 0.4 or 5 s, got ${String(disconnectionS)}`);
  }
  const ratingA = requireFinite('ratingA', input.ratingA);
  const table = deviceTable(input.device, rules);
  const column = table.times[`${disconnectionS}`];
  if (column === undefined) {
    throw new InvalidInputError(
      'disconnectionS',
      `${table.source} gives no ${disconnectionS} s values for ${deviceName(input.device)}`,
    );
  }
  const value = Object.hasOwn(column, String(ratingA)) ? column[ratingA] : undefined;
  if (value === undefined) {
    const listed = Object.keys(column).map(Number).sort((a, b) => a - b).join(', ');
    throw new InvalidInputError(
      'ratingA',
      `${table.source} has no ${ratingA} A ${deviceName(input.device)} in this rule set (listed: ${listed} A)`,
    );
  }
  return { maxZsOhm: value, source: table.source };
}

function deviceTable(device: unknown, rules: RuleSet): ZsTable {
  const breakers = rules.earthFaultLoop.circuitBreakers;
  if (device === 'B' || device === 'C' || device === 'D') return breakers[device];
  const fuses = rules.earthFaultLoop.fuses;
  const fuse = typeof device === 'string' && Object.hasOwn(fuses, device) ? fuses[device as keyof typeof fuses] : undefined;
  if (fuse !== undefined) return fuse;
  throw new InvalidInputError(
    'device',
    `no sourced maximum Zs table for ${typeof device === 'string' ? JSON.stringify(device) : String(device)} in rule set ${rules.id}; ` +
      `tabulated: circuit-breaker types B, C, D${Object.keys(rules.earthFaultLoop.fuses).map((f) => `, ${f}`).join('')}`,
  );
}

function deviceName(device: ProtectiveDevice): string {
  return device === 'B' || device === 'C' || device === 'D' ? `type ${device} circuit-breaker` : `${device} fuse`;
}

/** The tabulated maximum Zs (Ω) for the device, as printed: the limit for a fault at conductor operating temperature. */
export function maxZs(input: MaxZsInput, rules: RuleSet = DEFAULT_RULE_SET): number {
  return lookupMaxZs(input, rules).maxZsOhm;
}

export interface ZsCheckInput extends MaxZsInput {
  /** Measured Zs (Ω), taken with the conductors at room temperature; null while not yet measured. */
  readonly measured: Reading;
}

export interface ZsCheck extends CheckResult {
  /** The tabulated maximum before the cold-test factor. */
  readonly tabulatedMaxOhm: number;
  readonly coldTestFactor: SourcedLimit & { readonly name: string };
}

/**
 * Judges a measured Zs against the tabulated maximum × 0.8 (the rule of thumb for readings taken cold).
 * The limit is 80 % of the printed, already-rounded value, rounded to 0.01 Ω: B32 gives 1.37 × 0.8 = 1.10 Ω.
 */
export function checkZs(input: ZsCheckInput, rules: RuleSet = DEFAULT_RULE_SET): ZsCheck {
  const measured = optionalReading('measured', input.measured);
  const { maxZsOhm, source } = lookupMaxZs(input, rules);
  const factor = rules.earthFaultLoop.coldTestFactor;
  const limit = roundTo(maxZsOhm * factor.value, rules.earthFaultLoop.coldTestLimitDecimals);
  const base = {
    limit,
    unit: 'Ω',
    source: `${source}; ${factor.source} (${factor.name})`,
    tabulatedMaxOhm: maxZsOhm,
    coldTestFactor: factor,
  };
  const device = deviceName(input.device);
  if (measured === null) {
    return { ...base, verdict: 'check', value: null, note: `Enter the measured Zs to check it against ${limit.toFixed(2)} Ω.` };
  }
  if (measured === 0) {
    return {
      ...base,
      verdict: 'check',
      value: measured,
      note: 'A Zs of 0 Ω cannot be right; check the test leads and the connection to earth and test again.',
    };
  }
  if (measured <= limit) {
    return {
      ...base,
      verdict: 'pass',
      value: measured,
      note: `Zs ${measured} Ω is within ${limit.toFixed(2)} Ω, 80 % of the ${maxZsOhm} Ω maximum for a ${input.ratingA} A ${device}, so the device should disconnect in time.`,
    };
  }
  if (measured > maxZsOhm) {
    // Above the table itself, not only the allowance for warm conductors: the limit that failed is the table's.
    return {
      ...base,
      verdict: 'fail',
      value: measured,
      limit: maxZsOhm,
      source,
      note: `Zs ${measured} Ω is above the ${maxZsOhm} Ω maximum in ${source} for a ${input.ratingA} A ${device} itself, not only 80 % of it: even cold, the device will not disconnect in time. Find the cause (a loose or undersized protective conductor, a long run) before anything else.`,
    };
  }
  return {
    ...base,
    verdict: 'fail',
    value: measured,
    note: `Zs ${measured} Ω is above ${limit.toFixed(2)} Ω, 80 % of the ${maxZsOhm} Ω maximum for a ${input.ratingA} A ${device} (${factor.name}, ${factor.source}), though not above the maximum itself: with the conductors warm it would be, so disconnection in time is not shown.`,
  };
}
