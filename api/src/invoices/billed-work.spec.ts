import { describe, expect, it } from '@jest/globals';
import type { Invoice } from './entities/invoice.entity.js';
import { invoiceName, leftOutWords, sourcesOf } from './billed-work.js';

const issued = { id: 'i2', number: 'INV-0002', createdAt: new Date('2026-12-01T10:00:00Z') } as Invoice;
const draft = { id: 'd1', number: null, createdAt: new Date('2026-12-04T23:30:00Z') } as Invoice;

describe('what a line bills and what a build leaves out', () => {
  it('takes a labour line by its visit and a part line by its part uses, and nothing from a fixed price', () => {
    expect(sourcesOf({ kind: 'labour', visitId: 'v1', partUseIds: null })).toEqual(['labour:v1']);
    expect(sourcesOf({ kind: 'material', visitId: null, partUseIds: ['p1', 'p2'] })).toEqual(['part:p1', 'part:p2']);
    // A part line naming a visit is not that visit's labour.
    expect(sourcesOf({ kind: 'material', visitId: 'v1', partUseIds: [] })).toEqual([]);
    expect(sourcesOf({ kind: 'fixed', visitId: null, partUseIds: null })).toEqual([]);
  });

  it('names a draft by the day it was started where the contractor is', () => {
    expect(invoiceName(issued, 'Europe/London')).toBe('INV-0002');
    expect(invoiceName(draft, 'Europe/London')).toBe('the draft invoice started 4 Dec 2026');
    expect(invoiceName(draft, 'Asia/Tokyo')).toBe('the draft invoice started 5 Dec 2026');
  });

  it('says per visit and per invoice what was left out', () => {
    const day = '3 Dec 2026';
    expect(
      leftOutWords(
        [
          { visitId: 'v1', day, labour: true, parts: 0, invoice: issued },
          { visitId: 'v1', day, labour: false, parts: 1, invoice: issued },
          { visitId: 'v1', day, labour: false, parts: 1, invoice: issued },
          { visitId: 'v1', day, labour: false, parts: 1, invoice: draft },
          { visitId: 'v2', day: '4 Dec 2026', labour: true, parts: 0, invoice: issued },
        ],
        'Europe/London',
      ),
    ).toEqual([
      'Visit 3 Dec 2026: labour and 2 parts already on INV-0002, so not taken again.',
      'Visit 3 Dec 2026: 1 part already on the draft invoice started 4 Dec 2026, so not taken again.',
      'Visit 4 Dec 2026: labour already on INV-0002, so not taken again.',
    ]);
  });
});
