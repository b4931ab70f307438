// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';
import { signOffSchema } from '../components/sign-off-form';
import { strokesToSvg } from '../components/signature-pad';

beforeEach(async () => {
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
    const list = await screen.findByRole('list', { name: 'Fails and missing readings' });
    // 1.25 Ω against 1.10 Ω for a B32 (BS 7671:2018+A2:2022 Table 41.3, Appendix 3).
    expect(within(list).getByText('Fail: Circuit 1 (Sockets, ground floor): Earth fault loop impedance Zs')).toBeTruthy();
    expect(within(list).getByText('Missing: Circuit 1 (Sockets, ground floor): Polarity')).toBeTruthy();
    expect(within(list).getByText('Not tested: Circuit 4 (Cooker)')).toBeTruthy();
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

  it('keeps the signature as a small SVG of its strokes', () => {
    const svg = strokesToSvg([{ points: [{ x: 10.4, y: 20.6, pressure: 0.5, time: 0 }, { x: 30, y: 40, pressure: 0.5, time: 1 }], dotSize: 0, minWidth: 1, maxWidth: 3, penColor: '#000', velocityFilterWeight: 0.7, compositeOperation: 'source-over' }], 320, 180);
    expect(svg).toBe('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 320 180" width="320" height="180"><g fill="none" stroke="#14262b" stroke-width="2.5" stroke-linecap="round" stroke-linejoin="round"><path d="M10 21L30 40"/></g></svg>');
    const ok = signOffSchema.safeParse({ workDescription: 'Moved a socket', observations: '', departures: '', signedByName: 'Sam', signatureSvg: svg });
    expect(ok.success).toBe(true);
    expect(signOffSchema.safeParse({ workDescription: 'x', observations: '', departures: '', signedByName: 'Sam', signatureSvg: 'x'.repeat(60_001) }).success).toBe(false);
  });
});
