// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { judgeLinkTest } from '@wiretrail/core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

const CABLE = '01900000-0000-7000-8000-0000000000c1';

beforeEach(async () => {
  await resetPhone();
  await db.cableRun.put({ id: CABLE, siteId: ids.site, label: 'RC-01', medium: 'Cat6', ...base });
});
afterEach(() => {
  tidyUp();
  localStorage.clear();
});

const form = async () => screen.findByRole('form', { name: 'Performance results of RC-01' });
const card = (f: HTMLElement, name: string) => within(f).getByRole('region', { name });
const type = (el: HTMLElement, label: string | RegExp, value: string) => fireEvent.change(within(el).getByLabelText(label), { target: { value } });

describe('a link’s performance results on the phone', () => {
  it('judges them as typed with core’s rules, and saves a new link test on this phone', async () => {
    show(paths.visitCableResults.href(ids.visit, CABLE));
    const f = await form();
    fireEvent.change(within(f).getByLabelText('Limit set'), { target: { value: 'tia-cat6-permanent-link' } });
    type(card(f, 'NEXT'), /^Margin/, '3.4');
    type(card(f, 'Return loss'), /^Margin/, '-1.2');
    // ANSI/TIA-568.2-D permanent link delay skew 44 ns (from memory).
    type(card(f, 'Delay skew'), /^Value/, '18');
    const overall = within(f).getByRole('status', { name: 'Overall result' });
    await waitFor(() => expect(overall.textContent).toContain('Fail'));
    type(card(f, 'Return loss'), /^Margin/, '0.2');
    fireEvent.click(within(card(f, 'Return loss')).getByLabelText('Within the tester’s accuracy'));
    await waitFor(() => expect(overall.textContent).toContain('Pass'));
    expect(overall.textContent).toContain('our own term');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new results' }));
    await waitFor(async () => expect(await db.linkTest.count()).toBe(1));
    const [row] = await db.linkTest.toArray();
    expect(row).toMatchObject({ visitId: ids.visit, siteId: ids.site, cableRunId: CABLE, medium: 'copper', limitSet: 'tia-cat6-permanent-link', nextMarginDb: 3.4, returnLossMarginDb: 0.2, delaySkewNs: 18, withinAccuracy: ['returnLoss'] });
    // The phone and the server judge the same row alike.
    expect(judgeLinkTest(row!).verdict).toBe('pass');
    expect(await db.outbox.count()).toBe(1);
  });

  it('refuses a figure that is not one and a copper test with no limit set, saving nothing', async () => {
    show(paths.visitCableResults.href(ids.visit, CABLE));
    const f = await form();
    type(card(f, 'NEXT'), /^Margin/, 'lots');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new results' }));
    expect(await within(f).findByText('NEXT margin must be a number, like 2 dB.')).toBeTruthy();
    type(card(f, 'NEXT'), /^Margin/, '2');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new results' }));
    expect((await within(f).findAllByText(/Name the limit set the link was tested to/)).length).toBeGreaterThan(0);
    expect(await db.linkTest.count()).toBe(0);
  });

  it('keeps what was typed as a draft until it is saved', async () => {
    show(paths.visitCableResults.href(ids.visit, CABLE));
    type(card(await form(), 'PS NEXT'), /^Margin/, '4.4');
    await waitFor(() => expect(localStorage.getItem(`wiretrail.draft.linkTest.new.${ids.visit}.${CABLE}`)).toContain('4.4'));
    tidyUp();
    show(paths.visitCableResults.href(ids.visit, CABLE));
    const again = await form();
    expect((within(card(again, 'PS NEXT')).getByLabelText(/^Margin/) as HTMLInputElement).value).toBe('4.4');
    expect(within(again).getByText(/Back where you left off/)).toBeTruthy();
  });

  it('checks a fibre link against its Tier 1 budget: 150 m OM3, two connector pairs, 1.95 dB at 850 nm (ANSI/TIA-568.3-D, from memory)', async () => {
    show(paths.visitCableResults.href(ids.visit, CABLE));
    const f = await form();
    fireEvent.change(within(f).getByLabelText('Link'), { target: { value: 'fibre' } });
    const fibre = await within(f).findByRole('region', { name: 'Fibre loss' });
    fireEvent.change(within(fibre).getByLabelText('Fibre'), { target: { value: 'multimode' } });
    type(fibre, 'Fibre length (m)', '150');
    type(fibre, 'Mated connector pairs', '2');
    type(fibre, 'First wavelength (nm)', '850');
    type(fibre, 'Loss at the first wavelength (dB)', '2.4');
    await waitFor(() => expect(within(fibre).getByText('Loss at 850 nm')).toBeTruthy());
    expect(within(f).getByRole('status', { name: 'Overall result' }).textContent).toContain('Fail');
  });
});
