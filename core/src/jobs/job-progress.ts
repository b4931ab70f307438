import type { JOB_STATUSES } from '../sync/entities.js';

export type JobStatus = (typeof JOB_STATUSES)[number];

/**
 * What a job's status is judged from: its visits as counted by status, and its paperwork. The server counts these
 * from the records; the office's board reads the same counts to say what a column asks for before a job is moved.
 */
export interface JobWork {
  /** Visits not cancelled and not yet started. */
  plannedVisits: number;
  /** Visits a technician has arrived at and not signed off. */
  onSiteVisits: number;
  /** Visits signed off. */
  finishedVisits: number;
  /** Certificates and reports issued and still current (not superseded). */
  issuedDocuments: number;
  /** Invoices still being drafted. */
  draftInvoices: number;
  /** Invoices issued and not fully credited. */
  issuedInvoices: number;
  /** Of those, the ones with money still owed. */
  unpaidInvoices: number;
}

export const NO_WORK: JobWork = Object.freeze({
  plannedVisits: 0, onSiteVisits: 0, finishedVisits: 0, issuedDocuments: 0, draftInvoices: 0, issuedInvoices: 0, unpaidInvoices: 0,
});

/** A visit's status as the records hold it: a visit with an arrival and no sign-off is under way whatever it says. */
export function visitStage(visit: { status?: unknown; actualStart?: unknown }): 'planned' | 'on-site' | 'finished' | 'cancelled' {
  if (visit.status === 'cancelled' || visit.status === 'finished') return visit.status;
  if (visit.status === 'on-site' || (typeof visit.actualStart === 'string' && visit.actualStart)) return 'on-site';
  return 'planned';
}

/**
 * Where the work puts a job: on site while anyone is there, booked while a visit is still to come, paperwork once
 * every visit is signed off, and done when the paperwork is issued and every invoice is paid. A job with no
 * visit is an enquiry. Cancelled is only ever the office's word, so it is never the answer here.
 */
export function statusFromWork(w: JobWork): Exclude<JobStatus, 'cancelled'> {
  if (w.onSiteVisits > 0) return 'on-site';
  if (w.plannedVisits > 0) return 'booked';
  if (w.finishedVisits === 0) return 'enquiry';
  return unmetFor('done', w).length ? 'paperwork' : 'done';
}

/**
 * What is not yet so for a job to stand in a status, in the office's words; empty when the work agrees. The board
 * asks before moving a job against these, and moves it when the office says so.
 */
export function unmetFor(status: JobStatus, w: JobWork): string[] {
  const visits = w.plannedVisits + w.onSiteVisits + w.finishedVisits;
  const count = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
  switch (status) {
    case 'enquiry':
      return visits ? [`${count(visits, 'visit is', 'visits are')} booked.`] : [];
    case 'booked':
      if (!visits) return ['No visit is booked.'];
      return [
        ...(w.onSiteVisits ? [`${count(w.onSiteVisits, 'visit is', 'visits are')} under way on site.`] : []),
        ...(!w.plannedVisits && !w.onSiteVisits ? ['Every visit is signed off.'] : []),
      ];
    case 'on-site':
      return w.onSiteVisits ? [] : ['Nobody has arrived on site for a visit.'];
    case 'paperwork':
      if (!visits) return ['No visit is booked.'];
      return w.plannedVisits + w.onSiteVisits ? [`${count(w.plannedVisits + w.onSiteVisits, 'visit is', 'visits are')} not signed off.`] : [];
    case 'done':
      return [
        ...(!visits ? ['No visit is booked.'] : []),
        ...(w.plannedVisits + w.onSiteVisits ? [`${count(w.plannedVisits + w.onSiteVisits, 'visit is', 'visits are')} not signed off.`] : []),
        ...(visits && !w.issuedDocuments ? ['No certificate or report is issued.'] : []),
        ...(w.draftInvoices ? [`${count(w.draftInvoices, 'invoice is', 'invoices are')} still a draft.`] : []),
        ...(visits && !w.issuedInvoices ? ['No invoice is issued.'] : []),
        ...(w.unpaidInvoices ? [`${count(w.unpaidInvoices, 'invoice is', 'invoices are')} not paid.`] : []),
      ];
    case 'cancelled':
      return [];
  }
}
