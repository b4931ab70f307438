/**
 * The Zs to expect at a new point before the work is done: Ze plus the R1+R2 of the cable to it, taken cold
 * and corrected to the conductor's operating temperature, judged against the device's table (and, where an
 * RCD gives fault protection, against Table 41.5).
 */
import {
  InvalidInputError,
  requireFinite,
  requireNonNegative,
  requirePositive,
  roundTo,
  worstVerdict,
  type CheckResult,
  type Finding,
} from '../check.js';
import type { DisconnectionTimeS, ProtectiveDevice, RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { temperatureMultiplier } from './conductor-resistance.js';
import { maxZs } from './earth-fault-loop.js';
import { maxZsForRcd } from './rcd.js';

export interface PredictZsInput {
  /** External earth fault loop impedance (Ω), measured or the supplier's figure. */
  readonly zeOhm: number;
  /** R1+R2 from the board to the new point (Ω), as measured or worked out cold at 20 °C. */
  readonly r1r2Ohm: number;
  /** Conductor temperature the fault is assumed at; 70 °C for thermoplastic cable. */
  readonly conductorTempC?: number;
  /** The circuit's protective device; without it only the figure is given. */
  readonly device?: ProtectiveDevice | null;
  readonly ratingA?: number | null;
  readonly disconnectionS?: DisconnectionTimeS;
  /** Rated residual current (mA) of an RCD that gives fault protection (a TT supply, or where the device alone cannot). */
  readonly rcdRatedMa?: number | null;
}

export interface PredictedZs extends CheckResult {
  /** The predicted Zs at the far point at operating temperature (Ω); also `value`. */
  readonly zsOhm: number;
  /** R1+R2 after the temperature correction (Ω). */
  readonly r1r2HotOhm: number;
  readonly temperatureMultiplier: number;
  /** One finding per limit judged: the device's table, and Table 41.5 where an RCD gives fault protection. */
  readonly findings: readonly Finding[];
}

/**
 * Zs = Ze + (R1+R2) × (1 + α (t − 20)). The prediction is at operating temperature, so it is compared with the
 * table value itself, not with the 80 % used for readings taken cold.
 */
export function predictZs(input: PredictZsInput, rules: RuleSet = DEFAULT_RULE_SET): PredictedZs {
  const zeOhm = requireNonNegative('zeOhm', input.zeOhm);
  const r1r2Ohm = requireNonNegative('r1r2Ohm', input.r1r2Ohm);
  const conductorTempC = requireFinite('conductorTempC', input.conductorTempC ?? rules.beforeWork.operatingTempC.value);
  if (conductorTempC < rules.conductors.referenceTempC) {
    throw new InvalidInputError('conductorTempC', `must be at least ${rules.conductors.referenceTempC} °C, the temperature R1+R2 is taken at, got ${conductorTempC}`);
  }
  if (zeOhm + r1r2Ohm === 0) throw new InvalidInputError('zeOhm', 'Ze and R1+R2 cannot both be 0 Ω');
  const multiplier = temperatureMultiplier(conductorTempC, rules);
  const r1r2HotOhm = r1r2Ohm * multiplier;
  const zsOhm = zeOhm + r1r2HotOhm;
  const shown = `${roundTo(zsOhm, 2).toFixed(2)} Ω`;
  const correction = `${rules.conductors.temperatureCoefficient.source}`;
  const findings: Finding[] = [];

  if (input.device != null) {
    if (input.ratingA == null) throw new InvalidInputError('ratingA', 'give the device rating with the device');
    const ratingA = requirePositive('ratingA', input.ratingA);
    const limit = maxZs({ device: input.device, ratingA, disconnectionS: input.disconnectionS ?? 0.4 }, rules);
    const table = input.device === 'B' || input.device === 'C' || input.device === 'D' ? rules.earthFaultLoop.circuitBreakers[input.device].source : (rules.earthFaultLoop.fuses[input.device]?.source ?? '');
    const name = input.device === 'B' || input.device === 'C' || input.device === 'D' ? `type ${input.device} ${ratingA} A circuit-breaker` : `${ratingA} A ${input.device} fuse`;
    const ok = roundTo(zsOhm, 2) <= limit;
    findings.push({
      name: 'device',
      verdict: ok ? 'pass' : 'fail',
      value: zsOhm,
      limit,
      unit: 'Ω',
      source: `${table}; ${correction}`,
      note: ok
        ? `Predicted Zs ${shown} at ${conductorTempC} °C is within the ${limit} Ω maximum for a ${name}, so it should still disconnect in time.`
        : `Predicted Zs ${shown} at ${conductorTempC} °C is above the ${limit} Ω maximum for a ${name}: it would not disconnect in time without an RCD, a shorter run or a larger cable.`,
    });
  }
  if (input.rcdRatedMa != null) {
    const ratedMa = requirePositive('rcdRatedMa', input.rcdRatedMa);
    const limit = maxZsForRcd({ ratedMa }, rules);
    const ok = zsOhm <= limit;
    findings.push({
      name: 'rcd',
      verdict: ok ? 'pass' : 'fail',
      value: zsOhm,
      limit,
      unit: 'Ω',
      source: rules.rcd.maxZsByRatedMa.source,
      note: ok
        ? `Predicted Zs ${shown} is within the ${limit} Ω allowed where a ${ratedMa} mA RCD gives fault protection.`
        : `Predicted Zs ${shown} is above the ${limit} Ω allowed where a ${ratedMa} mA RCD gives fault protection.`,
    });
  }

  const main = findings.find((f) => f.verdict === 'fail') ?? findings[0];
  // An RCD that gives fault protection covers a device limit that is exceeded; the note says so.
  const deviceFails = findings.some((f) => f.name === 'device' && f.verdict === 'fail');
  const rcdCovers = deviceFails && findings.some((f) => f.name === 'rcd' && f.verdict === 'pass');
  const verdict = findings.length === 0 ? 'check' : rcdCovers ? 'pass' : worstVerdict(findings.map((f) => f.verdict));
  return {
    verdict,
    value: zsOhm,
    limit: main?.limit ?? null,
    unit: 'Ω',
    source: main ? main.source : correction,
    note:
      findings.length === 0
        ? `Predicted Zs ${shown} at ${conductorTempC} °C; give the circuit's protective device to judge it.`
        : rcdCovers
          ? `Predicted Zs ${shown} is above the device's limit, so fault protection rests on the RCD, which it satisfies (Table 41.5).`
          : (main?.note ?? ''),
    zsOhm,
    r1r2HotOhm,
    temperatureMultiplier: multiplier,
    findings,
  };
}
