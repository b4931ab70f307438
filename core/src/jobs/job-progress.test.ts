import { describe, expect, it } from 'vitest';
import { NO_WORK, statusFromWork, unmetFor, visitStage } from './job-progress.js';

const work = (w: Partial<typeof NO_WORK>) => ({ ...NO_WORK, ...w });

describe('a job status follows the work', () => {
  it('is an enquiry with no visit, booked with one to come, on site while someone is there', () => {
    expect(statusFromWork(NO_WORK)).toBe('enquiry');
    expect(statusFromWork(work({ plannedVisits: 1 }))).toBe('booked');
    expect(statusFromWork(work({ plannedVisits: 1, onSiteVisits: 1 }))).toBe('on-site');
    expect(statusFromWork(work({ plannedVisits: 1, finishedVisits: 2 }))).toBe('booked');
  });

  it('waits in paperwork once every visit is signed off, until documents are issued and every invoice paid', () => {
    const signed = work({ finishedVisits: 1 });
    expect(statusFromWork(signed)).toBe('paperwork');
    expect(statusFromWork({ ...signed, issuedDocuments: 1 })).toBe('paperwork');
    expect(statusFromWork({ ...signed, issuedDocuments: 1, issuedInvoices: 1, unpaidInvoices: 1 })).toBe('paperwork');
    expect(statusFromWork({ ...signed, issuedDocuments: 1, issuedInvoices: 1, draftInvoices: 1 })).toBe('paperwork');
    expect(statusFromWork({ ...signed, issuedDocuments: 1, issuedInvoices: 1 })).toBe('done');
  });

  it('says what a column asks for that the job has not reached', () => {
    const owing = work({ finishedVisits: 1, issuedDocuments: 1, issuedInvoices: 2, unpaidInvoices: 1 });
    expect(unmetFor('done', owing)).toEqual(['1 invoice is not paid.']);
    expect(unmetFor('paperwork', owing)).toEqual([]);
    expect(unmetFor('on-site', owing)).toEqual(['Nobody has arrived on site for a visit.']);
    expect(unmetFor('paperwork', work({ plannedVisits: 2 }))).toEqual(['2 visits are not signed off.']);
    expect(unmetFor('booked', NO_WORK)).toEqual(['No visit is booked.']);
    expect(unmetFor('cancelled', owing)).toEqual([]);
    expect(unmetFor('done', work({ finishedVisits: 1 }))).toEqual(['No certificate or report is issued.', 'No invoice is issued.']);
  });

  it('reads a visit with an arrival as under way, whatever its status says', () => {
    expect(visitStage({ status: 'planned', actualStart: '2026-12-03T09:00:00Z' })).toBe('on-site');
    expect(visitStage({ status: null })).toBe('planned');
    expect(visitStage({ status: 'finished', actualStart: '2026-12-03T09:00:00Z' })).toBe('finished');
    expect(visitStage({ status: 'cancelled' })).toBe('cancelled');
  });
});
