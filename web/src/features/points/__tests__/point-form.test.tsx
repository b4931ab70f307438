// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';
import { predictExtension } from '../phone/point-form';

beforeEach(async () => {
  await resetPhone();
  await addRing();
  await db.visit.update(ids.visit, { cautionsReadAt: at(9) });
});
afterEach(tidyUp);

const form = async () => screen.findByRole('form', { name: 'Record a point change' });
const type = (el: HTMLElement, label: string, value: string) => fireEvent.change(within(el).getByLabelText(label), { target: { value } });

describe('recording a point change', () => {
  it('asks what the accessory is and where it went, and refuses a negative height', async () => {
    show(paths.visitPoint.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Where it is now: height to centre (mm)', '-5');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    expect(await within(f).findByText('Say what the accessory is, for example "Twin socket-outlet".')).toBeTruthy();
    expect(within(f).getByText('Say where the point is now: pick the area or describe the place.')).toBeTruthy();
    expect(within(f).getByText('Say where the point was: pick the area or describe the place.')).toBeTruthy();
    expect(within(f).getByText('The height it is at cannot be negative.')).toBeTruthy();
    expect(await db.pointChange.count()).toBe(0);
  });

  it('predicts the ring after an extension from the last end-to-end readings on the phone', async () => {
    // The ring as tested on an earlier visit; the form starts from these.
    await db.testResult.put({ id: '01900000-0000-7000-8000-000000000020', visitId: ids.otherVisit, siteId: ids.site, circuitId: ids.circuit, r1Ohm: 0.3705, rnOhm: 0.3705, r2Ohm: 0.605, testedAt: at(10, -7), ...base });
    show(paths.visitPoint.href(ids.visit, 'new'));
    const f = await form();
    type(f, 'Accessory', 'Twin socket-outlet');
    type(f, 'Where it was: where on the wall', 'Behind the sofa');
    type(f, 'Where it is now: area', ids.lounge);
    type(f, 'Circuit', ids.circuit);
    type(f, 'How it joins the circuit', 'ring-extension');
    await waitFor(() => expect((within(f).getByLabelText('r1 before (Ω)') as HTMLInputElement).value).toBe('0.3705'));
    expect((within(f).getByLabelText('Live size (mm²)') as HTMLInputElement).value).toBe('2.5');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    expect(await within(f).findByText('Enter the cable added to the ring, out to the point and back.')).toBeTruthy();
    type(f, 'Cable added to the ring (m)', '10');
    // core README test vector: +10 m of 2.5/1.5 gives r1 = rn = 0.4446 Ω, r2 = 0.726 Ω, R1+R2 = 0.2927 Ω
    // (IEC 60228:2004 7.41 and 12.10 mΩ/m at 20 °C; (r1 + r2) / 4 per IET GN3 ring test step 3).
    const prediction = await within(f).findByRole('status', { name: 'Predicted after the extension' });
    expect(prediction.textContent).toContain('r1 0.44 Ω, rn 0.44 Ω, r2 0.73 Ω');
    expect(prediction.textContent).toContain('Predicted R1+R2 0.29 Ω');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    await waitFor(async () => expect(await db.pointChange.count()).toBe(1));
    expect((await db.pointChange.toArray())[0]).toMatchObject({ action: 'move', connection: 'ring-extension', addedRouteM: 10, beforeR1Ohm: 0.3705, liveCsaMm2: 2.5, cpcCsaMm2: 1.5, visitId: ids.visit });
  });

  it('says what it still needs before it can predict', () => {
    const blank = { beforeR1Ohm: '', beforeRnOhm: '', beforeR2Ohm: '', liveCsaMm2: '2.5', cpcCsaMm2: '1.5', addedRouteM: '4' };
    expect(predictExtension(blank).waiting).toMatch(/r1, rn and r2/);
    expect(predictExtension({ ...blank, beforeR1Ohm: '0.5', beforeRnOhm: '0.5', beforeR2Ohm: '0.8', liveCsaMm2: '3' }).waiting).toMatch(/not listed in IEC 60228/);
  });

  it('chooses the fuse for a fixed appliance on a fused connection unit', async () => {
    show(paths.visitPoint.href(ids.visit, 'new'));
    const f = await form();
    fireEvent.click(within(f).getByRole('button', { name: 'New point' }));
    type(f, 'Accessory', 'Switched fused connection unit');
    type(f, 'Where it is: where on the wall', 'Beside the towel rail');
    type(f, 'Appliance load (W)', '2000');
    // 2000 W / 230 V = 8.70 A: the smallest BS 1362 fuse that carries it is 13 A (3, 5, 13 A; trade-reference §8).
    const fuse = await within(f).findByRole('status', { name: 'Fuse to fit' });
    expect(fuse.textContent).toContain('Fit a 13 A fuse');
    type(f, 'Appliance load (W)', '500');
    // 500 W / 230 V = 2.17 A: 3 A.
    await waitFor(() => expect(within(f).getByRole('status', { name: 'Fuse to fit' }).textContent).toContain('Fit a 3 A fuse'));
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    await waitFor(async () => expect(await db.pointChange.count()).toBe(1));
    expect((await db.pointChange.toArray())[0]).toMatchObject({ action: 'add', loadW: 500, fuseRatingA: 3 });
    // The new point change opens as itself, and says it was saved.
    expect(await screen.findByText('Point change saved on this phone.')).toBeTruthy();
  });

  it('will not save while a figure in the wall drawing is refused', async () => {
    show(paths.visitPoint.href(ids.visit, 'new'));
    const f = await form();
    fireEvent.click(within(f).getByRole('button', { name: 'New point' }));
    type(f, 'Accessory', 'Twin socket-outlet');
    type(f, 'Where it is: where on the wall', 'Left of the door');
    fireEvent.click(within(f).getByLabelText('Check a new concealed cable route'));
    type(f, 'Wall width (mm)', '-10');
    expect(within(f).getByText('Wall width cannot be negative.')).toBeTruthy();
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    expect(await within(f).findByText('A figure in the wall drawing cannot stand: put right the one marked, or switch the route check off.')).toBeTruthy();
    expect(await db.pointChange.count()).toBe(0);
    type(f, 'Wall width (mm)', '3000');
    fireEvent.click(within(f).getByRole('button', { name: 'Save new point change' }));
    await waitFor(async () => expect(await db.pointChange.count()).toBe(1));
  });
});
