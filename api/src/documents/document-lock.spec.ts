import { describe, expect, it } from '@jest/globals';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import { DOCUMENT_LOCK } from './document-lock.js';

const document = (issuedAt: string | null): SyncRecord => ({
  id: 'doc-1', organisationId: 'org', version: 4, fieldMeta: {}, deletedAt: null, createdById: null, updatedById: null, createdAt: new Date(), updatedAt: new Date(),
  jobId: 'job-1', kind: 'minor-works', number: 'MW-0001', issuedAt,
});

describe('the lock of an issued document', () => {
  it('holds an issued document\'s own fields, but lets its e-mail\'s progress be written', () => {
    expect(DOCUMENT_LOCK.locksRow!(document('2026-03-14T10:00:00.000Z'), ['number'])).toBe(true);
    expect(DOCUMENT_LOCK.locksRow!(document('2026-03-14T10:00:00.000Z'), ['emailState', 'emailedTo', 'emailedAt', 'emailError'])).toBe(false);
    expect(DOCUMENT_LOCK.locksRow!(document('2026-03-14T10:00:00.000Z'), ['emailState', 'signerName'])).toBe(true);
  });

  it('holds nothing of a document not issued', () => {
    expect(DOCUMENT_LOCK.locksRow!(document(null), ['number'])).toBe(false);
  });

  it('holds the records it prints under its own reason, but for a site\'s access notes, which no document prints', () => {
    expect(DOCUMENT_LOCK.reason).toBe('locked-by-document');
    expect(DOCUMENT_LOCK.holds).toBeDefined();
    expect(DOCUMENT_LOCK.unheldFields).toEqual({ site: ['accessNotes'] });
  });
});
