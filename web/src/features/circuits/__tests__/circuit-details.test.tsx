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

describe('a circuit’s details', () => {
  it('records the method of fault protection and a circuit installed new on this visit, as the technician chooses them', async () => {
    show(paths.visitCircuit.href(ids.visit, ids.circuit));
    const form = await screen.findByRole('form', { name: 'Circuit details' }, { timeout: 15_000 });
    // Nothing is assumed: the method starts unrecorded, and the circuit starts as an existing one.
    expect((within(form).getByLabelText('Fault protection') as HTMLSelectElement).value).toBe('');
    fireEvent.change(within(form).getByLabelText('Fault protection'), { target: { value: 'rcd' } });
    fireEvent.change(within(form).getByLabelText('Existing or new'), { target: { value: 'new' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save circuit details' }));
    await waitFor(async () => expect((await db.circuit.get(ids.circuit))!.faultProtection).toBe('rcd'));
    expect((await db.circuit.get(ids.circuit))!.newOnVisitId).toBe(ids.visit);
  });

  it('keeps the mark of a circuit installed new on another visit', async () => {
    await db.circuit.update(ids.circuit, { newOnVisitId: ids.otherVisit });
    show(paths.visitCircuit.href(ids.visit, ids.circuit));
    const form = await screen.findByRole('form', { name: 'Circuit details' }, { timeout: 15_000 });
    expect((within(form).getByLabelText('Existing or new') as HTMLSelectElement).value).toBe('existing');
    fireEvent.change(within(form).getByLabelText('Fault protection'), { target: { value: 'overcurrent-device' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save circuit details' }));
    await waitFor(async () => expect((await db.circuit.get(ids.circuit))!.faultProtection).toBe('overcurrent-device'));
    expect((await db.circuit.get(ids.circuit))!.newOnVisitId).toBe(ids.otherVisit);
  });

  it('marks the circuit’s board as replaced on this visit', async () => {
    show(paths.visitCircuit.href(ids.visit, ids.circuit));
    const form = await screen.findByRole('form', { name: 'Circuit details' }, { timeout: 15_000 });
    fireEvent.click(within(form).getByLabelText(/Consumer unit was replaced on this visit/));
    await waitFor(async () => expect((await db.board.get(ids.board))!.replacedOnVisitId).toBe(ids.visit));
  });
});
