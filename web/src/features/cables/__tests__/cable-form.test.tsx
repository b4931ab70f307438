// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';
import { lengthFrom, parseNvp } from '../phone/cable-form';

beforeEach(resetPhone);
afterEach(tidyUp);

const form = async () => screen.findByRole('form', { name: 'Record a cable' });
const type = (el: HTMLElement, label: string, value: string) => fireEvent.change(within(el).getByLabelText(label), { target: { value } });

async function pick(end: string, pin: number, colour: string) {
  fireEvent.click(screen.getByRole('button', { name: new RegExp(`^${end} pin ${pin}:`) }));
  const dialog = await screen.findByRole('dialog', { name: new RegExp(`pin ${pin}: colour seen`) });
  fireEvent.click(within(dialog).getByRole('button', { name: colour }));
  await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
}

describe('recording a cable', () => {
  it('names each field that is wrong, in plain words', async () => {
    show(paths.visitCable.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Length (m)', '-3');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    expect(await within(f).findByText('Give the cable a label, for example RC-03.')).toBeTruthy();
    expect(within(f).getByText('The length cannot be negative.')).toBeTruthy();
    type(f, 'Length (m)', 'twelve');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    expect(await within(f).findByText('The length must be a number, like 25 m.')).toBeTruthy();
    expect(await db.cableRun.count()).toBe(0);
  });

  it('asks for both halves of a TDR reading and refuses an NVP that is not one', async () => {
    show(paths.visitCable.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Label', 'RC-07');
    fireEvent.click(within(f).getByRole('button', { name: 'From a TDR reading' }));
    type(f, 'Round trip (ns)', '300');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    expect(await within(f).findByText('Enter both the TDR time and the NVP to work out the length.')).toBeTruthy();
    // NVP is a fraction of c: above 0 and at most 1 (no cable carries a signal faster than light).
    for (const nvp of ['1.5', '0', '-0.7']) {
      type(f, 'NVP', nvp);
      fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
      expect(await within(f).findByText(`An NVP of ${nvp} is wrong: it is the cable's speed as a fraction of the speed of light, above 0 and at most 1, like 0.69 (from the cable's datasheet).`)).toBeTruthy();
    }
    expect(await db.cableRun.count()).toBe(0);
  });

  it('asks for a TDR figure to be checked when the length it gives is no cable in a building', async () => {
    show(paths.visitCable.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Label', 'RC-08');
    fireEvent.click(within(f).getByRole('button', { name: 'From a TDR reading' }));
    // 0.69 × c × 90 000 ns / 2 = 9,309 m (D): above the 1,000 m plausibility bound (common trade practice, M).
    type(f, 'Round trip (ns)', '90000');
    type(f, 'NVP', '0.69');
    const problem = 'A round trip of 90,000 ns at NVP 0.69 gives 9 km, longer than any cable in a building: check the figure.';
    await waitFor(() => expect(within(f).getAllByText(problem).length).toBeGreaterThan(0));
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    await waitFor(() => expect(within(f).getAllByText(problem).length).toBe(2));
    // The registry's own bound on the round trip (100,000 ns) says so first.
    type(f, 'Round trip (ns)', '9999999');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    expect(await within(f).findByText('The TDR time above 100000 ns is not a real reading; check the figure.')).toBeTruthy();
    expect(await db.cableRun.count()).toBe(0);
  });

  it('works out a TDR length: L = NVP × c × t / 2 (TIA-568 field testing; c = 299 792 458 m/s, SI)', () => {
    // 0.69 × 299 792 458 × 870e-9 / 2 = 89.98 m (test vector D, trade-reference §7d)
    expect(lengthFrom({ lengthMode: 'tdr', lengthM: '', tdrNs: '870', nvp: '0.69' })).toBe(89.98);
    expect(lengthFrom({ lengthMode: 'tdr', lengthM: '', tdrNs: '870', nvp: '69 %' })).toBe(89.98);
    expect(parseNvp('0.7')).toBe(0.7);
    expect(Number.isNaN(parseNvp('5'))).toBe(true);
  });

  it('judges the wiremap as it is tapped in: T568B at both ends passes, a split pair fails with its pins, and the cable is saved for the site', async () => {
    show(paths.visitCable.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Label', 'RC-08');
    type(f, 'End A area', ids.lounge);
    fireEvent.click(within(f).getByRole('button', { name: 'Both ends as T568B' }));
    const verdicts = screen.getByRole('region', { name: 'Cable test verdicts' });
    expect(await within(verdicts).findByRole('button', { name: /^Wiremap: Pass/ })).toBeTruthy();
    // Pairs laid in colour order at both ends: pin to pin, yet 3,6 and 4,5 are split (ANSI/TIA-568 wiremap, split pair).
    for (const end of ['End A \\(Lounge\\)', 'End B']) {
      fireEvent.click(within(f).getByRole('button', { name: new RegExp(`^${end}$`) }));
      await pick(end, 4, 'green');
      await pick(end, 6, 'blue');
    }
    expect(await within(verdicts).findByRole('button', { name: /^Wiremap: Fail/ })).toBeTruthy();
    expect(within(verdicts).getByText(/Split pair on pins 3, 6/)).toBeTruthy();
    expect(within(verdicts).getByText(/Split pair on pins 4, 5/)).toBeTruthy();
    type(f, 'Length (m)', '23');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    await waitFor(async () => expect(await db.cableRun.count()).toBe(1));
    const [cable] = await db.cableRun.toArray();
    expect(cable).toMatchObject({ label: 'RC-08', siteId: ids.site, endAAreaId: ids.lounge, scheme: 'T568B', lengthM: 23, verdict: 'fail', status: 'tested', lastVisitId: ids.visit });
    expect(cable!.testedAt).toBeTruthy();
    expect(cable!.wiremap?.farEnd[3]).toBe('green');
    expect((await db.outbox.toArray()).map((e) => e.entity)).toEqual(['cableRun']);
  });

  it('makes a new area on site together with the cable', async () => {
    show(paths.visitCable.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Label', 'RC-09');
    type(f, 'End B area', '__new');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    expect(await within(f).findByText('Name the new area for end B, for example "Loft".')).toBeTruthy();
    type(f, 'New area for end B', 'Loft');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new cable' }));
    await waitFor(async () => expect(await db.cableRun.count()).toBe(1));
    const loft = (await db.area.toArray()).find((a) => a.name === 'Loft')!;
    expect((await db.cableRun.toArray())[0]!.endBAreaId).toBe(loft.id);
    expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.entity)).toEqual(['area', 'cableRun']);
  });
});
