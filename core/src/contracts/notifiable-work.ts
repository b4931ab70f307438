/** The office's list of work to notify under the Building Regulations (`GET /api/notifiable-work`). */
import type { Nation, NotifiableVerdict, NotificationState } from '../certification/notifiable-work.js';

export interface NotifiableJob {
  jobId: string;
  reference: string | null;
  title: string;
  customerName: string | null;
  siteName: string | null;
  /** What the job did that counts: new circuits and a replaced board. */
  newCircuits: number;
  boardReplaced: boolean;
  /** The day the work was finished (the last signed visit that did it), once every such visit is finished. */
  completedOn: string | null;
  verdict: Omit<NotifiableVerdict, 'caution'>;
  state: NotificationState;
  overdue: boolean;
  schemeRef: string | null;
  notifiedOn: string | null;
  certificateReceivedOn: string | null;
}

export interface NotifiableWorkList {
  nation: Nation;
  scheme: string | null;
  caution: string;
  items: NotifiableJob[];
}

/** What the office sends to record a notification (`PATCH /api/notifiable-work/:jobId`). */
export interface NotificationChange {
  state: NotificationState;
  schemeRef?: string;
  notifiedOn?: string;
  certificateReceivedOn?: string;
}
