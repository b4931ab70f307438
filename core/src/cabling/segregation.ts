/**
 * How far a data cable must be kept from power cables run beside it (BS EN 50174-2, with BS 7671 Reg 528.1 for
 * the two voltage bands in one wiring system), and the fire performance installed telecommunications cable must
 * meet (BS 6701). Every figure here is from memory (M): check it against the edition in force.
 */
import { InvalidInputError, requireNonNegative } from '../check.js';
import type { CABLE_FIRE_CLASSES, DATA_CABLE_KINDS, POWER_CABLE_KINDS, SEGREGATION_CONTAINMENTS } from '../sync/entities.js';

export type PowerCableKind = (typeof POWER_CABLE_KINDS)[number];
export type DataCableKind = (typeof DATA_CABLE_KINDS)[number];
export type SegregationContainment = (typeof SEGREGATION_CONTAINMENTS)[number];
export type CableFireClass = (typeof CABLE_FIRE_CLASSES)[number];

const STD = 'BS EN 50174-2:2018+A1:2020';

/** The segregation class a data cable falls in (BS EN 50174-2 Table 3, simplified; from memory). */
const SEGREGATION_CLASS: Record<Exclude<DataCableKind, 'fibre'>, 'a' | 'b' | 'c' | 'd'> = {
  'unscreened-twisted-pair': 'b',
  'screened-twisted-pair': 'c',
  coax: 'd',
};

/** Minimum separation, mm, by segregation class and the containment between them (BS EN 50174-2 Table 4; from memory). */
const SEPARATION_MM: Record<'a' | 'b' | 'c' | 'd', Record<SegregationContainment, number>> = {
  a: { none: 300, 'open-metallic': 225, 'perforated-metallic': 150, 'solid-metallic': 0 },
  b: { none: 100, 'open-metallic': 75, 'perforated-metallic': 50, 'solid-metallic': 0 },
  c: { none: 50, 'open-metallic': 38, 'perforated-metallic': 25, 'solid-metallic': 0 },
  d: { none: 10, 'open-metallic': 8, 'perforated-metallic': 5, 'solid-metallic': 0 },
};

/** Below this length side by side, BS EN 50174-2 asks no separation of unscreened power in a dwelling-sized run (from memory). */
export const SHORT_PARALLEL_RUN_M = 35;

export interface SegregationInput {
  readonly powerCableKind: PowerCableKind;
  readonly dataCableKind: DataCableKind;
  readonly containment: SegregationContainment;
  /** How far the two run side by side, m. */
  readonly parallelRunM: number;
}

export interface Segregation {
  /** The least separation to keep between the data and the power cable, mm. */
  readonly minimumMm: number;
  readonly source: string;
  readonly note: string;
}

const REG_528 = 'BS 7671:2018+A2:2022 Reg 528.1: band I (data) and band II (mains) circuits share a wiring system only if segregated by a partition or insulated for the highest voltage present';

/** The minimum separation between a data cable and the power cable beside it, with its source. */
export function segregationMm(input: SegregationInput): Segregation {
  const run = requireNonNegative('parallelRunM', input.parallelRunM);
  if (!['unscreened', 'screened'].includes(input.powerCableKind)) throw new InvalidInputError('powerCableKind', `must be unscreened or screened, got ${String(input.powerCableKind)}`);
  if (input.dataCableKind === 'fibre') {
    return {
      minimumMm: 0,
      source: `${STD} (from memory); ${REG_528}`,
      note: 'An all-dielectric fibre picks up no interference: no separation is needed for it, but keep it out of the mains containment’s compartment.',
    };
  }
  const cls = SEGREGATION_CLASS[input.dataCableKind];
  const row = cls ? SEPARATION_MM[cls] : undefined;
  if (!row || row[input.containment] === undefined) throw new InvalidInputError('containment', `must be one of none, open-metallic, perforated-metallic, solid-metallic, got ${String(input.containment)}`);
  // Screened power (armoured or in its own earthed screen) needs the least; short parallel runs need none.
  if (input.powerCableKind === 'screened' || run <= SHORT_PARALLEL_RUN_M) {
    return {
      minimumMm: 0,
      source: `${STD}, separation requirements (from memory); ${REG_528}`,
      note:
        input.powerCableKind === 'screened'
          ? 'Screened power cable: no separation distance, but never in the same compartment unless Reg 528.1 is met.'
          : `Side by side for ${run} m, no more than ${SHORT_PARALLEL_RUN_M} m: no separation distance, but never in the same compartment unless Reg 528.1 is met.`,
    };
  }
  const minimumMm = row[input.containment];
  return {
    minimumMm,
    source: `${STD} Table 4, segregation class ${cls} (from memory); ${REG_528}`,
    note: minimumMm === 0 ? 'A solid metal divider between them: no further separation needed.' : `Keep at least ${minimumMm} mm between this data cable and the power cable over the ${run} m they run side by side.`,
  };
}

/** BS 6701's least reaction-to-fire class for telecommunications cable installed in a building (from memory). */
export const BS6701_MINIMUM_FIRE_CLASS = { value: 'Eca' as CableFireClass, source: 'BS 6701:2016+A1:2017, minimum Euroclass for installed telecommunications cable (from memory)' };

const FIRE_ORDER: readonly CableFireClass[] = ['Aca', 'B1ca', 'B2ca', 'Cca', 'Dca', 'Eca', 'Fca'];

/** Whether a cable's Euroclass meets BS 6701's minimum (a better class is earlier in the list). */
export function meetsFireMinimum(cls: CableFireClass): boolean {
  return FIRE_ORDER.indexOf(cls) <= FIRE_ORDER.indexOf(BS6701_MINIMUM_FIRE_CLASS.value);
}
