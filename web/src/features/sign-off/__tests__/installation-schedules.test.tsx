// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { INSPECTION_ITEMS } from '@wiretrail/core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

const RADIAL = '01900000-0000-7000-8000-0000000000c7';

beforeEach(async () => {
  await resetPhone();
  await addRing();
  await db.visit.update(ids.visit, { cautionsReadAt: at(9) });
  await db.circuit.put({
    id: RADIAL, siteId: ids.site, boardId: ids.board, number: '7', description: 'Garden office', kind: 'radial', deviceType: 'B', deviceRatingA: 20, rcdRatingMa: 30, rcdType: 'A',
    liveCsaMm2: 2.5, cpcCsaMm2: 1.5, newOnVisitId: ids.visit, wiringType: 'SWA', referenceMethod: 'D', pointsServed: 1, deviceStandard: 'BS EN 61009-1', deviceBreakingKa: 6, ...base,
  });
});
afterEach(tidyUp);

describe('the installation certificate’s schedules on the phone', () => {
  it('shows every circuit of the board with new work as a card, with its maximum Zs and its readings in the order taken', async () => {
    await db.testResult.put({
      id: '01900000-0000-7000-8000-0000000000c8', visitId: ids.visit, siteId: ids.site, circuitId: RADIAL, r1r2Ohm: 0.31, irTestVoltageV: 500, irLiveLiveMOhm: 299, irLiveLiveOverRange: true,
      irLiveEarthMOhm: 299, polarity: 'correct', zsOhm: 0.62, rcdTripMs: 19, ...base,
    });
    show(paths.visitSchedule.href(ids.visit));
    const schedule = await screen.findByRole('region', { name: 'Schedule of circuits' }, { timeout: 15_000 });
    expect(within(schedule).getByText(/1 of 2 still to test/)).toBeTruthy();
    const ring = within(schedule).getByRole('article', { name: 'Circuit 1 · Sockets, ground floor' });
    expect(within(ring).getByText('Not tested')).toBeTruthy();
    expect(within(ring).getByRole('link', { name: 'Record readings of circuit 1' }).getAttribute('href')).toBe(paths.visitCircuit.href(ids.visit, ids.circuit));
    const radial = within(schedule).getByRole('article', { name: 'Circuit 7 · Garden office' });
    expect(within(radial).getByText('New')).toBeTruthy();
    // B20 at 0.4 s: 2.19 Ω (BS 7671:2018+A2:2022 Table 41.3).
    expect(within(radial).getByText('2.19 Ω')).toBeTruthy();
    expect(within(radial).getByText('>299 MΩ')).toBeTruthy();
    const labels = within(radial).getAllByRole('term').map((t) => t.textContent);
    expect(labels.indexOf('R1+R2')).toBeLessThan(labels.indexOf('Insulation live to live'));
    expect(labels.indexOf('Insulation live to earth')).toBeLessThan(labels.indexOf('Polarity'));
    expect(labels).not.toContain('r1');
  });

  it('marks the schedule of inspections by taps, and a limitation stays open until its note is given', async () => {
    show(paths.visitSignOff.href(ids.visit));
    const inspections = await screen.findByRole('region', { name: 'Schedule of inspections' }, { timeout: 15_000 });
    expect(within(inspections).getByText(new RegExp(`${INSPECTION_ITEMS.length} of ${INSPECTION_ITEMS.length} still to mark`))).toBeTruthy();
    fireEvent.click(within(inspections).getByRole('button', { name: `Mark the ${INSPECTION_ITEMS.length} open items done` }));
    await waitFor(async () => expect(Object.keys((await db.visit.get(ids.visit))!.inspectionMarks ?? {})).toHaveLength(INSPECTION_ITEMS.length));
    const isolation = within(inspections).getByRole('group', { name: /^Isolation, switching off/ });
    fireEvent.click(within(isolation).getByRole('button', { name: 'Not applicable' }));
    await waitFor(async () => expect((await db.visit.get(ids.visit))!.inspectionMarks?.isolation).toEqual({ state: 'not-applicable' }));
    fireEvent.click(within(isolation).getByRole('button', { name: 'Limitation' }));
    expect(await within(inspections).findByText('Say what limited the inspection of this item.')).toBeTruthy();
    expect(await screen.findByText(/Inspection “Isolation, switching off/)).toBeTruthy();
    const note = within(inspections).getByLabelText('What limited it');
    fireEvent.change(note, { target: { value: 'Isolator behind stored furniture' } });
    fireEvent.blur(note);
    await waitFor(async () => expect((await db.visit.get(ids.visit))!.inspectionMarks?.isolation).toEqual({ state: 'limitation', note: 'Isolator behind stored furniture' }));
    expect(await within(inspections).findByText(/Every item is marked\./)).toBeTruthy();
  });
});
