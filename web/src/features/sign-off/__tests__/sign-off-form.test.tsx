// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';
import { departureSchema, signOffSchema } from '../components/sign-off-form';
import { strokesToSvg } from '../components/signature-pad';
import { pickerInput } from '@/testing/date-inputs';

beforeEach(async () => {
  localStorage.clear();
  await resetPhone();
  await addRing();
});
afterEach(tidyUp);

describe('sign-off', () => {
  it('lists every fail and every missing reading, and circuits altered but not tested', async () => {
    await db.testResult.put({ id: '01900000-0000-7000-8000-000000000030', visitId: ids.visit, siteId: ids.site, circuitId: ids.circuit, zsOhm: 1.25, ...base });
    await db.circuit.put({ id: '01900000-0000-7000-8000-000000000031', siteId: ids.site, boardId: ids.board, number: '4', description: 'Cooker', kind: 'radial', ...base });
    await db.pointChange.put({ id: '01900000-0000-7000-8000-000000000032', visitId: ids.visit, siteId: ids.site, circuitId: '01900000-0000-7000-8000-000000000031', action: 'add', ...base });
    show(paths.visitSignOff.href(ids.visit));
    const list = await screen.findByRole('list', { name: 'Fails and missing readings' }, { timeout: 15_000 });
    // 1.25 Ω against 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3, Appendix 3).
    expect(within(list).getByText('Fail: Circuit 1 (Sockets, ground floor): Earth fault loop impedance Zs')).toBeTruthy();
    expect(within(list).getByText('Missing: Circuit 1 (Sockets, ground floor): Polarity')).toBeTruthy();
    expect(within(list).getByText('Not tested: Circuit 4 (Cooker)')).toBeTruthy();
  });

  it('does not show a visit with nothing tested as passed', async () => {
    show(paths.visitSignOff.href(ids.visit));
    expect(await screen.findByText('No circuit was altered or tested on this visit, so there are no readings to judge.', {}, { timeout: 15_000 })).toBeTruthy();
    expect(screen.queryByText('No fails and no missing readings.')).toBeNull();
  });

  it('will not finish without the work described, a name and a signature', async () => {
    show(paths.visitSignOff.href(ids.visit));
    const form = await screen.findByRole('form', { name: 'Sign off' });
    fireEvent.change(within(form).getByLabelText('Work done and its extent'), { target: { value: ' ' } });
    fireEvent.change(within(form).getByLabelText('Signed by'), { target: { value: '' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Finish visit' }));
    expect(await within(form).findByText('Describe the work done and its extent.')).toBeTruthy();
    expect(within(form).getByText('Give the name of the person signing.')).toBeTruthy();
    expect(within(form).getByText('Sign in the box to finish the visit.')).toBeTruthy();
    expect((await db.visit.get(ids.visit))!.status).toBe('planned');
  });

  it('leaves the time left blank until typed, so that opening the tab does not fix it', async () => {
    await db.visit.update(ids.visit, { status: 'on-site', actualStart: new Date(Date.now() - 60 * 60_000).toISOString() });
    show(paths.visitSignOff.href(ids.visit));
    const form = await screen.findByRole('form', { name: 'Sign off' });
    expect(pickerInput('Left').value).toBe('');
    expect(within(form).getByText('Blank: the time you finish.')).toBeTruthy();
    // Typing elsewhere keeps a draft, which must not freeze a time of leaving either.
    fireEvent.change(within(form).getByLabelText('Observations'), { target: { value: 'All tidy.' } });
    expect(JSON.parse(localStorage.getItem(`wiretrail.sign-off-draft.${ids.visit}`)!).leftAt).toBe('');
  });

  it('keeps the signature as a small SVG of its strokes', () => {
    const svg = strokesToSvg([{ points: [{ x: 10.4, y: 20.6, pressure: 0.5, time: 0 }, { x: 30, y: 40, pressure: 0.5, time: 1 }], dotSize: 0, minWidth: 1, maxWidth: 3, penColor: '#000', velocityFilterWeight: 0.7, compositeOperation: 'source-over' }], 320, 180);
    expect(svg).toBe('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 320 180" width="320" height="180"><g fill="none" stroke="#14262b" stroke-width="2.5" stroke-linecap="round" stroke-linejoin="round"><path d="M10 21L30 40"/></g></svg>');
    const base = {
      arrivedAt: '09:05', leftAt: '12:30', workDescription: 'Moved a socket', observations: '', departureEntries: [], signedByName: 'Sam', signedByPosition: '',
      existingInstallationComments: '', permittedExceptions: '', riskAssessmentRef: '',
    };
    expect(signOffSchema.safeParse({ ...base, signatureSvg: svg }).success).toBe(true);
    expect(signOffSchema.safeParse({ ...base, leftAt: '', signatureSvg: svg }).success).toBe(true);
    expect(signOffSchema.safeParse({ ...base, signatureSvg: 'x'.repeat(60_001) }).success).toBe(false);
    const backwards = signOffSchema.safeParse({ ...base, leftAt: '08:00', signatureSvg: svg });
    expect(backwards.error?.issues[0]).toMatchObject({ path: ['leftAt'], message: 'The time you left must be after the time you arrived.' });
  });
});

describe('departures on the sign-off', () => {
  const CAUTION = /A departure never stands in for a failed or missing test/;

  it('takes a departure as its regulation, what is done instead and why it is no less safe, and refuses one with a part left out', async () => {
    show(paths.visitSignOff.href(ids.visit));
    const form = await screen.findByRole('form', { name: 'Sign off' });
    expect(within(form).getByText(CAUTION)).toBeTruthy();
    fireEvent.click(within(form).getByRole('button', { name: 'Add a departure' }));
    const entry = await within(form).findByRole('group', { name: 'Departure 1' });
    fireEvent.change(within(entry).getByLabelText('Regulation departed from'), { target: { value: '522.6.202' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Finish visit' }));
    expect(await within(entry).findByText('Say what is done instead.')).toBeTruthy();
    expect(within(entry).getByText('Say why this gives no less safety.')).toBeTruthy();
    expect((await db.visit.get(ids.visit))!.status).toBe('planned');
  });

  it('keeps what was typed, departures included, when the screen is left and opened again', async () => {
    show(paths.visitSignOff.href(ids.visit));
    let form = await screen.findByRole('form', { name: 'Sign off' });
    fireEvent.change(within(form).getByLabelText('Observations'), { target: { value: 'Bonding to the gas pipe is 6 mm².' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add a departure' }));
    const entry = await within(form).findByRole('group', { name: 'Departure 1' });
    fireEvent.change(within(entry).getByLabelText('What is done instead'), { target: { value: 'Cable in earthed steel conduit' } });
    cleanup();

    show(paths.visitSignOff.href(ids.visit));
    form = await screen.findByRole('form', { name: 'Sign off' });
    expect((within(form).getByLabelText('Observations') as HTMLTextAreaElement).value).toBe('Bonding to the gas pipe is 6 mm².');
    const kept = within(form).getByRole('group', { name: 'Departure 1' });
    expect((within(kept).getByLabelText('What is done instead') as HTMLTextAreaElement).value).toBe('Cable in earthed steel conduit');
  });

  it('still lists a failing Zs as a fail when a departure is written, and asks before finishing', async () => {
    // 1.25 Ω against 0.8 × 1.37 = 1.10 Ω for a B32 (BS 7671:2018+A3:2024 Table 41.3; Appendix 3, trade practice).
    await db.testResult.put({ id: '01900000-0000-7000-8000-000000000030', visitId: ids.visit, siteId: ids.site, circuitId: ids.circuit, zsOhm: 1.25, ...base });
    await db.visit.update(ids.visit, { departureEntries: [{ regulation: '411.3.2', instead: 'Left as found', noLessSafe: 'The RCD trips fast' }] });
    show(paths.visitSignOff.href(ids.visit));
    const list = await screen.findByRole('list', { name: 'Fails and missing readings' }, { timeout: 15_000 });
    expect(within(list).getByText('Fail: Circuit 1 (Sockets, ground floor): Earth fault loop impedance Zs')).toBeTruthy();
    const form = screen.getByRole('form', { name: 'Sign off' });
    expect((within(form).getByLabelText('Regulation departed from') as HTMLInputElement).value).toBe('411.3.2');
  });

  it('judges a departure as the certificate does: all three parts or none', () => {
    expect(departureSchema.safeParse({ regulation: '', instead: '', noLessSafe: '' }).success).toBe(true);
    expect(departureSchema.safeParse({ regulation: '522.6.202', instead: 'Conduit', noLessSafe: 'Earthed' }).success).toBe(true);
    expect(departureSchema.safeParse({ regulation: '522.6.202', instead: ' ', noLessSafe: 'Earthed' }).error?.issues.map((i) => i.path.join('.'))).toEqual(['instead']);
  });
});

describe('parts used', () => {
  it('picks parts from the price list on the phone, or takes a typed line, with a quantity that makes sense', async () => {
    await db.priceItem.bulkPut([
      { id: '01900000-0000-7000-8000-000000000040', name: '2.5 mm² twin and earth cable', unit: 'm', category: 'Cable', active: true, ...base },
      { id: '01900000-0000-7000-8000-000000000041', name: 'Twin switched socket-outlet', unit: 'each', category: 'Accessories', active: true, ...base },
    ]);
    show(paths.visitSignOff.href(ids.visit));
    const form = await screen.findByRole('form', { name: 'Add a part' });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    expect(await within(form).findByText('Pick the part from the price list, or choose “Something else”.')).toBeTruthy();
    fireEvent.change(within(form).getByLabelText('Part'), { target: { value: '01900000-0000-7000-8000-000000000040' } });
    fireEvent.change(within(form).getByLabelText(/Quantity/), { target: { value: '-2' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    expect(await within(form).findByText('The quantity must be more than 0 m.')).toBeTruthy();
    fireEvent.change(within(form).getByLabelText(/Quantity/), { target: { value: '12.5' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    const list = await screen.findByRole('list', { name: 'Parts used on this visit' });
    expect(await within(list).findByText('12.5 m')).toBeTruthy();
    fireEvent.change(within(form).getByLabelText('Part'), { target: { value: 'typed' } });
    fireEvent.change(await within(form).findByLabelText('What it is'), { target: { value: 'Grommet strip, 1 m' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    expect(await within(list).findByText('Grommet strip, 1 m')).toBeTruthy();
    // A part sold by the piece is counted in whole numbers, never "at least 0.001".
    fireEvent.change(within(form).getByLabelText('Part'), { target: { value: '01900000-0000-7000-8000-000000000041' } });
    for (const bad of ['0', '0.5', '-1']) {
      fireEvent.change(within(form).getByLabelText(/Quantity/), { target: { value: bad } });
      fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
      expect(await within(form).findByText('Count whole parts: 1 or more.')).toBeTruthy();
    }
    expect(within(form).queryByText(/0\.001/)).toBeNull();
    fireEvent.change(within(form).getByLabelText(/Quantity/), { target: { value: '2' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add part' }));
    expect(await within(list).findByText('Twin switched socket-outlet')).toBeTruthy();
    const lines = await db.materialLine.toArray();
    expect(lines.map((l) => [l.description, l.quantity, l.unit ?? null])).toEqual([
      ['2.5 mm² twin and earth cable', 12.5, 'm'],
      ['Grommet strip, 1 m', 1, null],
      ['Twin switched socket-outlet', 2, 'each'],
    ]);
  });
});
