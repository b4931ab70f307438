/**
 * The synced entities of Wiretrail and their fields, shared by the server (validation, merge policy, scope)
 * and the app (local tables). Field names are the product's camelCase names.
 */
import { INSTALLATION_METHODS, POINT_LOCATIONS, RCD_CIRCUIT_KINDS } from '../electrical/before-work-choices.js';
import { isBlankText } from '../text/typed-text.js';
import type { RecordedWiremap } from '../cabling/cable-test.js';
import type { DatumMark, MarkedAccessory, MarkedRoute } from '../electrical/hidden-routes.js';
import { LIMIT_SETS } from '../cabling/link-performance.js';
import { FIBRE_MODES } from '../cabling/fibre-loss.js';

export const SYNC_ENTITY_NAMES = [
  'customer', 'site', 'area', 'board', 'circuit', 'job', 'visit', 'photo', 'note', 'cableRun', 'pointChange', 'testResult', 'document', 'conflict',
  'priceItem', 'materialLine', 'linkTest', 'photoMarkup',
] as const;
export type SyncEntityName = (typeof SYNC_ENTITY_NAMES)[number];
/** Rows a field may point at: synced entities, and users (technicians on a visit). */
export type RefTarget = SyncEntityName | 'user';

export type FieldType =
  | { kind: 'string'; max: number }
  | { kind: 'number'; min?: number; max?: number }
  | { kind: 'integer'; min?: number; max?: number }
  | { kind: 'boolean' }
  | { kind: 'datetime' }
  | { kind: 'ref'; entity: RefTarget }
  | { kind: 'refs'; entity: RefTarget }
  | { kind: 'enum'; values: readonly string[] }
  // `shape` is never set: it carries, for the type system only, what a JSON field holds.
  | { kind: 'json'; readonly shape?: unknown };

/**
 * How a field changed by two people at once is settled:
 * - `office`: the office owns it (customer details, addresses, schedule, price). The stored value stays
 *   unless the incoming author's role outranks the one who wrote it.
 * - `observed`: seen on site (readings, statuses, answers). The later hybrid logical clock wins.
 * Either way the value not kept goes into a Conflict row.
 */
export type MergePolicy = 'office' | 'observed';

export interface FieldSpec {
  readonly type: FieldType;
  readonly policy: MergePolicy;
  /** Must be given when the row is created. */
  readonly required?: boolean;
  /** A technician may set this field (within rows they may write). */
  readonly technician?: boolean;
  /** Never sent to a technician's phone: the office's business, not what work on site needs (a cost price). */
  readonly officeOnly?: boolean;
}

/**
 * Who among technicians may write rows of an entity:
 * - `visit`: rows of a visit assigned to them;
 * - `site`: rows of a site one of their visits is at;
 * - `assigned-visit`: the visit row itself, when assigned to them;
 * - `site-row`: the site row itself, for a site one of their visits is at;
 * - `none`: office and admin only.
 * Whatever the row, a technician sets only the fields marked `technician`.
 */
export type TechnicianWrite = 'visit' | 'site' | 'assigned-visit' | 'site-row' | 'none';

export interface EntitySpec {
  readonly name: SyncEntityName;
  readonly table: string;
  readonly fields: Readonly<Record<string, FieldSpec>>;
  readonly technicianWrite: TechnicianWrite;
  /** Created once, never merged: two devices adding notes never conflict. */
  readonly appendOnly?: boolean;
  /** Whether technicians receive these rows at all (in their scope). */
  readonly technicianVisible: boolean;
  /** The field that ties the row to a site, for scoping; `id` for the site itself. */
  readonly siteField: 'siteId' | 'id' | null;
  /** The field that ties the row to a visit, for technician writes and document locks. */
  readonly visitField: 'visitId' | 'id' | null;
  /** Only the server writes these rows (conflicts, issued documents): a push that names one is refused. */
  readonly serverOnly?: boolean;
  /** Belongs to the whole organisation, not a site: every technician receives it (the price list, to pick parts offline). */
  readonly organisationWide?: boolean;
}

// The helpers keep each field's kind, limits and enum values literal, so that row types can be derived below.
const str = (max = 200) => ({ kind: 'string', max }) as const;
const text = () => ({ kind: 'string', max: 20_000 }) as const;
const num = (min?: number, max?: number) => ({ kind: 'number', min, max }) as const;
const int = (min?: number, max?: number) => ({ kind: 'integer', min, max }) as const;
const ref = <E extends RefTarget>(entity: E) => ({ kind: 'ref', entity }) as const;
const refs = <E extends RefTarget>(entity: E) => ({ kind: 'refs', entity }) as const;
const oneOf = <const V extends readonly string[]>(...values: V) => ({ kind: 'enum', values }) as const;
const bool = { kind: 'boolean' } as const satisfies FieldType;
const when = { kind: 'datetime' } as const satisfies FieldType;
const json = { kind: 'json' } as const satisfies FieldType;
/** A JSON field whose contents have a shape we can name. */
const jsonOf = <T>(): { readonly kind: 'json'; readonly shape?: T } => ({ kind: 'json' });

interface TypedFieldSpec<T extends FieldType, P extends MergePolicy, R extends boolean> extends FieldSpec {
  readonly type: T;
  readonly policy: P;
  readonly required: R;
}
function office<T extends FieldType>(type: T): TypedFieldSpec<T, 'office', false>;
function office<T extends FieldType>(type: T, required: true): TypedFieldSpec<T, 'office', true>;
function office(type: FieldType, required = false): FieldSpec {
  return { type, policy: 'office', required };
}
function seen<T extends FieldType>(type: T): TypedFieldSpec<T, 'observed', false> & { readonly technician: true };
function seen<T extends FieldType>(type: T, required: true): TypedFieldSpec<T, 'observed', true> & { readonly technician: true };
function seen(type: FieldType, required = false): FieldSpec {
  return { type, policy: 'observed', required, technician: true };
}

/**
 * A record made by mistake on site is voided with a reason, never deleted: the office still sees it (struck through,
 * with the reason), and no count, label or document takes it in. A technician voids only while the visit it was
 * recorded on is not finished, and nobody voids what an issued document holds (the server's rule, void-rules.ts).
 */
const voidable = { voidedAt: seen(when), voidReason: seen(str(500)) } as const;

export const EARTHING_ARRANGEMENTS = ['TN-C-S', 'TN-S', 'TT'] as const;
export const JOB_STATUSES = ['enquiry', 'booked', 'on-site', 'paperwork', 'done', 'cancelled'] as const;
export const VISIT_STATUSES = ['planned', 'on-site', 'finished', 'cancelled'] as const;
export const CIRCUIT_KINDS = ['ring', 'radial', 'lighting', 'other'] as const;
export const PROTECTIVE_DEVICES = ['B', 'C', 'D', 'BS 88-2', 'BS 88-3', 'BS 3036', 'BS 1362'] as const;
/**
 * How a circuit is protected against electric shock under fault: by its overcurrent protective device (Zs held to
 * Tables 41.2 to 41.4) or by an RCD (Table 41.5). The technician records it; nothing infers it from the earthing.
 */
export const FAULT_PROTECTION_METHODS = ['overcurrent-device', 'rcd'] as const;
/**
 * A departure from the standard as the sign-off records it (BS 7671 Regs 120.3, 133.1.3, 133.5): the regulation
 * departed from, what is done instead, and why that gives no less safety. It never stands in for a test result.
 */
// A type, not an interface, so that it is a plain JSON value a mutation may carry.
export type DepartureEntry = {
  readonly regulation: string;
  readonly instead: string;
  readonly noLessSafe: string;
};
/** How one item of the schedule of inspections was found: inspected, not applicable, or inspected only in part. */
export const INSPECTION_MARK_STATES = ['done', 'not-applicable', 'limitation'] as const;
/** One item's mark on the schedule of inspections; a limitation says what limited it. */
export type InspectionMark = {
  readonly state: (typeof INSPECTION_MARK_STATES)[number];
  readonly note?: string | null;
};
/** The schedule of inspections as a visit recorded it, by item id (core's INSPECTION_ITEMS). */
export type InspectionMarks = { readonly [itemId: string]: InspectionMark };
export const CABLE_MEDIA = ['Cat5e', 'Cat6', 'Cat6A', 'coax', 'speaker', 'HDMI', 'fibre', 'other'] as const;
export const CABLE_STATUSES = ['unidentified', 'traced', 'terminated', 'tested'] as const;
export const TRACE_METHODS = ['tone-and-probe', 'continuity', 'tdr', 'visual'] as const;
/** A link's performance test is of copper (to a limit set) or of fibre (a Tier 1 loss budget). */
export const LINK_TEST_MEDIA = ['copper', 'fibre'] as const;
export const FIBRE_POLARITY_RESULTS = ['correct', 'reversed'] as const;
/** Each end face as inspected through a scope: clean as found, clean once cleaned, or still dirty or damaged. */
export const END_FACE_RESULTS = ['clean', 'cleaned', 'dirty-or-damaged'] as const;
/** What runs beside a data cable, for the separation it needs (BS EN 50174-2). */
export const POWER_CABLE_KINDS = ['unscreened', 'screened'] as const;
export const DATA_CABLE_KINDS = ['unscreened-twisted-pair', 'screened-twisted-pair', 'coax', 'fibre'] as const;
export const SEGREGATION_CONTAINMENTS = ['none', 'open-metallic', 'perforated-metallic', 'solid-metallic'] as const;
/** Euroclasses of reaction to fire for cables (BS EN 13501-6), as printed on the drum. */
export const CABLE_FIRE_CLASSES = ['Aca', 'B1ca', 'B2ca', 'Cca', 'Dca', 'Eca', 'Fca'] as const;
/** One entry of a cable's trace log: what was put where, what was heard, and what the cable turned out to be. */
// A type, not an interface, so that it is a plain JSON value a mutation may carry.
export type TraceEntry = {
  readonly at: string;
  readonly connectedAt: string;
  readonly heardAt: string;
  readonly turnedOut: string;
  readonly visitId?: string;
};
export const POINT_ACTIONS = ['add', 'move', 'remove', 'replace'] as const;
export const POINT_CONNECTIONS = ['ring-extension', 'unfused-spur', 'fused-spur', 'radial'] as const;
export const PHOTO_SUBJECTS = ['cableRun', 'pointChange', 'circuit'] as const;
export const DOCUMENT_KINDS = ['minor-works', 'cabling-report', 'photo-record', 'installation-certificate', 'hidden-routes'] as const;
export const DOCUMENT_EMAIL_STATES = ['queued', 'sent', 'failed'] as const;
/** What a cabling report covers: the cables recorded or tested on the job's visits, or the site's whole schedule. */
export const DOCUMENT_COVERAGES = ['job', 'site'] as const;
export const LINK_KINDS = ['permanent-link', 'channel'] as const;
export const POLARITY_RESULTS = ['correct', 'incorrect'] as const;
export const RCD_BUTTON_RESULTS = ['operates', 'fails'] as const;
/** What a test button does when pressed: the RCD's and the AFDD's alike. */
export const TEST_BUTTON_RESULTS = RCD_BUTTON_RESULTS;
/** The installation's earthing conductor as inspected. */
export const EARTHING_CONDUCTOR_STATES = ['adequate', 'inadequate', 'absent'] as const;
/** Main protective bonding to one service as inspected; `none` where the building has no such service. */
export const BONDING_STATES = ['adequate', 'inadequate', 'absent', 'none'] as const;
/** Test voltages an insulation tester offers (V DC). */
export const INSULATION_TEST_VOLTAGES = [250, 500, 1000] as const;
/** A visit's records lock for technicians once it is finished (signed off on site). */
export const FINISHED_VISIT_STATUS = 'finished';

const REGISTRY = {
  customer: {
    name: 'customer', table: 'customer', technicianWrite: 'none', technicianVisible: true, siteField: null, visitField: null,
    fields: { name: office(str(), true), email: office(str(254)), phone: office(str(50)), address: office(str(500)), notes: office(text()) },
  },
  site: {
    name: 'site', table: 'site', technicianWrite: 'site-row', technicianVisible: true, siteField: 'id', visitField: null,
    fields: {
      customerId: office(ref('customer'), true), name: office(str()), address: office(str(500), true), postcode: office(str(12)),
      accessNotes: office(text()),
      earthing: seen(oneOf(...EARTHING_ARRANGEMENTS)), zeOhm: seen(num(0, 1000)), pfcKa: seen(num(0, 100)),
      // The installation's earthing and main bonding as last inspected, carried to every later certificate.
      earthingConductor: seen(oneOf(...EARTHING_CONDUCTOR_STATES)),
      bondingWater: seen(oneOf(...BONDING_STATES)), bondingGas: seen(oneOf(...BONDING_STATES)), bondingOil: seen(oneOf(...BONDING_STATES)),
      bondingSteel: seen(oneOf(...BONDING_STATES)), bondingOther: seen(oneOf(...BONDING_STATES)), bondingOtherWhat: seen(str(100)),
    },
  },
  area: {
    name: 'area', table: 'area', technicianWrite: 'site', technicianVisible: true, siteField: 'siteId', visitField: null,
    fields: { siteId: seen(ref('site'), true), name: seen(str(), true), level: seen(str(50)) },
  },
  board: {
    name: 'board', table: 'board', technicianWrite: 'site', technicianVisible: true, siteField: 'siteId', visitField: null,
    fields: {
      siteId: seen(ref('site'), true), areaId: seen(ref('area')), name: seen(str(), true), description: seen(str(500)),
      // Earth fault loop impedance measured at the board (Zdb).
      zdbOhm: seen(num(0, 1000)),
      // The visit on which this board was fitted as a replacement: that work needs an installation certificate.
      replacedOnVisitId: seen(ref('visit')),
    },
  },
  circuit: {
    name: 'circuit', table: 'circuit', technicianWrite: 'site', technicianVisible: true, siteField: 'siteId', visitField: null,
    fields: {
      siteId: seen(ref('site'), true), boardId: seen(ref('board'), true), number: seen(str(20), true), description: seen(str(500)),
      kind: seen(oneOf(...CIRCUIT_KINDS)), deviceType: seen(oneOf(...PROTECTIVE_DEVICES)), deviceRatingA: seen(num(0.5, 1000)),
      rcdRatingMa: seen(num(1, 3000)), rcdType: seen(str(20)), liveCsaMm2: seen(num(0.5, 400)), cpcCsaMm2: seen(num(0.5, 400)),
      // One-way cable length to the furthest point: what a radial's R1+R2 should read follows from it.
      lengthM: seen(num(0, 10_000)),
      // What a certificate states of the circuit beyond what its tests need: the devices' product standards, the
      // RCD's rated current, an AFDD where one is fitted, how the cable is installed and what it serves.
      deviceStandard: seen(str(40)), rcdStandard: seen(str(40)), rcdRatedCurrentA: seen(num(1, 1000)), afddStandard: seen(str(40)),
      referenceMethod: seen(str(20)), pointsServed: seen(int(0, 1000)), maxDisconnectionS: seen(num(0.01, 10)),
      faultProtection: seen(oneOf(...FAULT_PROTECTION_METHODS)),
      // The visit on which this circuit was installed new: that work needs an installation certificate.
      newOnVisitId: seen(ref('visit')),
      // The schedule of an installation certificate also states the type of wiring and the device's breaking capacity.
      wiringType: seen(str(40)), deviceBreakingKa: seen(num(0.5, 100)),
      recordedAt: seen(when),
    },
  },
  job: {
    name: 'job', table: 'job', technicianWrite: 'none', technicianVisible: true, siteField: 'siteId', visitField: null,
    fields: {
      siteId: office(ref('site'), true), customerId: office(ref('customer'), true), reference: office(str(40)),
      title: office(str(), true), status: office(oneOf(...JOB_STATUSES)), description: office(text()),
    },
  },
  visit: {
    name: 'visit', table: 'visit', technicianWrite: 'assigned-visit', technicianVisible: true, siteField: 'siteId', visitField: 'id',
    fields: {
      jobId: office(ref('job'), true), siteId: office(ref('site'), true), technicianIds: office(refs('user')),
      plannedStart: office(when), plannedEnd: office(when),
      actualStart: seen(when), actualEnd: seen(when), status: seen(oneOf(...VISIT_STATUSES)),
      // Shown once per visit before work on a circuit; kept as evidence that the cautions were read.
      cautionsReadAt: seen(when),
      // The same for tracing an unknown cable, which may be live.
      tracingCautionReadAt: seen(when),
      // Sign-off on site: what was done, what was seen, where the work departs from the standard, and who signed.
      workDescription: seen(text()), observations: seen(text()),
      // Free text from before departures were structured: kept and shown, but it waives nothing.
      departures: seen(text()),
      departureEntries: seen(jsonOf<readonly DepartureEntry[]>()),
      signedByName: seen(str()), signedAt: seen(when), signatureSvg: seen(str(60_000)),
      // The certificate's declaration names the signer's position; the existing installation is commented on,
      // and a permitted exception (no fault protection where the regulations allow it) names its risk assessment.
      signedByPosition: seen(str(100)), existingInstallationComments: seen(text()), permittedExceptions: seen(text()), riskAssessmentRef: seen(str(200)),
      // The schedule of inspections of an installation certificate, tapped item by item on site.
      inspectionMarks: seen(jsonOf<InspectionMarks>()),
    },
  },
  photo: {
    name: 'photo', table: 'photo', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId', appendOnly: true,
    fields: {
      visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), areaId: seen(ref('area')),
      subjectType: seen(oneOf(...PHOTO_SUBJECTS)), subjectId: seen(str(36)), caption: seen(str(500)), tags: seen(jsonOf<string[]>()),
      takenAt: seen(when), sha256: seen(str(64)), sizeBytes: seen(int(0)), width: seen(int(0)), height: seen(int(0)), uploadState: seen(str(20)),
      ...voidable,
    },
  },
  // recordedAt, on the records a phone makes: when it was made there, set once by the phone. A trail sorts by it, since
  // createdAt is the server's clock when the row arrived, which after a day offline is the moment of the next signal.
  note: {
    name: 'note', table: 'note', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId', appendOnly: true,
    fields: { visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), text: seen(text(), true), recordedAt: seen(when), ...voidable },
  },
  cableRun: {
    name: 'cableRun', table: 'cable_run', technicianWrite: 'site', technicianVisible: true, siteField: 'siteId', visitField: null,
    fields: {
      siteId: seen(ref('site'), true), label: seen(str(100), true), medium: seen(oneOf(...CABLE_MEDIA)),
      endAAreaId: seen(ref('area')), endADescription: seen(str(300)), endATermination: seen(str(100)),
      endBAreaId: seen(ref('area')), endBDescription: seen(str(300)), endBTermination: seen(str(100)),
      status: seen(oneOf(...CABLE_STATUSES)), traceMethod: seen(oneOf(...TRACE_METHODS)), lengthM: seen(num(0, 10_000)),
      nvp: seen(num(0.01, 1)), scheme: seen(oneOf('T568A', 'T568B')), wiremap: seen(jsonOf<RecordedWiremap>()), verdict: seen(oneOf('pass', 'fail', 'check')),
      // Round-trip time read off a TDR, from which lengthM was worked out with nvp.
      tdrNs: seen(num(0, 100_000)), linkKind: seen(oneOf(...LINK_KINDS)), testedAt: seen(when),
      // Cable runs belong to the site; this says on which visit it was last recorded, for that visit's trail.
      lastVisitId: seen(ref('visit')),
      // Tone and probe, step by step, for a cable nobody could name.
      traceLog: seen(jsonOf<readonly TraceEntry[]>()),
      // Run beside power: what power, in what containment and how far side by side, for the separation it needs.
      besidePower: seen(bool), powerCableKind: seen(oneOf(...POWER_CABLE_KINDS)), dataCableKind: seen(oneOf(...DATA_CABLE_KINDS)),
      containment: seen(oneOf(...SEGREGATION_CONTAINMENTS)), parallelRunM: seen(num(0, 10_000)), separationMm: seen(num(0, 10_000)),
      fireClass: seen(oneOf(...CABLE_FIRE_CLASSES)),
      recordedAt: seen(when),
      ...voidable,
    },
  },
  pointChange: {
    name: 'pointChange', table: 'point_change', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId',
    fields: {
      visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), circuitId: seen(ref('circuit')),
      action: seen(oneOf(...POINT_ACTIONS), true), accessoryKind: seen(str(100)),
      fromAreaId: seen(ref('area')), fromDescription: seen(str(300)), fromHeightMm: seen(num(0, 10_000)),
      toAreaId: seen(ref('area')), toDescription: seen(str(300)), toHeightMm: seen(num(0, 10_000)),
      connection: seen(oneOf(...POINT_CONNECTIONS)), liveCsaMm2: seen(num(0.5, 400)), cpcCsaMm2: seen(num(0.5, 400)),
      addedRouteM: seen(num(0, 1000)), fuseRatingA: seen(num(0, 100)), loadW: seen(num(0, 100_000)),
      // The ring's end-to-end readings before it was broken into, for the predicted values after the extension.
      beforeR1Ohm: seen(num(0, 100)), beforeRnOhm: seen(num(0, 100)), beforeR2Ohm: seen(num(0, 100)),
      // A new concealed route drawn on the wall: the safe-zone check's input (wall, accessory, route, depth, RCD).
      concealedRoute: seen(json),
      // Checks before the work. What the point supplies and where, for the RCD requirement; the R1+R2 where a spur or
      // radial joins (a ring extension works it out from the before readings), for the predicted Zs.
      supplies: seen(oneOf(...RCD_CIRCUIT_KINDS)), location: seen(oneOf(...POINT_LOCATIONS)), dwelling: seen(bool),
      joinR1R2Ohm: seen(num(0, 100)),
      // The ring's points and unfused spurs, this one included, and what this spur feeds.
      ringPoints: seen(int(0, 500)), ringUnfusedSpurs: seen(int(0, 500)), spurFeeds: seen(int(0, 50)), spurFromSpur: seen(bool),
      // Sizing a new run: design current, how it is installed and the rating factors for ambient, grouping and insulation.
      designCurrentA: seen(num(0, 1000)), installationMethod: seen(oneOf(...INSTALLATION_METHODS)),
      ambientFactor: seen(num(0.01, 1.25)), groupingFactor: seen(num(0.01, 1)), insulationFactor: seen(num(0.01, 1)),
      recordedAt: seen(when),
      ...voidable,
    },
  },
  testResult: {
    name: 'testResult', table: 'test_result', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId',
    fields: {
      visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), circuitId: seen(ref('circuit')),
      // One field per reading, so two people filling in different readings never collide.
      r1Ohm: seen(num(0, 100)), rnOhm: seen(num(0, 100)), r2Ohm: seen(num(0, 100)), r1r2Ohm: seen(num(0, 100)),
      irLiveLiveMOhm: seen(num(0, 10_000)), irLiveEarthMOhm: seen(num(0, 10_000)), irTestVoltageV: seen(int(50, 5_000)),
      // Over the tester's range ('>299 MΩ' on its display): the reading above is then the instrument's limit, a lower bound.
      irLiveLiveOverRange: seen(bool), irLiveEarthOverRange: seen(bool),
      polarity: seen(oneOf(...POLARITY_RESULTS)), zsOhm: seen(num(0, 2_000)),
      rcdTripMs: seen(num(0, 10_000)), rcdTripMs5x: seen(num(0, 10_000)), rcdButton: seen(oneOf(...RCD_BUTTON_RESULTS)),
      // Protective conductor continuity by the long-lead method, recorded instead of R1+R2.
      r2LeadOhm: seen(num(0, 100)), afddButton: seen(oneOf(...TEST_BUTTON_RESULTS)),
      instrument: seen(str(200)), testedAt: seen(when),
      // What the phone's checks said, with the rule set's id; the server works them out again before issuing.
      verdicts: seen(json),
      recordedAt: seen(when),
      ...voidable,
    },
  },
  document: {
    // Made only by the issue route: no push may create, change or delete one, whatever the role.
    name: 'document', table: 'document', technicianWrite: 'none', technicianVisible: true, siteField: 'siteId', visitField: null, serverOnly: true,
    fields: {
      jobId: office(ref('job'), true), siteId: office(ref('site'), true), kind: office(oneOf(...DOCUMENT_KINDS), true),
      visitId: office(ref('visit')), number: office(str(40)), title: office(str()), signerName: office(str()),
      pdfSha256: office(str(64)), pdfBytes: office(int(0)), issuedAt: office(when), issuedById: office(ref('user')),
      // Sending by e-mail: queued, then sent, or failed with the reason (retried until it gives up).
      emailState: office(oneOf(...DOCUMENT_EMAIL_STATES)), emailedTo: office(str(254)), emailedAt: office(when), emailError: office(str(500)),
      // A correction is a revision: the new document names the one it supersedes and why; the old one is kept, marked superseded.
      supersedesId: office(ref('document')), revisionReason: office(str(1000)),
      supersededAt: office(when), supersededById: office(ref('document')),
      // A cabling report covers the job's cables, or the site's whole schedule when the office chose it at issue.
      coverage: office(oneOf(...DOCUMENT_COVERAGES)),
      // What the office filled in on issuing an installation certificate (supply, origin, responsibilities), kept for its revisions.
      particulars: office(json),
    },
  },
  priceItem: {
    // The organisation's price list: the office keeps it; phones get it to pick parts with no signal.
    name: 'priceItem', table: 'price_item', technicianWrite: 'none', technicianVisible: true, siteField: null, visitField: null, organisationWide: true,
    fields: {
      name: office(str(), true), unit: office(str(20), true), category: office(str(60)), code: office(str(40)),
      costMinor: { ...office(int(0, 100_000_000)), officeOnly: true }, sellMinor: office(int(0, 100_000_000)), vatRateCode: office(str(20)), active: office(bool),
    },
  },
  materialLine: {
    // A part used on a visit: picked from the price list or typed; prices are the office's, on the invoice.
    name: 'materialLine', table: 'material_line', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId',
    fields: {
      visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), priceItemId: seen(ref('priceItem')),
      description: seen(str(), true), quantity: seen(num(0.001, 100_000), true), unit: seen(str(20)),
      recordedAt: seen(when),
    },
  },
  linkTest: {
    // A link's performance results as a field tester reported them, typed on the phone or the desk or imported.
    name: 'linkTest', table: 'link_test', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId',
    fields: {
      visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), cableRunId: seen(ref('cableRun'), true),
      medium: seen(oneOf(...LINK_TEST_MEDIA), true), limitSet: seen(oneOf(...LIMIT_SETS)),
      testerMake: seen(str(100)), testerModel: seen(str(100)), testerSerial: seen(str(100)), calibratedOn: seen(str(10)), adapter: seen(str(100)),
      // Per parameter the worst value and its margin to the limit line, one field each so two people never collide.
      insertionLossDb: seen(num(-200, 200)), insertionLossMarginDb: seen(num(-200, 200)),
      nextDb: seen(num(-200, 200)), nextMarginDb: seen(num(-200, 200)),
      psNextDb: seen(num(-200, 200)), psNextMarginDb: seen(num(-200, 200)),
      acrFDb: seen(num(-200, 200)), acrFMarginDb: seen(num(-200, 200)),
      psAcrFDb: seen(num(-200, 200)), psAcrFMarginDb: seen(num(-200, 200)),
      returnLossDb: seen(num(-200, 200)), returnLossMarginDb: seen(num(-200, 200)),
      acrNDb: seen(num(-200, 200)), acrNMarginDb: seen(num(-200, 200)),
      psAcrNDb: seen(num(-200, 200)), psAcrNMarginDb: seen(num(-200, 200)),
      propagationDelayNs: seen(num(0, 100_000)), delaySkewNs: seen(num(0, 10_000)), dcLoopResistanceOhm: seen(num(0, 10_000)),
      unbalanceWithinPairOhm: seen(num(0, 1000)), unbalanceWithinPairMarginOhm: seen(num(-1000, 1000)),
      unbalanceBetweenPairsOhm: seen(num(0, 1000)), unbalanceBetweenPairsMarginOhm: seen(num(-1000, 1000)),
      pair12LengthM: seen(num(0, 10_000)), pair36LengthM: seen(num(0, 10_000)), pair45LengthM: seen(num(0, 10_000)), pair78LengthM: seen(num(0, 10_000)),
      withinAccuracy: seen(jsonOf<string[]>()),
      // Fibre: the budget's figures, the loss at each wavelength, polarity and the end faces as inspected.
      fibreMode: seen(oneOf(...FIBRE_MODES)), fibreLengthM: seen(num(0, 100_000)), connectorPairs: seen(int(0, 100)), splices: seen(int(0, 100)),
      firstWavelengthNm: seen(int(0, 2000)), firstLossDb: seen(num(0, 100)), secondWavelengthNm: seen(int(0, 2000)), secondLossDb: seen(num(0, 100)),
      polarity: seen(oneOf(...FIBRE_POLARITY_RESULTS)), endFaces: seen(oneOf(...END_FACE_RESULTS)),
      testedAt: seen(when), recordedAt: seen(when),
      ...voidable,
    },
  },
  photoMarkup: {
    // Routes drawn over a photo of an open wall, kept beside the photo (which never changes). Made on the photo's visit
    // and editable until it is finished; each drawn part is a field of its own, so two people editing different parts merge.
    name: 'photoMarkup', table: 'photo_markup', technicianWrite: 'visit', technicianVisible: true, siteField: 'siteId', visitField: 'visitId',
    fields: {
      photoId: seen(ref('photo'), true), visitId: seen(ref('visit'), true), siteId: seen(ref('site'), true), areaId: seen(ref('area')),
      wallName: seen(str(100)),
      wallWidthMm: seen(num(300, 30_000)), wallHeightMm: seen(num(300, 10_000)), wallThicknessMm: seen(num(25, 1_000)),
      routes: seen(jsonOf<MarkedRoute[]>()), datums: seen(jsonOf<DatumMark[]>()), accessories: seen(jsonOf<MarkedAccessory[]>()),
      recordedAt: seen(when),
      ...voidable,
    },
  },
  conflict: {
    name: 'conflict', table: 'conflict', technicianWrite: 'none', technicianVisible: false, siteField: null, visitField: null, serverOnly: true,
    fields: {},
  },
} as const satisfies { readonly [E in SyncEntityName]: EntitySpec & { readonly name: E } };

for (const spec of Object.values(REGISTRY)) Object.freeze(spec);

/** The registry as written, with every field name, kind, enum value and `required` kept literal. */
export type SyncRegistry = typeof REGISTRY;
export const SYNC_REGISTRY: SyncRegistry = Object.freeze(REGISTRY);
/** The same registry seen loosely, for code that walks any entity's fields by name (validation, merge, scope). */
export const SYNC_ENTITIES: Readonly<Record<SyncEntityName, EntitySpec>> = SYNC_REGISTRY;

/** The fields the registry lists for an entity. */
export type EntityFields<E extends SyncEntityName> = SyncRegistry[E]['fields'];
export type EntityFieldName<E extends SyncEntityName> = keyof EntityFields<E> & string;

/** The value a field of this type holds (JSON fields: the shape named in the registry, else unknown). */
export type FieldValueOf<T extends FieldType> = T extends { kind: 'string' | 'datetime' | 'ref' }
  ? string
  : T extends { kind: 'number' | 'integer' }
    ? number
    : T extends { kind: 'boolean' }
      ? boolean
      : T extends { kind: 'enum'; values: readonly (infer V)[] }
        ? V
        : T extends { kind: 'refs' }
          ? string[]
          : T extends { kind: 'json'; shape?: infer J }
            ? J
            : unknown;

type RequiredFieldName<F> = { [K in keyof F]: F[K] extends { required: true } ? K : never }[keyof F];
type Flat<T> = { -readonly [K in keyof T]: T[K] };

/** The fields a row of the entity holds: required ones always, the rest nullable. */
export type RowFieldsOf<E extends SyncEntityName, F = EntityFields<E>> = Flat<
  { [K in RequiredFieldName<F>]: F[K] extends { type: infer T extends FieldType } ? FieldValueOf<T> : never } & {
    [K in Exclude<keyof F, RequiredFieldName<F>>]: F[K] extends { type: infer T extends FieldType } ? FieldValueOf<T> | null : never;
  }
>;
/** A row of a synced entity, as both sides hold it: its id and the registry's fields. */
export type RowOf<E extends SyncEntityName> = Flat<{ id: string } & RowFieldsOf<E>>;
/** The fields of an entity that a technician's phone never receives. */
export function officeOnlyFields(entity: SyncEntityName): string[] {
  return Object.entries(SYNC_ENTITIES[entity].fields).filter(([, f]) => (f as FieldSpec).officeOnly).map(([name]) => name);
}

/** A row that may not yet carry its optional fields (a row written on a phone, a draft). */
export type DraftRowOf<E extends SyncEntityName> = Flat<
  { id: string } & Pick<RowFieldsOf<E>, RequiredFieldName<EntityFields<E>> & keyof RowFieldsOf<E>> &
    Partial<RowFieldsOf<E>>
>;

export function isSyncEntity(name: unknown): name is SyncEntityName {
  return typeof name === 'string' && Object.prototype.hasOwnProperty.call(SYNC_ENTITIES, name);
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (v: unknown): v is string => typeof v === 'string' && UUID.test(v);

/** Checks one field value against its spec; returns a sentence naming the field, or null when it is fine. */
export function fieldError(entity: SyncEntityName, field: string, value: unknown): string | null {
  const spec = Object.prototype.hasOwnProperty.call(SYNC_ENTITIES[entity].fields, field) ? SYNC_ENTITIES[entity].fields[field] : undefined;
  if (!spec) return `${entity}.${field} is not a field we accept`;
  if (value === null) return spec.required ? `${entity}.${field} must not be empty` : null;
  const t = spec.type;
  const name = `${entity}.${field}`;
  switch (t.kind) {
    case 'string':
      if (typeof value !== 'string') return `${name} must be text`;
      if (value.length > t.max) return `${name} must be at most ${t.max} characters`;
      // No database keeps it faithfully (PostgreSQL refuses it in text), and nobody types it.
      if (value.includes('\u0000')) return `${name} must not contain the NUL character (U+0000)`;
      // A name of no-break, em and zero-width spaces is as empty as no name.
      if (spec.required && isBlankText(value)) return `${name} must not be empty`;
      return null;
    case 'number':
    case 'integer':
      if (typeof value !== 'number' || !Number.isFinite(value)) return `${name} must be a number`;
      if (t.kind === 'integer' && !Number.isInteger(value)) return `${name} must be a whole number`;
      if (t.min !== undefined && value < t.min) return `${name} must be at least ${t.min}`;
      if (t.max !== undefined && value > t.max) return `${name} must be at most ${t.max}`;
      return null;
    case 'boolean':
      return typeof value === 'boolean' ? null : `${name} must be true or false`;
    case 'datetime':
      // eslint-disable-next-line no-control-regex -- NUL is the one character PostgreSQL refuses, so a date must not carry it
      return typeof value === 'string' && !Number.isNaN(Date.parse(value)) && /^\d{4}-\d{2}-\d{2}T[^\u0000]*$/.test(value)
        ? null
        : `${name} must be an ISO-8601 date and time`;
    case 'ref':
      return isUuid(value) ? null : `${name} must be the id of a ${t.entity}`;
    case 'refs':
      return Array.isArray(value) && value.every(isUuid) ? null : `${name} must be a list of ids`;
    case 'enum':
      return typeof value === 'string' && t.values.includes(value) ? null : `${name} must be one of: ${t.values.join(', ')}`;
    case 'json':
      return JSON.stringify(value).length <= 100_000 ? null : `${name} is too large`;
  }
}
