/**
 * The same records, given to the phone's sign-off and to the server's issue check, must get the same answer. Each
 * case is plain rows of one visit at one site, and what both must say: whether the certificate can be issued, and
 * every finding in order. The site, its board and the visit's job are left to each side to make.
 *
 * Readings are those of the demo's ring (32 A type B circuit-breaker, 30 mA type A RCD, 2.5/1.5 mm² twin and
 * earth, TN-C-S), with each check value's published source beside it.
 */
import type { FieldValue } from '../sync/protocol.js';
import type { MinorWorksFindingKind } from './minor-works.js';

/** A row as a push would send it: its id and its fields. */
export interface CaseRow {
  readonly id: string;
  readonly [field: string]: FieldValue;
}

export interface MinorWorksCase {
  readonly name: string;
  readonly earthing: string;
  /** Fields of the site's one board beyond its name, which each side gives it ("Consumer unit"). */
  readonly board: Record<string, FieldValue>;
  /** The site's circuits. */
  readonly circuits: readonly CaseRow[];
  /** The visit's sign-off, as the phone writes it when the visit is finished. */
  readonly visit: CaseRow;
  readonly tests: readonly CaseRow[];
  readonly pointChanges: readonly CaseRow[];
  readonly expected: {
    readonly issuable: boolean;
    readonly findings: readonly { readonly kind: MinorWorksFindingKind; readonly what: string }[];
  };
}

/** Ids as the product makes them (UUID version 7), fixed and different in every case. */
const idOf = (caseNo: number, n: number) => `01900000-0000-7000-8${String(caseNo).padStart(3, '0')}-${String(n).padStart(12, '0')}`;

/** A signature as the phone's signature pad draws it: the certificate prints it, so it must be a real drawing. */
const SIGNATURE =
  '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 100"><path d="M10 80 C 40 10 60 10 80 70 S 140 20 290 40" fill="none" stroke="#111" stroke-width="3"/></svg>';
const SIGNED = { status: 'finished', signedByName: 'Aled Pryce', signedAt: '2026-03-14T11:00:00.000Z', signatureSvg: SIGNATURE, departures: null, departureEntries: null };

const RING = { number: '1', description: 'Sockets, ground floor', kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 };
const COOKER = { number: '4', description: 'Cooker', kind: 'radial', deviceType: 'B', deviceRatingA: 32, liveCsaMm2: 6, cpcCsaMm2: 2.5 };

// r1 = rn = 0.37 Ω, r2 = 0.61 Ω: r1 and rn within 0.05 Ω (IET GN3 9th ed. 2022, ring continuity step 1); r2 within
//   3 % of 1.633 × r1 (IEC 60228:2004 Table 1, 12.10 / 7.41 mΩ/m for 1.5 and 2.5 mm²; 3 % is common trade practice).
// R1+R2 = 0.25 Ω against (0.37 + 0.61) / 4 = 0.245 Ω (GN3 step 3; the 0.05 Ω tolerance is common trade practice).
// Insulation 200 MΩ at 500 V DC against 1.0 MΩ (BS 7671:2018+A2:2022 Table 64).
// Zs 0.52 Ω against 0.8 × 1.37 = 1.10 Ω (BS 7671:2018+A2:2022 Table 41.3, B32; Appendix 3, 80 % rule, trade practice).
// RCD 24 ms at 30 mA against 300 ms (BS 7671:2018+A2:2022 Reg 643.8).
const SOUND = {
  r1Ohm: 0.37, rnOhm: 0.37, r2Ohm: 0.61, r1r2Ohm: 0.25, irLiveLiveMOhm: 200, irLiveEarthMOhm: 200, irTestVoltageV: 500,
  polarity: 'correct', zsOhm: 0.52, rcdTripMs: 24, instrument: 'Multifunction tester',
};
// Zs 1.25 Ω is above 0.8 × 1.37 = 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3; Appendix 3, trade practice).
const HIGH_ZS = 1.25;
const ZS_FAIL = 'Circuit 1 (Sockets, ground floor): Earth fault loop impedance Zs';

function visitCase(
  caseNo: number,
  name: string,
  rows: {
    earthing?: string;
    visit?: Record<string, FieldValue>;
    /** Given the visit's id, as fields that point at it need. */
    board?: (visitId: string) => Record<string, FieldValue>;
    circuits?: ((visitId: string) => Record<string, FieldValue>)[];
    tests: ((circuitIds: string[]) => Record<string, FieldValue>)[];
    pointChanges?: ((circuitIds: string[]) => Record<string, FieldValue>)[];
  },
  expected: MinorWorksCase['expected'],
): MinorWorksCase {
  const visitId = idOf(caseNo, 1);
  const circuits = (rows.circuits ?? [() => RING]).map((c, i) => ({ id: idOf(caseNo, 100 + i), ...c(visitId) }));
  const ids = circuits.map((c) => c.id);
  return {
    name,
    earthing: rows.earthing ?? 'TN-C-S',
    board: rows.board?.(visitId) ?? {},
    circuits,
    visit: { id: visitId, ...SIGNED, ...rows.visit },
    tests: rows.tests.map((t, i) => ({ id: idOf(caseNo, 200 + i), ...t(ids) })),
    pointChanges: (rows.pointChanges ?? []).map((p, i) => ({ id: idOf(caseNo, 300 + i), ...p(ids) })),
    expected,
  };
}

const tested = (at: string, readings: Record<string, FieldValue> = {}, which = 0) => (ids: string[]): Record<string, FieldValue> => ({ circuitId: ids[which] ?? null, testedAt: at, ...SOUND, ...readings });

export const MINOR_WORKS_CASES: readonly MinorWorksCase[] = [
  visitCase(1, 'a sound ring, tested once', { tests: [tested('2026-03-14T10:30:00.000Z')] }, { issuable: true, findings: [] }),
  visitCase(
    2,
    'a retest after putting a high Zs right replaces the failing test',
    { tests: [tested('2026-03-14T10:40:00.000Z'), tested('2026-03-14T10:05:00.000Z', { zsOhm: HIGH_ZS })] },
    { issuable: true, findings: [] },
  ),
  visitCase(
    3,
    'a retest that fails is what the certificate carries',
    { tests: [tested('2026-03-14T10:05:00.000Z'), tested('2026-03-14T10:40:00.000Z', { zsOhm: HIGH_ZS })] },
    { issuable: false, findings: [{ kind: 'fail', what: ZS_FAIL }] },
  ),
  visitCase(
    4,
    'polarity and the RCD time not recorded',
    { tests: [tested('2026-03-14T10:30:00.000Z', { polarity: null, rcdTripMs: null })] },
    {
      issuable: false,
      findings: [
        { kind: 'missing', what: 'Circuit 1 (Sockets, ground floor): Polarity' },
        // The time at IΔn is the one RCD test the model certificate needs (BS 7671:2018+A2:2022 Reg 643.8, Appendix 6; from memory, M).
        { kind: 'missing', what: 'Circuit 1 (Sockets, ground floor): RCD operating time at 30 mA' },
      ],
    },
  ),
  visitCase(
    5,
    'a departure written in the sign-off does not carry a failing Zs onto the certificate',
    {
      visit: {
        departures: 'Zs on circuit 1 is high: the supply earth is to be improved by the network operator.',
        departureEntries: [{ regulation: '411.3.2', instead: 'The supply earth is to be improved by the network operator.', noLessSafe: 'The RCD trips in 24 ms.' }],
      },
      tests: [tested('2026-03-14T10:30:00.000Z', { zsOhm: HIGH_ZS })],
    },
    { issuable: false, findings: [{ kind: 'fail', what: ZS_FAIL }] },
  ),
  visitCase(
    6,
    'an altered circuit with no test, and a test that names no circuit',
    {
      circuits: [() => RING, () => COOKER],
      tests: [tested('2026-03-14T10:30:00.000Z'), (ids) => ({ ...tested('2026-03-14T10:35:00.000Z')(ids), circuitId: null })],
      pointChanges: [(ids) => ({ circuitId: ids[1] ?? null, action: 'add' })],
    },
    {
      issuable: false,
      findings: [
        { kind: 'no-circuit', what: 'A test result recorded 2026-03-14' },
        { kind: 'untested', what: 'Circuit 4 (Cooker)' },
      ],
    },
  ),
  visitCase(
    7,
    'a Zs that no table judges blocks the certificate until it is judged',
    // Fault protection by an RCD whose rated residual current is not recorded: Table 41.5's 50 V / IΔn cannot be
    // worked out (BS 7671:2018+A2:2022 Reg 411.5.3). A rating no table lists (a 30 A BS 88-3) is refused before it
    // is saved, by core's circuit-details check on both sides.
    { circuits: [() => ({ ...COOKER, faultProtection: 'rcd' })], tests: [tested('2026-03-14T10:30:00.000Z')] },
    { issuable: false, findings: [{ kind: 'unjudged', what: 'Circuit 4 (Cooker): Earth fault loop impedance Zs' }] },
  ),
  visitCase(
    8,
    'fault protection recorded as by the RCD on a TT supply holds Zs to Table 41.5',
    // Zs 38.6 Ω against 50 V / 30 mA = 1667 Ω (BS 7671:2018+A2:2022 Table 41.5, Reg 411.5.3).
    { earthing: 'TT', circuits: [() => ({ ...RING, faultProtection: 'rcd' })], tests: [tested('2026-03-14T10:30:00.000Z', { zsOhm: 38.6 })] },
    { issuable: true, findings: [] },
  ),
  visitCase(
    9,
    'the same TT reading without the method recorded is judged against the circuit-breaker, and fails',
    // Zs 38.6 Ω is far above 0.8 × 1.37 = 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3; Appendix 3, trade practice).
    { earthing: 'TT', tests: [tested('2026-03-14T10:30:00.000Z', { zsOhm: 38.6 })] },
    { issuable: false, findings: [{ kind: 'fail', what: ZS_FAIL }] },
  ),
  visitCase(
    10,
    'a new circuit needs an installation certificate',
    { circuits: [(visitId) => ({ ...COOKER, newOnVisitId: visitId })], tests: [tested('2026-03-14T10:30:00.000Z')] },
    { issuable: false, findings: [{ kind: 'new-circuit', what: 'Circuit 4 (Cooker)' }] },
  ),
  visitCase(
    11,
    'a replaced consumer unit needs an installation certificate',
    { board: (visitId) => ({ replacedOnVisitId: visitId }), tests: [tested('2026-03-14T10:30:00.000Z')] },
    { issuable: false, findings: [{ kind: 'board-replaced', what: 'Board Consumer unit' }] },
  ),
  visitCase(
    12,
    'a departure that does not say why it is no less safe',
    {
      visit: { departureEntries: [{ regulation: '522.6.202', instead: 'Cable run outside the safe zone in earthed steel conduit.', noLessSafe: '' }] },
      tests: [tested('2026-03-14T10:30:00.000Z')],
    },
    { issuable: false, findings: [{ kind: 'departure-incomplete', what: 'Departure 1 from the standard' }] },
  ),
  visitCase(
    13,
    'a complete departure beside sound readings is issued with it',
    {
      visit: {
        departureEntries: [{ regulation: '522.6.202', instead: 'Cable run outside the safe zone in earthed steel conduit (Reg 522.6.204).', noLessSafe: 'The earthed conduit gives the protection the zone would.' }],
      },
      tests: [tested('2026-03-14T10:30:00.000Z')],
    },
    { issuable: true, findings: [] },
  ),
];
