/**
 * The published figures behind the checks made before breaking into a circuit: current-carrying capacity,
 * rating factors, k values for the cpc, where 30 mA RCDs, AFDDs and SPDs are called for, and the customary
 * limits for spurs from a ring final circuit. Part of the United Kingdom rule set.
 */
import { INSTALLATION_METHODS, type InstallationMethod } from '../electrical/before-work-choices.js';
import type { SourcedLimit } from './rule-set.js';

export { INSTALLATION_METHODS, type InstallationMethod };

const BS7671 = 'BS 7671:2018+A2:2022';
/** The edition of the guide the spur limits are quoted from; its section number is as quoted on public pages. */
const OSG = 'IET On-Site Guide (BS 7671:2018+A2:2022 edition) §7.2.2';


export interface InstallationMethodTable {
  readonly source: string;
  readonly unit: 'A';
  /** Reference method → conductor cross-section (mm²) → tabulated current-carrying capacity It (A). */
  readonly rows: Readonly<Record<InstallationMethod, Readonly<Record<number, number>>>>;
  /** How each reference method is installed, in our own words. */
  readonly descriptions: Readonly<Record<InstallationMethod, string>>;
  /** Where the rating factors the caller applies are tabulated. */
  readonly factorsSource: string;
}

/**
 * 70 °C thermoplastic flat twin-and-earth, copper, single-phase, ambient 30 °C. Methods 102 and 103 were seen on
 * one public source; the other columns are from memory and are marked so in the tests.
 */
export const FLAT_TWIN_AND_EARTH_CAPACITY: InstallationMethodTable = {
  source: `${BS7671} Appendix 4 Table 4D5 (70 °C thermoplastic flat twin and earth, current-carrying capacity)`,
  unit: 'A',
  rows: {
    A: { 1: 11.5, 1.5: 14.5, 2.5: 20, 4: 26, 6: 32, 10: 44, 16: 57 },
    C: { 1: 16, 1.5: 20, 2.5: 27, 4: 37, 6: 47, 10: 64, 16: 85 },
    '100': { 1: 13, 1.5: 16, 2.5: 21, 4: 27, 6: 34, 10: 45, 16: 57 },
    '101': { 1: 10.5, 1.5: 13, 2.5: 17, 4: 22, 6: 27, 10: 36, 16: 46 },
    '102': { 1: 13, 1.5: 16, 2.5: 21, 4: 27, 6: 35, 10: 47, 16: 63 },
    '103': { 1: 8, 1.5: 10, 2.5: 13.5, 4: 17.5, 6: 23.5, 10: 32, 16: 42.5 },
  },
  descriptions: {
    A: 'In conduit in a thermally insulated wall',
    C: 'Clipped to the surface or buried in plaster or masonry, not in insulation',
    '100': 'Above a plasterboard ceiling, under insulation up to 100 mm',
    '101': 'Above a plasterboard ceiling, under insulation over 100 mm',
    '102': 'In an insulated stud wall, touching the inner face of the board',
    '103': 'In an insulated stud wall, not touching the board',
  },
  factorsSource: `${BS7671} Appendix 4 Tables 4B1 (ambient), 4C1 (grouping) and 52.2 (thermal insulation)`,
};

/** A semi-enclosed (rewirable) fuse needs the capacity it protects to be derated. */
export const BS3036_FACTOR: SourcedLimit = {
  value: 0.725,
  unit: 'factor',
  source: `${BS7671} Appendix 4 §5.1.1 (BS 3036 semi-enclosed fuse, Cf = 0.725)`,
};

export type CpcArrangement = 'in-cable' | 'separate' | 'armour';
export type CpcInsulation = '70C-thermoplastic' | '90C-thermoplastic' | '90C-thermosetting';

export interface KValueTable {
  readonly source: string;
  readonly arrangement: string;
  /** Conductor material (copper for `in-cable` and `separate`, steel for `armour`) → k by insulation. */
  readonly material: string;
  readonly values: Readonly<Record<CpcInsulation, number>>;
}

/** k for conductors up to 300 mm²; the larger sizes' values are not carried. */
export const CPC_K_VALUES: Readonly<Record<CpcArrangement, KValueTable>> = {
  'in-cable': {
    source: `${BS7671} Table 54.3`,
    arrangement: 'protective conductor in the cable or bunched with cables',
    material: 'copper',
    values: { '70C-thermoplastic': 115, '90C-thermoplastic': 100, '90C-thermosetting': 143 },
  },
  separate: {
    source: `${BS7671} Table 54.2`,
    arrangement: 'insulated protective conductor not in a cable and not bunched with cables',
    material: 'copper',
    values: { '70C-thermoplastic': 143, '90C-thermoplastic': 143, '90C-thermosetting': 176 },
  },
  armour: {
    source: `${BS7671} Table 54.4`,
    arrangement: 'steel armour of the cable as the protective conductor',
    material: 'steel',
    values: { '70C-thermoplastic': 51, '90C-thermoplastic': 46, '90C-thermosetting': 46 },
  },
};

export const ADIABATIC_SOURCE = `${BS7671} Reg 543.1.3 (S = √(I²t) / k)`;

export interface RcdRequirementSources {
  readonly sockets: SourcedLimit;
  readonly outdoorMobile: SourcedLimit;
  readonly dwellingLuminaires: string;
  readonly concealedShallow: SourcedLimit;
  readonly metalWall: string;
  readonly bathroom: string;
  readonly afdd: string;
  readonly spd: string;
  readonly riskAssessmentException: string;
}

export const RCD_REQUIREMENT_SOURCES: RcdRequirementSources = {
  sockets: { value: 32, unit: 'A', source: `${BS7671} Reg 411.3.3 (socket-outlets rated up to 32 A)` },
  outdoorMobile: { value: 32, unit: 'A', source: `${BS7671} Reg 411.3.3 (mobile equipment used outdoors, up to 32 A)` },
  dwellingLuminaires: `${BS7671} Reg 411.3.4 (final circuits supplying luminaires in domestic premises)`,
  concealedShallow: { value: 50, unit: 'mm', source: `${BS7671} Reg 522.6.202` },
  metalWall: `${BS7671} Reg 522.6.203`,
  bathroom: `${BS7671} Section 701 (Reg 701.411.3.3)`,
  afdd: `${BS7671} Reg 421.1.7`,
  spd: `${BS7671} Reg 443.4`,
  riskAssessmentException: `${BS7671} Reg 411.3.3 exception (not a dwelling; documented risk assessment)`,
};

export interface SpurLimits {
  /** Single or twin socket-outlets, or fused connection units, one unfused spur may feed. */
  readonly accessoriesPerUnfusedSpur: SourcedLimit;
  readonly spursNotMoreThanPoints: string;
  readonly noSpurFromSpur: string;
}

export const RING_SPUR_LIMITS: SpurLimits = {
  accessoriesPerUnfusedSpur: { value: 1, unit: 'accessory', source: `${OSG}; ${BS7671} Appendix 15` },
  spursNotMoreThanPoints: `${OSG} (unfused spurs no more than the socket-outlets and stationary equipment connected directly in the ring)`,
  noSpurFromSpur: `common trade practice, following ${BS7671} Appendix 15 (spurs are taken from the ring, never from another spur), no published wording`,
};

/**
 * A circuit-breaker's instantaneous (magnetic) trip: at or above this multiple of In it opens within 0.1 s,
 * the time used in the adiabatic check. Below it the time must be read from the device's own curve.
 */
export const BREAKER_INSTANT_TRIP = {
  multiples: { B: 5, C: 10, D: 20 },
  timeS: 0.1,
  unit: 's',
  source: 'BS EN 60898-1 instantaneous tripping (type B up to 5 In, C up to 10 In, D up to 20 In); 0.1 s as read from the curves in BS 7671:2018+A2:2022 Appendix 3, common trade practice',
} as const;

/** A BS 1363 socket-outlet, the rating the RCD requirement is judged at for socket-outlet points. */
export const SOCKET_OUTLET_RATING_A = { value: 13, unit: 'A', source: 'BS 1363 socket-outlets (13 A)' } as const;

/** Ring design loading at the furthest point, used as the design current of a ring's cable. */
export const RING_DESIGN_CURRENT_A = { value: 20, unit: 'A', source: `${OSG} (20 A at the furthest point)` } as const;
