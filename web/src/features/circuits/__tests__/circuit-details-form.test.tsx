// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

beforeEach(async () => {
  await resetPhone();
  await addRing();
  await db.visit.update(ids.visit, { cautionsReadAt: at(9) });
});
afterEach(tidyUp);


const details = async () => {
  show(paths.visitCircuit.href(ids.visit, ids.circuit));
  // The details open by themselves while any is missing (the method of fault protection is, on the fixture's ring).
  const summary = await screen.findByRole('button', { name: /Circuit details/ });
  if (summary.getAttribute('aria-expanded') !== 'true') fireEvent.click(summary);
  return screen.findByRole('form', { name: 'Circuit details' });
};
const field = (el: HTMLElement, label: string) => within(el).getByLabelText(label) as HTMLInputElement | HTMLSelectElement;
const type = (el: HTMLElement, label: string, value: string) => fireEvent.change(field(el, label), { target: { value } });

describe('the circuit’s details for the certificate', () => {
  it('offers the standard values from the device, the RCD and the site’s earthing, and follows them until typed over', async () => {
    const f = await details();
    // Type B circuit-breaker: BS EN 60898-1; type A RCD: BS EN 61008-1; a B32 ring on TN-C-S: 0.4 s (BS 7671:2018+A2:2022 Table 41.1, M).
    expect(field(f, 'Device standard, BS (EN)').value).toBe('BS EN 60898-1');
    expect(field(f, 'RCD standard, BS (EN)').value).toBe('BS EN 61008-1');
    expect(field(f, 'Maximum disconnection time (s)').value).toBe('0.4');
    expect(within(f).getAllByText('The standard value: check it against the device.').length).toBe(2);
    // The time is the regulations', not the device's
    expect(within(f).getByText('From Table 41.1 for this circuit and supply: check it applies.')).toBeTruthy();
    expect(field(f, 'AFDD').value).toBe('');

    // A BS 88-3 fuse is named by its own standard (BS 7671:2018+A2:2022 Table 41.2 lists it so).
    type(f, 'Protective device', 'BS 88-3');
    await waitFor(() => expect(field(f, 'Device standard, BS (EN)').value).toBe('BS 88-3'));
    // An RCBO: its RCD's rated current is its own rating.
    type(f, 'RCD standard, BS (EN)', 'BS EN 61009-1');
    await waitFor(() => expect(field(f, 'RCD rated current (A)').value).toBe('32'));
    // Typed over, an offer stays as typed.
    type(f, 'Maximum disconnection time (s)', '5');
    type(f, 'Rating (A)', '20');
    await waitFor(() => expect(field(f, 'RCD rated current (A)').value).toBe('20'));
    expect(field(f, 'Maximum disconnection time (s)').value).toBe('5');
  });

  it('saves the standards, AFDD, reference method, points served and disconnection time to the circuit', async () => {
    const f = await details();
    type(f, 'Points served', '2.5');
    fireEvent.click(within(f).getByRole('button', { name: 'Save circuit details' }));
    expect(await within(f).findByText('The number of points served must be a whole number.')).toBeTruthy();
    type(f, 'Points served', '9');
    type(f, 'Reference method', 'C');
    type(f, 'AFDD', 'BS EN 62606');
    type(f, 'RCD rated current (A)', '63');
    fireEvent.click(within(f).getByRole('button', { name: 'Save circuit details' }));
    expect(await screen.findByText('Circuit details saved on this phone.')).toBeTruthy();
    expect(await db.circuit.get(ids.circuit)).toMatchObject({
      deviceStandard: 'BS EN 60898-1', rcdStandard: 'BS EN 61008-1', rcdRatedCurrentA: 63, afddStandard: 'BS EN 62606', referenceMethod: 'C', pointsServed: 9, maxDisconnectionS: 0.4,
    });
  });

  it('takes R2 by the long lead instead of R1+R2, and the AFDD’s test button where one is fitted', async () => {
    await db.circuit.update(ids.circuit, { afddStandard: 'BS EN 62606', kind: 'radial' });
    show(paths.visitCircuit.href(ids.visit, ids.circuit));
    const f = await screen.findByRole('form', { name: 'Readings for circuit 1' });
    type(f, 'or R2, long lead (Ω)', '0.41');
    expect(await within(f).findByRole('button', { name: /^R2 \(protective conductor continuity, long lead\): Pass/ })).toBeTruthy();
    fireEvent.click(within(within(f).getByRole('region', { name: 'AFDD' })).getByRole('button', { name: 'Does not trip' }));
    expect(await within(f).findByRole('button', { name: /^AFDD test button: Fail/ })).toBeTruthy();
    fireEvent.click(within(f).getByRole('button', { name: 'Save readings' }));
    expect(await screen.findByText('Readings saved on this phone.')).toBeTruthy();
    expect((await db.testResult.toArray())[0]).toMatchObject({ r2LeadOhm: 0.41, afddButton: 'fails' });
  });
});
