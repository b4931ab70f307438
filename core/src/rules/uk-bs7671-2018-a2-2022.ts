/**
 * United Kingdom: BS 7671:2018 incorporating Amendment 2 (2022), with the IET On-Site Guide and
 * Guidance Note 3 test methods, and TIA-568 / ISO/IEC 11801 for structured cabling.
 *
 * Values are taken from public sources that quote the standards. An Amendment 4 (2026) exists and its
 * tables have not been checked: a rule set for it should be a new object beside this one.
 */
import {
  ADIABATIC_SOURCE,
  BS3036_FACTOR,
  CPC_K_VALUES,
  FLAT_TWIN_AND_EARTH_CAPACITY,
  RCD_REQUIREMENT_SOURCES,
  RING_SPUR_LIMITS,
} from './uk-bs7671-before-work.js';
import { freezeRuleSet, type RuleSet, type SourcedLimit, type SourcedTable, type ZsTable } from './rule-set.js';

const BS7671 = 'BS 7671:2018+A2:2022';
const GN3 = 'IET Guidance Note 3 (9th edition, 2022)';

export const UK_NOMINAL_VOLTAGE_V: SourcedLimit = {
  value: 230,
  unit: 'V',
  source: 'Electricity Safety, Quality and Continuity Regulations 2002 (230 V +10 %/−6 %)',
};

// ─── Conductors ──────────────────────────────────────────────────────────────

/** Plain annealed copper, class 1 and 2 maxima; the design values the On-Site Guide and GN3 use. */
export const COPPER_RESISTANCE_20C_MOHM_PER_M: SourcedTable = {
  unit: 'mΩ/m',
  source: 'IEC 60228:2004 Tables 1 and 2 (plain copper, 20 °C), as used by the IET On-Site Guide and Guidance Note 3',
  rows: { 1: 18.1, 1.5: 12.1, 2.5: 7.41, 4: 4.61, 6: 3.08, 10: 1.83, 16: 1.15 },
};

/**
 * α = 0.004 /K rather than the 0.00393 /K of IEC 60287-1-1: it reproduces the multipliers the trade
 * applies to tabulated resistances (×1.20 from 20 °C to 70 °C, ×1.28 to 90 °C) and the IEC 60228
 * correction factors (250 / (230 + t)), so on-site figures match the guidance tables exactly.
 */
export const COPPER_TEMPERATURE_COEFFICIENT: SourcedLimit = {
  value: 0.004,
  unit: '/K',
  source: 'IET On-Site Guide / Guidance Note 3 temperature multipliers (1.20 at 70 °C, 1.28 at 90 °C); IEC 60228 correction factors',
};

// ─── Ring final circuits ─────────────────────────────────────────────────────

export const RING_END_TO_END_TOLERANCE_OHM: SourcedLimit = {
  value: 0.05,
  unit: 'Ω',
  source: `${GN3} ring final circuit continuity test, step 1; ${BS7671} Reg 643.2.1`,
};

/**
 * The trade expects r2 ≈ 1.67 × r1 for 2.5/1.5 (by cross-section); the IEC 60228 resistances give 1.633.
 * We expect the resistance ratio and allow 3 %, which takes in both conventions.
 */
export const RING_R2_RATIO_TOLERANCE: SourcedLimit = {
  value: 0.03,
  unit: 'fraction',
  source: 'common trade practice (1.67 by cross-section vs 1.633 by IEC 60228 resistances), no published source',
};

/** Instruments read to 0.01 Ω, so on a short ring the 3 % band alone is narrower than the reading itself. */
export const RING_R2_ABSOLUTE_TOLERANCE_OHM: SourcedLimit = {
  value: 0.05,
  unit: 'Ω',
  source: `common trade practice, matching the ${GN3} step 1 tolerance, no published source`,
};

// ─── Earth fault loop impedance ──────────────────────────────────────────────

const TABLE_41_3 = `${BS7671} Table 41.3`;

/**
 * Circuit-breakers to BS EN 60898 and RCBOs to BS EN 61009-1, U0 = 230 V, Cmin = 0.95, 6 A to 125 A. Each value is
 * Cmin × U0 / Ia with Ia = 5 In (B), 10 In (C), 20 In (D at 0.4 s) and 10 In (D at 5 s), rounded as printed.
 */
export const MAX_ZS_TYPE_B: ZsTable = {
  source: TABLE_41_3,
  times: {
    '0.4': { 6: 7.28, 10: 4.37, 16: 2.73, 20: 2.19, 25: 1.75, 32: 1.37, 40: 1.09, 50: 0.87, 63: 0.69, 80: 0.55, 100: 0.44, 125: 0.35 },
    // Type B trips magnetically well inside 0.4 s, so the table gives one column for 0.4 s and 5 s.
    '5': { 6: 7.28, 10: 4.37, 16: 2.73, 20: 2.19, 25: 1.75, 32: 1.37, 40: 1.09, 50: 0.87, 63: 0.69, 80: 0.55, 100: 0.44, 125: 0.35 },
  },
};

export const MAX_ZS_TYPE_C: ZsTable = {
  source: TABLE_41_3,
  times: {
    '0.4': { 6: 3.64, 10: 2.19, 16: 1.37, 20: 1.09, 25: 0.87, 32: 0.68, 40: 0.55, 50: 0.44, 63: 0.35, 80: 0.27, 100: 0.22, 125: 0.17 },
    '5': { 6: 3.64, 10: 2.19, 16: 1.37, 20: 1.09, 25: 0.87, 32: 0.68, 40: 0.55, 50: 0.44, 63: 0.35, 80: 0.27, 100: 0.22, 125: 0.17 },
  },
};

export const MAX_ZS_TYPE_D: ZsTable = {
  source: TABLE_41_3,
  times: {
    '0.4': { 6: 1.82, 10: 1.09, 16: 0.68, 20: 0.55, 25: 0.44, 32: 0.34, 40: 0.27, 50: 0.22, 63: 0.17, 80: 0.14, 100: 0.11, 125: 0.09 },
    '5': { 6: 3.64, 10: 2.19, 16: 1.37, 20: 1.09, 25: 0.87, 32: 0.68, 40: 0.55, 50: 0.44, 63: 0.35, 80: 0.27, 100: 0.22, 125: 0.17 },
  },
};

/*
 * Fuses: Table 41.2 (0.4 s, final circuits) and Table 41.4 (5 s, distribution circuits), U0 = 230 V, Cmin = 0.95.
 * No printed book was read: how far each value is confirmed is said beside it in earth-fault-loop.test.ts.
 */
const TABLE_41_2 = `${BS7671} Table 41.2`;
const TABLE_41_4 = `${BS7671} Table 41.4`;
const FUSE_TABLES = `${TABLE_41_2} (0.4 s); ${TABLE_41_4} (5 s)`;

/** gG fuses to BS 88-2, fuse systems E (bolted) and G (clip-in). */
export const MAX_ZS_BS88_2: ZsTable = {
  source: FUSE_TABLES,
  times: {
    '0.4': { 6: 7.8, 10: 4.65, 16: 2.43, 20: 1.68, 25: 1.28, 32: 0.99, 40: 0.75, 50: 0.57, 63: 0.42 },
    '5': { 6: 13.5, 10: 7.42, 16: 4.18, 20: 2.91, 25: 2.3, 32: 1.84, 40: 1.35, 50: 1.04, 63: 0.82, 80: 0.57, 100: 0.42, 125: 0.33, 160: 0.25, 200: 0.19 },
  },
};

/** Cartridge fuses to BS 88-3, fuse system C (the domestic cartridge fuse that replaced BS 1361). */
export const MAX_ZS_BS88_3: ZsTable = {
  source: FUSE_TABLES,
  times: {
    '0.4': { 5: 9.1, 16: 2.43, 20: 1.68, 32: 0.86, 45: 0.52, 63: 0.35 },
    '5': { 5: 16.4, 16: 4.0, 20: 2.76, 32: 1.66, 45: 0.96, 63: 0.65, 80: 0.45, 100: 0.32 },
  },
};

/** Semi-enclosed (rewirable) fuses to BS 3036. */
export const MAX_ZS_BS3036: ZsTable = {
  source: FUSE_TABLES,
  times: {
    '0.4': { 5: 9.1, 15: 2.43, 20: 1.68, 30: 1.04 },
    '5': { 5: 17.5, 15: 5.08, 20: 3.42, 30: 2.35, 45: 1.25, 60: 0.84, 100: 0.42 },
  },
};

/** Cartridge fuses to BS 1362, as in a plug or a fused connection unit feeding a fixed load. */
export const MAX_ZS_BS1362: ZsTable = {
  source: FUSE_TABLES,
  times: {
    '0.4': { 3: 15.6, 13: 2.3 },
    '5': { 3: 23.3, 13: 3.64 },
  },
};

/** Readings taken cold must be at most 80 % of the tabulated maximum (conductors warm from 20 °C to 70 °C in a fault). */
export const ZS_COLD_TEST_FACTOR: SourcedLimit & { readonly name: string } = {
  name: '80 % rule of thumb for readings taken cold',
  value: 0.8,
  unit: 'factor',
  source: `${BS7671} Appendix 3`,
};

/** 80 % of the tabulated (already rounded) value, then rounded to 0.01 Ω, the resolution of a loop tester. */
export const ZS_COLD_TEST_LIMIT_DECIMALS = 2;

// ─── Insulation resistance ───────────────────────────────────────────────────

export const INSULATION_TABLE_SOURCE = `${BS7671} Table 64`;

// ─── RCDs ────────────────────────────────────────────────────────────────────

const RCD_PRODUCT = 'BS EN 61008-1 / BS EN 61009-1';

export const RCD_GENERAL_MAX_MS_AT_1X: SourcedLimit = {
  value: 300,
  unit: 'ms',
  source: `${BS7671} Reg 643.8; ${RCD_PRODUCT} (general type, at IΔn)`,
};

/** No longer a required field test after A2:2022, still the product standard's limit. */
export const RCD_GENERAL_MAX_MS_AT_5X: SourcedLimit = {
  value: 40,
  unit: 'ms',
  source: `${RCD_PRODUCT} (general type, at 5 IΔn)`,
};

export const RCD_TYPE_S_MAX_MS_AT_1X: SourcedLimit = {
  value: 500,
  unit: 'ms',
  source: `${RCD_PRODUCT} (type S, at IΔn)`,
};

export const RCD_TYPE_S_MIN_MS_AT_1X: SourcedLimit = {
  value: 130,
  unit: 'ms',
  source: `${RCD_PRODUCT} (type S minimum non-actuating time, at IΔn)`,
};

export const RCD_TYPE_S_MAX_MS_AT_5X: SourcedLimit = {
  value: 150,
  unit: 'ms',
  source: `${RCD_PRODUCT} (type S, at 5 IΔn)`,
};

export const RCD_TYPE_S_MIN_MS_AT_5X: SourcedLimit = {
  value: 50,
  unit: 'ms',
  source: `${RCD_PRODUCT} (type S minimum non-actuating time, at 5 IΔn)`,
};

export const RCD_ADDITIONAL_PROTECTION_MAX_MA: SourcedLimit = {
  value: 30,
  unit: 'mA',
  source: `${BS7671} Reg 415.1.1`,
};

/** 50 V / IΔn, as printed. */
export const MAX_ZS_RCD_PROTECTED: SourcedTable = {
  unit: 'Ω',
  source: `${BS7671} Table 41.5 (Reg 411.5.3)`,
  rows: { 30: 1667, 100: 500, 300: 167, 500: 100 },
};

// ─── Voltage drop ────────────────────────────────────────────────────────────

/** Tabulated, not derived: 2 × R20 × 1.2 gives 7.39 for 6 mm², the table prints 7.3. */
export const FLAT_TWIN_AND_EARTH_MV_PER_A_PER_M: SourcedTable = {
  unit: 'mV/A/m',
  source: `${BS7671} Appendix 4 Table 4D5 (70 °C thermoplastic flat twin and earth)`,
  rows: { 1: 44, 1.5: 29, 2.5: 18, 4: 11, 6: 7.3, 10: 4.4, 16: 2.8 },
};

export const VOLTAGE_DROP_LIGHTING_PERCENT: SourcedLimit = {
  value: 3,
  unit: '%',
  source: `${BS7671} Appendix 4 §6.4 Table 4Ab (public LV supply, lighting); Reg 525`,
};

export const VOLTAGE_DROP_OTHER_PERCENT: SourcedLimit = {
  value: 5,
  unit: '%',
  source: `${BS7671} Appendix 4 §6.4 Table 4Ab (public LV supply, other uses); Reg 525`,
};

// ─── Fuses for plugs and fused connection units ──────────────────────────────

export const PLUG_AND_FCU_FUSE_RATINGS_A: readonly number[] = [3, 5, 13];
export const PLUG_AND_FCU_FUSE_SOURCE = 'BS 1362 cartridge fuses (3 A and 13 A preferred; 5 A available)';

/** 3 kW is 13.04 A at 230 V; a 13 A fuse is still the normal choice for a 3 kW appliance. */
export const FUSE_13A_CUSTOMARY_MAX_W: SourcedLimit = {
  value: 3000,
  unit: 'W',
  source: 'common trade practice (3 kW appliance on a 13 A fuse), no published source',
};

// ─── Concealed cables in walls ───────────────────────────────────────────────

export const SAFE_ZONE_MAX_DEPTH_MM: SourcedLimit = {
  value: 50,
  unit: 'mm',
  source: `${BS7671} Reg 522.6.202`,
};

export const SAFE_ZONE_TOP_OF_WALL_MM: SourcedLimit = {
  value: 150,
  unit: 'mm',
  source: `${BS7671} Reg 522.6.202 (zone within 150 mm of the top of the wall)`,
};

export const SAFE_ZONE_ANGLE_MM: SourcedLimit = {
  value: 150,
  unit: 'mm',
  source: `${BS7671} Reg 522.6.202 (zone within 150 mm of an angle of two adjoining walls)`,
};

export const SAFE_ZONE_THROUGH_WALL_MAX_THICKNESS_MM: SourcedLimit = {
  value: 100,
  unit: 'mm',
  source: `${BS7671} Reg 522.6.202 (zones extend to the reverse side of walls up to 100 mm thick)`,
};

export const SAFE_ZONE_RCD_MAX_MA: SourcedLimit = {
  value: 30,
  unit: 'mA',
  source: `${BS7671} Reg 522.6.202`,
};

// ─── Structured cabling ──────────────────────────────────────────────────────

export const CHANNEL_MAX_LENGTH_M: SourcedLimit = {
  value: 100,
  unit: 'm',
  source: 'ANSI/TIA-568 and ISO/IEC 11801 (channel, including cords)',
};

export const PERMANENT_LINK_MAX_LENGTH_M: SourcedLimit = {
  value: 90,
  unit: 'm',
  source: 'ANSI/TIA-568 and ISO/IEC 11801 (permanent link)',
};

// ─── Tests for a certificate ────────────────────────────────────────────────

/** Step 3 of the ring test: the highest R1+R2 should sit close to (r1 + r2) / 4. */
export const RING_R1R2_TOLERANCE_OHM: SourcedLimit = {
  value: 0.05,
  unit: 'Ω',
  source: `common trade practice, with the ${GN3} step 3 expectation of (r1 + r2) / 4, no published tolerance`,
};

export const REDUCED_INSULATION_TEST_V: SourcedLimit = {
  value: 250,
  unit: 'V',
  source: `${BS7671} Reg 643.3.3 (250 V DC between live conductors and earth where equipment may affect the result)`,
};

/** Exact SI value; 3 × 10⁸ would read about 0.07 % long. */
export const SPEED_OF_LIGHT_M_PER_S: SourcedLimit = {
  value: 299_792_458,
  unit: 'm/s',
  source: 'SI definition of the metre (c = 299 792 458 m/s)',
};

// ─── The rule set ────────────────────────────────────────────────────────────

export const UK_BS7671_2018_A2_2022: RuleSet = freezeRuleSet({
  id: 'uk-bs7671-2018-a2-2022',
  name: 'United Kingdom: BS 7671:2018+A2:2022 with IET On-Site Guide and Guidance Note 3; TIA-568 / ISO/IEC 11801 cabling',
  edition: BS7671,
  // Published and in force from 28 March 2022 (A1:2020 could still be used until 27 September 2022; M).
  effectiveFrom: '2022-03-28',
  country: 'GB',
  nominalVoltageV: UK_NOMINAL_VOLTAGE_V,
  conductors: {
    copperResistance: COPPER_RESISTANCE_20C_MOHM_PER_M,
    referenceTempC: 20,
    temperatureCoefficient: COPPER_TEMPERATURE_COEFFICIENT,
    // Colder than any UK site, hotter than a thermosetting cable's final fault temperature.
    temperatureRangeC: { min: -40, max: 250 },
  },
  ring: {
    endToEndTolerance: RING_END_TO_END_TOLERANCE_OHM,
    r2RatioTolerance: RING_R2_RATIO_TOLERANCE,
    r2AbsoluteTolerance: RING_R2_ABSOLUTE_TOLERANCE_OHM,
  },
  earthFaultLoop: {
    circuitBreakers: { B: MAX_ZS_TYPE_B, C: MAX_ZS_TYPE_C, D: MAX_ZS_TYPE_D },
    fuses: { 'BS 88-2': MAX_ZS_BS88_2, 'BS 88-3': MAX_ZS_BS88_3, 'BS 3036': MAX_ZS_BS3036, 'BS 1362': MAX_ZS_BS1362 },
    coldTestFactor: ZS_COLD_TEST_FACTOR,
    coldTestLimitDecimals: ZS_COLD_TEST_LIMIT_DECIMALS,
  },
  insulation: {
    source: INSULATION_TABLE_SOURCE,
    bands: [
      { upToNominalV: 50, circuit: 'SELV and PELV circuits', testVoltageV: 250, minimumMegaohms: 0.5 },
      { upToNominalV: 500, circuit: 'circuits up to and including 500 V', testVoltageV: 500, minimumMegaohms: 1.0 },
      { upToNominalV: 1000, circuit: 'circuits above 500 V', testVoltageV: 1000, minimumMegaohms: 1.0 },
    ],
  },
  rcd: {
    times: {
      general: {
        1: { max: RCD_GENERAL_MAX_MS_AT_1X },
        5: { max: RCD_GENERAL_MAX_MS_AT_5X },
      },
      S: {
        1: { max: RCD_TYPE_S_MAX_MS_AT_1X, min: RCD_TYPE_S_MIN_MS_AT_1X },
        5: { max: RCD_TYPE_S_MAX_MS_AT_5X, min: RCD_TYPE_S_MIN_MS_AT_5X },
      },
    },
    additionalProtectionMaxMa: RCD_ADDITIONAL_PROTECTION_MAX_MA,
    maxZsByRatedMa: MAX_ZS_RCD_PROTECTED,
  },
  voltageDrop: {
    flatTwinAndEarth: FLAT_TWIN_AND_EARTH_MV_PER_A_PER_M,
    limitsPercent: { lighting: VOLTAGE_DROP_LIGHTING_PERCENT, other: VOLTAGE_DROP_OTHER_PERCENT },
  },
  fuses: {
    plugAndFcuRatingsA: PLUG_AND_FCU_FUSE_RATINGS_A,
    ratingsSource: PLUG_AND_FCU_FUSE_SOURCE,
    largestFuseCustomaryMaxW: FUSE_13A_CUSTOMARY_MAX_W,
  },
  safeZones: {
    maxDepthMm: SAFE_ZONE_MAX_DEPTH_MM,
    topOfWallBandMm: SAFE_ZONE_TOP_OF_WALL_MM,
    angleBandMm: SAFE_ZONE_ANGLE_MM,
    throughWallMaxThicknessMm: SAFE_ZONE_THROUGH_WALL_MAX_THICKNESS_MM,
    rcdMaxMa: SAFE_ZONE_RCD_MAX_MA,
    metallicPartsSource: `${BS7671} Reg 522.6.203`,
    protectionMethodsSource: `${BS7671} Reg 522.6.204`,
  },
  circuitTests: {
    // The model minor works certificate lists these tests for the altered circuit.
    requiredTestsSource: `${BS7671} Appendix 6 (model minor electrical installation works certificate: test results of the altered circuit)`,
    polaritySource: `${BS7671} Reg 643.6`,
    protectiveConductorSource: `${BS7671} Reg 643.2.1`,
    ringR1R2Tolerance: RING_R1R2_TOLERANCE_OHM,
    reducedInsulationTestV: REDUCED_INSULATION_TEST_V,
    rcdButtonSource: `${BS7671} Reg 643.8 and Appendix 6 (RCD test button operation)`,
  },
  cabling: {
    lengthLimitsM: { channel: CHANNEL_MAX_LENGTH_M, 'permanent-link': PERMANENT_LINK_MAX_LENGTH_M },
    pinAssignmentSource: 'ANSI/TIA-568 T568A and T568B pin assignments',
    wiremapSource: 'ANSI/TIA-568 field test wiremap',
    speedOfLight: SPEED_OF_LIGHT_M_PER_S,
  },
  beforeWork: {
    cableCapacity: FLAT_TWIN_AND_EARTH_CAPACITY,
    semiEnclosedFuseFactor: BS3036_FACTOR,
    cpcK: CPC_K_VALUES,
    adiabaticSource: ADIABATIC_SOURCE,
    rcdRequirements: RCD_REQUIREMENT_SOURCES,
    spurs: RING_SPUR_LIMITS,
    operatingTempC: {
      value: 70,
      unit: '°C',
      source: `${BS7671} Table 4D5 (maximum operating temperature of 70 °C thermoplastic cable)`,
    },
  },
});

/**
 * Used whenever a caller passes no rule set and no date: the tables of A2:2022, which A3:2024 left as they were.
 * A certificate names the amendment in force on its completion date instead (`ruleSetInForce`).
 */
export const DEFAULT_RULE_SET: RuleSet = UK_BS7671_2018_A2_2022;
