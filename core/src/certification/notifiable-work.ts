import { addDays } from '../money/aged-debt.js';

/**
 * Whether electrical work on a dwelling must be notified under the Building Regulations, and by when. A reminder for
 * the office, not advice: the rules below name their source, and those given from memory say so.
 */

export const NATIONS = ['england', 'wales', 'scotland', 'northern-ireland'] as const;
export type Nation = (typeof NATIONS)[number];

export const NATION_WORDS: Record<Nation, string> = {
  england: 'England',
  wales: 'Wales',
  scotland: 'Scotland',
  'northern-ireland': 'Northern Ireland',
};

/** What the job did, as far as notification cares: worked out from the records (new circuits, a replaced board). */
export interface WorkDone {
  /** Circuits installed new on the job. */
  newCircuits: number;
  /** A consumer unit (or other board) replaced on the job. */
  boardReplaced: boolean;
  /** An addition or alteration in a special location: a room with a bath or shower, a swimming pool, a sauna. */
  specialLocation?: boolean;
  /** An addition or alteration in a kitchen (Wales only). */
  kitchen?: boolean;
  /** An addition or alteration outdoors, or to a garden building's supply (Wales only). */
  outdoors?: boolean;
}

export interface NotifiableRule {
  id: string;
  /** What makes the work notifiable, in the office's words. */
  words: string;
  source: string;
  fromMemory: boolean;
  applies: (work: WorkDone) => boolean;
}

interface NationRules {
  covered: boolean;
  rules: readonly NotifiableRule[];
  /** Days after completion within which the competent person scheme must be told. */
  daysAllowed: number | null;
  daysSource: string | null;
  note: string;
}

const ENGLAND_SOURCE = 'The Building Regulations 2010 (SI 2010/2214), reg 12(6A) and Schedule 4; Approved Document P, 2013 edition incorporating 2016 amendments, section 2';
const WALES_SOURCE = 'The Building Regulations 2010 as they apply in Wales, reg 12(6A) and Schedule 4; Approved Document P (Wales)';

const newCircuit = (source: string, fromMemory: boolean): NotifiableRule => ({
  id: 'new-circuit',
  words: 'A new circuit was installed.',
  source,
  fromMemory,
  applies: (w) => w.newCircuits > 0,
});
const boardReplaced = (source: string, fromMemory: boolean): NotifiableRule => ({
  id: 'board-replaced',
  words: 'A consumer unit was replaced.',
  source,
  fromMemory,
  applies: (w) => w.boardReplaced,
});
const specialLocation = (source: string, fromMemory: boolean): NotifiableRule => ({
  id: 'special-location',
  words: 'A circuit was added to or altered in a special location (a room with a bath or shower, a swimming pool or a sauna).',
  source,
  fromMemory,
  applies: (w) => !!w.specialLocation,
});

export const NOTIFIABLE_RULES: Record<Nation, NationRules> = {
  england: {
    covered: true,
    rules: [newCircuit(ENGLAND_SOURCE, false), boardReplaced(ENGLAND_SOURCE, false), specialLocation(ENGLAND_SOURCE, false)],
    daysAllowed: 30,
    daysSource: 'The Building Regulations 2010, reg 20 (self-certification schemes): notice within 30 days of completion (from memory)',
    note: 'Through the contractor’s competent person scheme, or a building notice to the local authority before the work starts.',
  },
  wales: {
    covered: true,
    // Wales kept the wider scope of notifiable work when England narrowed it in 2013 (from memory).
    rules: [
      newCircuit(WALES_SOURCE, true),
      boardReplaced(WALES_SOURCE, true),
      specialLocation(WALES_SOURCE, true),
      { id: 'kitchen', words: 'A circuit was added to or altered in a kitchen.', source: WALES_SOURCE, fromMemory: true, applies: (w) => !!w.kitchen },
      { id: 'outdoors', words: 'A circuit was added to or altered outdoors.', source: WALES_SOURCE, fromMemory: true, applies: (w) => !!w.outdoors },
    ],
    daysAllowed: 30,
    daysSource: 'The Building Regulations 2010 as they apply in Wales, reg 20: notice within 30 days of completion (from memory)',
    note: 'Through the contractor’s competent person scheme, or a building notice to the local authority before the work starts.',
  },
  scotland: {
    covered: false,
    rules: [],
    daysAllowed: null,
    daysSource: null,
    note: 'Scotland works by building warrants and completion certificates under the Building (Scotland) Act 2003: not covered here, check locally.',
  },
  'northern-ireland': {
    covered: false,
    rules: [],
    daysAllowed: null,
    daysSource: null,
    note: 'Northern Ireland has its own Building Regulations (Northern Ireland) 2012: not covered here, check locally.',
  },
};

export const NOTIFIABLE_CAUTION =
  'A reminder, not advice: the Building Regulations in force and the local building control body decide whether work is notifiable and how.';

export interface NotifiableVerdict {
  nation: Nation;
  /** False where Wiretrail holds no rules for the nation: the office checks locally. */
  covered: boolean;
  /** Null where not covered. */
  notifiable: boolean | null;
  reasons: Omit<NotifiableRule, 'applies'>[];
  /** The last day to notify (YYYY-MM-DD), once the work is complete and notifiable. */
  dueBy: string | null;
  daysAllowed: number | null;
  daysSource: string | null;
  note: string;
  caution: string;
}

/** Whether the work is notifiable in the nation, which rules make it so, and the last day to notify after completion. */
export function notifiableWork(nation: Nation, work: WorkDone, completedOn: string | null): NotifiableVerdict {
  const rules = NOTIFIABLE_RULES[nation];
  const reasons = rules.rules.filter((r) => r.applies(work)).map(({ applies: _applies, ...r }) => r);
  const notifiable = rules.covered ? reasons.length > 0 : null;
  return {
    nation,
    covered: rules.covered,
    notifiable,
    reasons,
    dueBy: notifiable && completedOn && rules.daysAllowed !== null ? addDays(completedOn, rules.daysAllowed) : null,
    daysAllowed: rules.daysAllowed,
    daysSource: rules.daysSource,
    note: rules.note,
    caution: NOTIFIABLE_CAUTION,
  };
}

export const NOTIFICATION_STATES = ['to-notify', 'notified', 'certificate-received'] as const;
export type NotificationState = (typeof NOTIFICATION_STATES)[number];

export const NOTIFICATION_STATE_WORDS: Record<NotificationState, string> = {
  'to-notify': 'To notify',
  notified: 'Notified',
  'certificate-received': 'Customer’s certificate received',
};

/** Overdue: still to notify after the last day. `today` is a calendar day (YYYY-MM-DD). */
export const notificationOverdue = (state: NotificationState, dueBy: string | null, today: string): boolean => state === 'to-notify' && dueBy !== null && today > dueBy;
