/**
 * A rule set is every limit and table one country's regulations give, as a plain versioned object.
 * Calculations take it as their last, optional argument, so another country (or a later edition)
 * is a new object, not a change to callers.
 */

import type {
  CpcArrangement,
  InstallationMethodTable,
  KValueTable,
  RcdRequirementSources,
  SpurLimits,
} from './uk-bs7671-before-work.js';

/** One published figure with where it comes from. */
export interface SourcedLimit {
  readonly value: number;
  readonly unit: string;
  readonly source: string;
}

/** A published table keyed by a number (a cross-section in mm², a rating in A, ...). */
export interface SourcedTable {
  readonly unit: string;
  readonly source: string;
  readonly rows: Readonly<Record<number, number>>;
}

export type CircuitBreakerType = 'B' | 'C' | 'D';

/** Fuses are named by their product standard; a rating a rule set does not tabulate throws rather than guessing. */
export type FuseType = 'BS 88-2' | 'BS 88-3' | 'BS 3036' | 'BS 1362';

export type ProtectiveDevice = CircuitBreakerType | FuseType;

/** Disconnection times (s) the maximum Zs tables are given for. */
export type DisconnectionTimeS = 0.4 | 5;

export interface ZsTable {
  readonly source: string;
  /** Ratings in A → maximum Zs in Ω, per disconnection time. */
  readonly times: Partial<Readonly<Record<`${DisconnectionTimeS}`, Readonly<Record<number, number>>>>>;
}

export interface InsulationBand {
  /** The band covers circuits with a nominal voltage up to and including this (V). */
  readonly upToNominalV: number;
  readonly circuit: string;
  readonly testVoltageV: number;
  readonly minimumMegaohms: number;
}

export type RcdType = 'general' | 'S';

export interface RcdTimes {
  /** Longest allowed operating time (ms). */
  readonly max: SourcedLimit;
  /** Shortest allowed operating time for time-delayed devices (ms). */
  readonly min?: SourcedLimit;
}

export type VoltageDropUse = 'lighting' | 'other';

export type LinkKind = 'channel' | 'permanent-link';

export interface RuleSet {
  /** Stable identifier stored with every recorded verdict. */
  readonly id: string;
  readonly name: string;
  /** The edition of the governing standard with its amendment, as printed on certificates. */
  readonly edition: string;
  /** The first day (ISO date, YYYY-MM-DD) this rule set is the one in force; the next one's date ends it. */
  readonly effectiveFrom: string;
  /** ISO 3166-1 alpha-2 country code. */
  readonly country: string;
  readonly nominalVoltageV: SourcedLimit;

  readonly conductors: {
    /** Plain copper, mΩ/m at the reference temperature. */
    readonly copperResistance: SourcedTable;
    readonly referenceTempC: number;
    /** Per kelvin, used linearly: R(t) = R20 × (1 + α (t − 20)). */
    readonly temperatureCoefficient: SourcedLimit;
    /** Range (°C) over which the linear correction is trusted. */
    readonly temperatureRangeC: { readonly min: number; readonly max: number };
  };

  readonly ring: {
    /** r1 and rn end to end may differ by at most this (Ω). */
    readonly endToEndTolerance: SourcedLimit;
    /** r2 may differ from r1 × (cpc/line resistance ratio) by this fraction of the expected value... */
    readonly r2RatioTolerance: SourcedLimit;
    /** ...or by this many ohms, whichever is larger, to allow for instrument resolution on short rings. */
    readonly r2AbsoluteTolerance: SourcedLimit;
  };

  readonly earthFaultLoop: {
    readonly circuitBreakers: Readonly<Record<CircuitBreakerType, ZsTable>>;
    readonly fuses: Partial<Readonly<Record<FuseType, ZsTable>>>;
    /** Factor applied to tabulated Zs for readings taken with conductors cold. */
    readonly coldTestFactor: SourcedLimit & { readonly name: string };
    /** Decimal places the cold-test limit is rounded to. */
    readonly coldTestLimitDecimals: number;
  };

  readonly insulation: {
    readonly source: string;
    /** In ascending order of `upToNominalV`. */
    readonly bands: readonly InsulationBand[];
  };

  readonly rcd: {
    readonly times: Readonly<Record<RcdType, Readonly<Record<1 | 5, RcdTimes>>>>;
    /** Largest rated residual current that counts as additional protection (mA). */
    readonly additionalProtectionMaxMa: SourcedLimit;
    /** Maximum Zs (Ω) for RCD-protected circuits by rated residual current (mA). */
    readonly maxZsByRatedMa: SourcedTable;
  };

  readonly voltageDrop: {
    /** mV/A/m for flat twin-and-earth cable by conductor cross-section. */
    readonly flatTwinAndEarth: SourcedTable;
    readonly limitsPercent: Readonly<Record<VoltageDropUse, SourcedLimit>>;
  };

  readonly fuses: {
    /** Fuse ratings (A) offered for plugs and fused connection units, ascending. */
    readonly plugAndFcuRatingsA: readonly number[];
    readonly ratingsSource: string;
    /** Appliances up to this power are customarily fused at the largest rating even if the nominal current is slightly above it. */
    readonly largestFuseCustomaryMaxW: SourcedLimit;
  };

  readonly safeZones: {
    /** Zone rules apply to cables concealed at less than this depth (mm). */
    readonly maxDepthMm: SourcedLimit;
    readonly topOfWallBandMm: SourcedLimit;
    readonly angleBandMm: SourcedLimit;
    /** A zone extends to the other face of a wall up to this thickness (mm). */
    readonly throughWallMaxThicknessMm: SourcedLimit;
    /** RCD rating (mA) a cable relying on the zones must be protected by. */
    readonly rcdMaxMa: SourcedLimit;
    readonly metallicPartsSource: string;
    readonly protectionMethodsSource: string;
  };

  readonly circuitTests: {
    /** Which tests a certificate for an alteration must show results for, and where that is laid down. */
    readonly requiredTestsSource: string;
    readonly polaritySource: string;
    readonly protectiveConductorSource: string;
    /** At step 3 of the ring test the highest R1+R2 should be about (r1 + r2) / 4; this much either way passes (Ω). */
    readonly ringR1R2Tolerance: SourcedLimit;
    /** Lower insulation test voltage allowed between live conductors and earth where equipment may be damaged (V). */
    readonly reducedInsulationTestV: SourcedLimit;
    readonly rcdButtonSource: string;
  };

  readonly cabling: {
    readonly lengthLimitsM: Readonly<Record<LinkKind, SourcedLimit>>;
    readonly pinAssignmentSource: string;
    readonly wiremapSource: string;
    /** m/s, the value used in every TDR length calculation. */
    readonly speedOfLight: SourcedLimit;
  };

  /** What is checked before breaking into a circuit. */
  readonly beforeWork: {
    readonly cableCapacity: InstallationMethodTable;
    readonly semiEnclosedFuseFactor: SourcedLimit;
    readonly cpcK: Readonly<Record<CpcArrangement, KValueTable>>;
    readonly adiabaticSource: string;
    readonly rcdRequirements: RcdRequirementSources;
    readonly spurs: SpurLimits;
    /** Conductor temperature (°C) a predicted Zs is worked out at unless told otherwise: 70 °C thermoplastic. */
    readonly operatingTempC: SourcedLimit;
  };
}

/** Freezes a rule set all the way down, so no caller can change a limit under another caller's feet. */
export function freezeRuleSet<T extends RuleSet>(rules: T): T {
  const freeze = (value: unknown): void => {
    if (typeof value !== 'object' || value === null || Object.isFrozen(value)) return;
    Object.freeze(value);
    for (const child of Object.values(value)) freeze(child);
  };
  freeze(rules);
  return rules;
}
