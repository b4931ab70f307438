// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

beforeEach(async () => {
  await resetPhone();
  await addRing();
  // Ze 0.35 Ω, a figure suppliers quote for TN-C-S (from memory)
  await db.site.update(ids.site, { zeOhm: 0.35 });
  await db.visit.update(ids.visit, { cautionsReadAt: at(9) });
  await db.testResult.put({ id: '01900000-0000-7000-8000-000000000020', visitId: ids.otherVisit, siteId: ids.site, circuitId: ids.circuit, r1Ohm: 0.3705, rnOhm: 0.3705, r2Ohm: 0.605, testedAt: at(10, -7), ...base });
});
afterEach(tidyUp);
// The lazy screens take a while to load on a busy machine.
vi.setConfig({ testTimeout: 60_000 });

const type = (el: HTMLElement, label: string, value: string) => fireEvent.change(within(el).getByLabelText(label), { target: { value } });

async function ringExtension() {
  show(paths.visitPoint.href(ids.visit, 'new'));
  const f = await screen.findByRole('form', { name: 'Record a point change' }, { timeout: 20_000 });
  fireEvent.click(within(f).getByRole('button', { name: 'New point' }));
  type(f, 'Accessory', 'Twin socket-outlet');
  type(f, 'Where it is: where on the wall', 'Left of the chimney breast');
  type(f, 'Circuit', ids.circuit);
  type(f, 'How it joins the circuit', 'ring-extension');
  await waitFor(() => expect((within(f).getByLabelText('r1 before (Ω)') as HTMLInputElement).value).toBe('0.3705'));
  type(f, 'Cable added to the ring (m)', '8');
  return f;
}

describe('checks before the work on the Points form', () => {
  it('predicts Zs at the new point and says the circuit has the RCD its sockets need', async () => {
    const f = await ringExtension();
    const checks = await within(f).findByRole('status', { name: 'Checks before the work' });
    // (r1 + r2) / 4 after 8 m of 2.5/1.5 = 0.2829 Ω; Zs = 0.35 + 1.20 × 0.2829 = 0.69 Ω ≤ 1.37 Ω for B32
    // (IEC 60228:2004; BS 7671:2018+A2:2022 Table 41.3)
    await waitFor(() => expect(within(checks).getByRole('listitem', { name: 'Predicted Zs at the new point' }).textContent).toContain('Predicted Zs 0.69 Ω'));
    const rcd = within(checks).getByRole('listitem', { name: 'RCD protection' });
    expect(rcd.textContent).toContain('30 mA RCD required: the circuit has one');
    expect(rcd.textContent).toContain('Reg 411.3.3');
    expect(within(rcd).queryByRole('alert')).toBeNull();
    expect(checks.textContent).toContain('a competent person decide');
  });

  it('warns clearly, as it is typed, when the circuit has no RCD', async () => {
    await db.circuit.update(ids.circuit, { rcdRatingMa: null });
    const f = await ringExtension();
    const checks = await within(f).findByRole('status', { name: 'Checks before the work' });
    const alert = await within(checks).findByRole('alert');
    expect(alert.textContent).toContain('30 mA RCD required: the circuit has none');
    expect(alert.textContent).toContain('provide it before the work is put into service');
    // Moved to a room with a bath: Section 701 joins the reasons
    type(f, 'Location', 'bathroom');
    await waitFor(() => expect(within(checks).getByRole('alert').textContent).toContain('a room containing a bath or shower'));
  });

  it('sizes the new cable and its cpc from the installation method picked from pictures', async () => {
    const f = await ringExtension();
    fireEvent.click(within(f).getByRole('button', { name: /^Method 103 In an insulated stud wall, not touching the board/ }));
    const checks = await within(f).findByRole('status', { name: 'Checks before the work' });
    // Method 103, 2.5 mm²: 13.5 A, below the 20 A a ring's cable must carry (Table 4D5; Reg 433.1.204)
    const cable = await within(checks).findByRole('listitem', { name: 'New cable' });
    expect(cable.textContent).toContain('Iz 13.5 A');
    expect(cable.textContent).toContain('below the 20 A');
    // 230 / 0.69 = 334 A clears a B32 at once: √(334² × 0.1) / 115 = 0.92 mm² (Reg 543.1.3, Table 54.3)
    expect(within(checks).getByRole('listitem', { name: 'Cpc for the fault' }).textContent).toContain('Minimum cpc 0.92 mm² at 334 A');
    fireEvent.click(within(f).getByRole('button', { name: /Method 102/ }));
    await waitFor(() => expect(within(checks).getByRole('listitem', { name: 'New cable' }).textContent).toContain('Iz 21 A'));
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    await waitFor(async () => expect(await db.pointChange.count()).toBe(1));
    expect((await db.pointChange.toArray())[0]).toMatchObject({ installationMethod: '102', supplies: 'sockets', location: 'indoors', dwelling: true, addedRouteM: 8 });
  });

  it('judges an unfused spur against the ring’s points', async () => {
    show(paths.visitPoint.href(ids.visit, 'new'));
    const f = await screen.findByRole('form', { name: 'Record a point change' }, { timeout: 20_000 });
    fireEvent.click(within(f).getByRole('button', { name: 'New point' }));
    type(f, 'Accessory', 'Single socket-outlet');
    type(f, 'Circuit', ids.circuit);
    type(f, 'How it joins the circuit', 'unfused-spur');
    type(f, 'Points on the ring', '5');
    type(f, 'Unfused spurs', '6');
    const checks = await within(f).findByRole('status', { name: 'Checks before the work' });
    // IET On-Site Guide §7.2.2: no more unfused spurs than points on the ring
    const spur = await within(checks).findByRole('listitem', { name: 'Unfused spur' });
    expect(spur.textContent).toContain('6 unfused spurs on 5 points');
    expect(spur.textContent).toContain('more spurs than points');
    type(f, 'Unfused spurs', '2');
    await waitFor(() => expect(within(checks).getByRole('listitem', { name: 'Unfused spur' }).textContent).toContain('keep to the customary limits'));
  });
});
