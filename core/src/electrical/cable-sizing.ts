/**
 * Sizing flat twin-and-earth for a new run: tabulated capacity by installation method, rating factors,
 * Ib ≤ In ≤ Iz, and the voltage drop to the far end.
 */
import {
  InvalidInputError,
  requireFinite,
  requireNonNegative,
  requireOneOf,
  requirePositive,
  roundTo,
  worstVerdict,
  type CheckResult,
  type Finding,
} from '../check.js';
import type { ProtectiveDevice, RuleSet, VoltageDropUse } from '../rules/rule-set.js';
import { INSTALLATION_METHODS, type InstallationMethod } from '../rules/uk-bs7671-before-work.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { voltageDrop, type VoltageDrop } from './voltage-drop.js';

export { INSTALLATION_METHODS, type InstallationMethod };

const DEVICES: readonly ProtectiveDevice[] = ['B', 'C', 'D', 'BS 88-2', 'BS 88-3', 'BS 3036', 'BS 1362'];

/** A ring's cable may carry less than the device rating: the customary design is at least 20 A (Reg 433.1.204). */
export const RING_MIN_CAPACITY_A = { value: 20, unit: 'A', source: 'BS 7671:2018+A2:2022 Reg 433.1.204 (ring final circuit cable capacity at least 20 A)' } as const;

export interface SizeCableInput {
  /** Design current Ib (A). */
  readonly designCurrentA: number;
  readonly device: ProtectiveDevice;
  /** Device rating In (A). */
  readonly ratingA: number;
  /** Live conductor cross-section (mm²). */
  readonly csaMm2: number;
  readonly installationMethod: InstallationMethod;
  /** Rating factor for ambient temperature (Table 4B1), grouping (Table 4C1) and thermal insulation (Table 52.2). */
  readonly ca?: number;
  readonly cg?: number;
  readonly ci?: number;
  /** One-way length of the run (m). */
  readonly lengthM: number;
  readonly use: VoltageDropUse;
  /** A ring final circuit is judged on Iz ≥ 20 A instead of In ≤ Iz. */
  readonly ring?: boolean;
}

export type LimitingFactor = 'design-current' | 'current-carrying-capacity' | 'voltage-drop';

export interface CableSizing extends CheckResult {
  /** Tabulated capacity It (A). */
  readonly tabulatedA: number;
  /** Iz = It × Ca × Cg × Ci × Cf (A). */
  readonly izA: number;
  readonly factors: { readonly ca: number; readonly cg: number; readonly ci: number; readonly cf: number };
  /** What limits the run: the check that fails, or the one with least margin when all pass. */
  readonly limitingFactor: LimitingFactor;
  /** The smallest rating factor, when it is below 1: what reduced Iz most. */
  readonly smallestFactor: { readonly name: 'ambient' | 'grouping' | 'thermal insulation' | 'BS 3036 fuse'; readonly value: number } | null;
  readonly voltageDrop: VoltageDrop;
  readonly findings: readonly Finding[];
}

function factor(field: string, value: unknown, max: number): number {
  const n = requirePositive(field, value);
  if (n > max) throw new InvalidInputError(field, `must be at most ${max}, got ${n}`);
  return n;
}

export function sizeCable(input: SizeCableInput, rules: RuleSet = DEFAULT_RULE_SET): CableSizing {
  const ib = requireNonNegative('designCurrentA', input.designCurrentA);
  const device = requireOneOf('device', input.device, DEVICES);
  const inA = requirePositive('ratingA', input.ratingA);
  const csa = requirePositive('csaMm2', input.csaMm2);
  const method = requireOneOf('installationMethod', input.installationMethod, INSTALLATION_METHODS);
  // Ambient factors above 1 exist for rooms cooler than 30 °C (Table 4B1); none reaches 1.25.
  const ca = factor('ca', input.ca ?? 1, 1.25);
  const cg = factor('cg', input.cg ?? 1, 1);
  const ci = factor('ci', input.ci ?? 1, 1);
  requireFinite('lengthM', input.lengthM);
  const table = rules.beforeWork.cableCapacity;
  const column = table.rows[method];
  const tabulatedA = Object.hasOwn(column, String(csa)) ? column[csa] : undefined;
  if (tabulatedA === undefined) {
    throw new InvalidInputError('csaMm2', `${csa} mm² is not listed in ${table.source} (listed: ${Object.keys(column).join(', ')} mm²)`);
  }
  const fuseFactor = rules.beforeWork.semiEnclosedFuseFactor;
  const cf = device === 'BS 3036' ? fuseFactor.value : 1;
  const izA = tabulatedA * ca * cg * ci * cf;
  const vd = voltageDrop({ csaMm2: csa, currentA: ib, lengthM: input.lengthM, use: input.use }, rules);
  const a = (n: number) => `${roundTo(n, 1)} A`;
  const derating = `It ${tabulatedA} A (method ${method}) × Ca ${ca} × Cg ${cg} × Ci ${ci}${cf !== 1 ? ` × ${cf} for a BS 3036 fuse` : ''}`;
  const capacitySource = `${table.source}; ${table.factorsSource}${cf !== 1 ? `; ${fuseFactor.source}` : ''}`;

  const findings: Finding[] = [
    {
      name: 'design-current',
      verdict: ib <= inA ? 'pass' : 'fail',
      value: ib,
      limit: inA,
      unit: 'A',
      source: 'BS 7671:2018+A2:2022 Reg 433.1.1 (Ib ≤ In ≤ Iz)',
      note: ib <= inA ? `The design current ${a(ib)} is within the ${inA} A device.` : `The design current ${a(ib)} is more than the ${inA} A device: it would trip in use. Choose a larger device and cable.`,
    },
    input.ring
      ? {
          name: 'current-carrying-capacity',
          verdict: roundTo(izA, 2) >= RING_MIN_CAPACITY_A.value ? 'pass' : 'fail',
          value: izA,
          limit: RING_MIN_CAPACITY_A.value,
          unit: 'A',
          source: `${capacitySource}; ${RING_MIN_CAPACITY_A.source}`,
          note:
            roundTo(izA, 2) >= RING_MIN_CAPACITY_A.value
              ? `Iz ${a(izA)} (${derating}) is at least the ${RING_MIN_CAPACITY_A.value} A a ring's cable must carry.`
              : `Iz ${a(izA)} (${derating}) is below the ${RING_MIN_CAPACITY_A.value} A a ring's cable must carry: route it differently or use a larger cable.`,
        }
      : {
          name: 'current-carrying-capacity',
          verdict: roundTo(izA, 2) >= inA ? 'pass' : 'fail',
          value: izA,
          limit: inA,
          unit: 'A',
          source: capacitySource,
          note:
            roundTo(izA, 2) >= inA
              ? `Iz ${a(izA)} (${derating}) is at least the ${inA} A device rating.`
              : `Iz ${a(izA)} (${derating}) is below the ${inA} A device rating: the cable is not protected against overload. Use a larger cable or route it out of the insulation.`,
        },
    { name: 'voltage-drop', verdict: vd.verdict, value: vd.value, limit: vd.limit, unit: vd.unit, source: vd.source, note: vd.note },
  ];
  const failing = findings.find((f) => f.verdict === 'fail');
  const margin = (f: Finding) => (f.name === 'current-carrying-capacity' ? (f.value ?? 0) / (f.limit ?? 1) : f.name === 'voltage-drop' ? (f.limit ?? 1) / Math.max(f.value ?? 0, 1e-9) : (f.limit ?? 1) / Math.max(f.value ?? 0, 1e-9));
  const limiting = failing ?? findings.reduce((m, f) => (margin(f) < margin(m) ? f : m));
  const named = [
    { name: 'ambient', value: ca },
    { name: 'grouping', value: cg },
    { name: 'thermal insulation', value: ci },
    { name: 'BS 3036 fuse', value: cf },
  ] as const;
  const smallest = named.reduce((m, f) => (f.value < m.value ? f : m));
  const limitingFactor = limiting.name as LimitingFactor;
  const verdict = worstVerdict(findings.map((f) => f.verdict));
  return {
    verdict,
    value: limiting.value,
    limit: limiting.limit,
    unit: limiting.unit,
    source: limiting.source,
    note:
      verdict === 'pass'
        ? `${csa} mm² in method ${method} will do; the least margin is on ${limitingFactor === 'voltage-drop' ? 'voltage drop' : limitingFactor === 'design-current' ? 'the design current' : 'current-carrying capacity'}. ${limiting.note}`
        : limiting.note,
    tabulatedA,
    izA,
    factors: { ca, cg, ci, cf },
    limitingFactor,
    smallestFactor: smallest.value < 1 ? { name: smallest.name, value: smallest.value } : null,
    voltageDrop: vd,
    findings,
  };
}

/** How each reference method is installed, for pictures and pickers. */
export function installationMethodDescription(method: InstallationMethod, rules: RuleSet = DEFAULT_RULE_SET): string {
  return rules.beforeWork.cableCapacity.descriptions[requireOneOf('method', method, INSTALLATION_METHODS)];
}
