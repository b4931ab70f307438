// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

beforeEach(async () => {
  await resetPhone();
  await addRing();
  await db.circuit.update(ids.circuit, { kind: 'radial', deviceRatingA: 20, lengthM: 20 });
  await db.visit.update(ids.visit, { cautionsReadAt: at(9) });
});
afterEach(tidyUp);
// The lazy screens take a while to load on a busy machine.
vi.setConfig({ testTimeout: 60_000 });

describe('a radial’s R1+R2 on the readings form', () => {
  it('shows what the cable should read and asks for a look at a reading far from it', async () => {
    show(paths.visitCircuit.href(ids.visit, ids.circuit));
    const f = await screen.findByRole('form', { name: 'Readings for circuit 1' }, { timeout: 20_000 });
    const group = within(f).getByRole('region', { name: 'Protective conductor' });
    // 20 m × (7.41 + 12.10) mΩ/m = 0.39 Ω (IEC 60228:2004 Tables 1–2, 20 °C)
    expect(group.textContent).toContain('Expect R1+R2 of about 0.39 Ω: 20 m of 2.5/1.5 mm²');
    fireEvent.change(within(group).getByLabelText('R1+R2 (Ω)'), { target: { value: '5' } });
    await waitFor(() => expect(within(group).getByRole('button', { name: /R1\+R2 \(protective conductor continuity\): Check/ })).toBeTruthy());
    expect(group.textContent).toMatch(/well above 0\.39 Ω expected/);
    fireEvent.change(within(group).getByLabelText('R1+R2 (Ω)'), { target: { value: '0.41' } });
    await waitFor(() => expect(within(group).getByRole('button', { name: /R1\+R2 \(protective conductor continuity\): Pass/ })).toBeTruthy());
  });
});
