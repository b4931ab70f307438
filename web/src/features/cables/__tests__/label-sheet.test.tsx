// @vitest-environment happy-dom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { CableRunRow } from '@/lib/db';
import { LabelSheet } from '../phone/label-sheet';

const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<CableRunRow, '_base'>;
const SITE = '01900000-0000-7000-8000-000000000002';

afterEach(cleanup);

describe('the label sheet', () => {
  it('prints no label for a cable voided on site', () => {
    const cables: CableRunRow[] = [
      { id: '01900000-0000-7000-8000-0000000000c1', siteId: SITE, label: 'MK-01', ...base },
      { id: '01900000-0000-7000-8000-0000000000c2', siteId: SITE, label: 'MK-O1', voidedAt: '2026-03-14T09:25:00.000Z', voidReason: 'Typed O for 0', ...base },
    ];
    render(<LabelSheet cables={cables} areaNames={new Map()} origin="https://wiretrail.example" />);
    const sheet = screen.getByRole('list', { name: 'Cable labels' });
    expect(within(sheet).getAllByRole('listitem').map((li) => li.getAttribute('aria-label'))).toEqual(['Label for MK-01, end A', 'Label for MK-01, end B']);
  });
});
