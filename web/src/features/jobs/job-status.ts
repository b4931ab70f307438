import { JOB_STATUSES } from '@wiretrail/core';

export type JobStatus = (typeof JOB_STATUSES)[number];

const JOB_STATUS_WORDS: Record<JobStatus, string> = {
  enquiry: 'Enquiry',
  booked: 'Booked',
  'on-site': 'On site',
  paperwork: 'Paperwork',
  done: 'Done',
  cancelled: 'Cancelled',
};

/** What each column of the board holds, in a few words. */
export const JOB_STATUS_HINTS: Record<JobStatus, string> = {
  enquiry: 'Asked about, not booked yet',
  booked: 'Visits booked',
  'on-site': 'Work under way',
  paperwork: 'Signed off: certificates, reports and invoices to issue',
  done: 'Issued and paid',
  cancelled: 'Not going ahead',
};

/** Done and cancelled jobs are closed: the board hides them unless asked. */
export const OPEN_JOB_STATUSES: readonly JobStatus[] = JOB_STATUSES.filter((s) => s !== 'done' && s !== 'cancelled');

export const jobStatusWords = (status: string | null | undefined) => (status ? (JOB_STATUS_WORDS[status as JobStatus] ?? status) : '—');
