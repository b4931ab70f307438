// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

const CABLE = '01900000-0000-7000-8000-0000000000c2';

beforeEach(async () => {
  await resetPhone();
  await db.cableRun.put({ id: CABLE, siteId: ids.site, label: 'RC-02', medium: 'Cat6', status: 'unidentified', ...base });
});
afterEach(() => {
  tidyUp();
  localStorage.clear();
});

describe('tracing an unknown cable', () => {
  it('shows the cautions before tracing, records them read on the visit once, then logs each step', async () => {
    show(paths.visitCable.href(ids.visit, CABLE));
    const before = await screen.findByRole('region', { name: 'Before tracing' });
    for (const words of ['ringing voltage', 'PoE', 'Never connect a tone generator to a live mains conductor', 'Prove the cable dead first', 'HSE GS38', 'Electricity at Work Regulations 1989', 'a competent person decide']) {
      expect(before.textContent).toContain(words);
    }
    expect(screen.queryByRole('form', { name: 'Add a trace step' })).toBeNull();
    fireEvent.click(within(before).getByRole('button', { name: 'I have read this: start tracing' }));
    const step = await screen.findByRole('form', { name: 'Add a trace step' });
    expect((await db.visit.get(ids.visit))?.tracingCautionReadAt).toBeTruthy();
    fireEvent.change(within(step).getByLabelText('Tone connected at'), { target: { value: 'Patch panel port 2' } });
    fireEvent.change(within(step).getByLabelText('Heard at'), { target: { value: 'Surgery 1, behind the X-ray unit' } });
    fireEvent.change(within(step).getByLabelText('Turned out to be'), { target: { value: 'The X-ray unit’s network link' } });
    fireEvent.click(within(step).getByRole('button', { name: 'Add to the trace log' }));
    await waitFor(async () => expect((await db.cableRun.get(CABLE))?.traceLog).toHaveLength(1));
    expect((await db.cableRun.get(CABLE))?.traceLog?.[0]).toMatchObject({ connectedAt: 'Patch panel port 2', heardAt: 'Surgery 1, behind the X-ray unit', turnedOut: 'The X-ray unit’s network link', visitId: ids.visit });
    expect((await screen.findByRole('list', { name: 'Trace steps' })).textContent).toContain('Tone on Patch panel port 2; heard Surgery 1, behind the X-ray unit');
  });

  it('shows the separation a data run beside power needs, with its source, and saves it', async () => {
    show(paths.visitCable.href(ids.visit, CABLE));
    const f = await screen.findByRole('form', { name: 'Cable RC-02' });
    fireEvent.click(within(f).getByLabelText('Runs beside a power cable'));
    fireEvent.change(await within(f).findByLabelText('Side by side for (m)'), { target: { value: '40' } });
    // BS EN 50174-2 Table 4, class b, no divider: 100 mm (from memory).
    const separation = await within(f).findByRole('status', { name: 'Separation from power' });
    expect(separation.textContent).toContain('Keep at least 100 mm from the power cable.');
    expect(separation.textContent).toContain('BS EN 50174-2');
    expect(separation.textContent).toContain('Reg 528.1');
    fireEvent.change(within(f).getByLabelText('Fire class of the cable'), { target: { value: 'Fca' } });
    expect(within(f).getByText(/Below Eca, the least for installed cable/)).toBeTruthy();
    fireEvent.click(within(f).getByRole('button', { name: 'Save cable' }));
    await waitFor(async () => expect((await db.cableRun.get(CABLE))?.separationMm).toBe(100));
    expect(await db.cableRun.get(CABLE)).toMatchObject({ besidePower: true, parallelRunM: 40, containment: 'none', fireClass: 'Fca' });
  });
});
