// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';
import { signOffSchema } from '../components/sign-off-form';

beforeEach(async () => {
  localStorage.clear();
  await resetPhone();
  await addRing();
});
afterEach(tidyUp);


const type = (el: HTMLElement, label: string | RegExp, value: string) => fireEvent.change(within(el).getByLabelText(label), { target: { value } });

describe('what the certificate states, at sign-off', () => {
  it('carries the earthing, bonding and Zdb from the site and board, and saves them back to them', async () => {
    await db.site.update(ids.site, { earthingConductor: 'adequate', bondingWater: 'adequate', bondingGas: 'none' });
    await db.board.update(ids.board, { zdbOhm: 0.31 });
    show(paths.visitSignOff.href(ids.visit));
    const form = await screen.findByRole('form', { name: 'Earthing and bonding' });
    expect((within(form).getByLabelText('Zdb at Consumer unit (Ω)') as HTMLInputElement).value).toBe('0.31');
    expect((within(form).getByLabelText('Earthing conductor') as HTMLSelectElement).value).toBe('adequate');
    expect((within(form).getByLabelText('Main bonding to water') as HTMLSelectElement).value).toBe('adequate');
    expect((within(form).getByLabelText('Main bonding to gas') as HTMLSelectElement).value).toBe('none');
    expect((within(form).getByLabelText('Main bonding to oil') as HTMLSelectElement).value).toBe('');

    type(form, 'Zdb at Consumer unit (Ω)', '-1');
    fireEvent.click(within(form).getByRole('button', { name: 'Save earthing and bonding' }));
    expect(await within(form).findByText('Zdb cannot be negative.')).toBeTruthy();

    type(form, 'Zdb at Consumer unit (Ω)', '0,29');
    type(form, 'Main bonding to oil', 'none');
    type(form, 'Main bonding to structural steel', 'inadequate');
    type(form, 'Main bonding to other parts', 'adequate');
    type(form, 'Other parts bonded', 'Lightning protection');
    fireEvent.click(within(form).getByRole('button', { name: 'Save earthing and bonding' }));
    expect(await within(form).findByText('Earthing, bonding and Zdb saved on this phone.')).toBeTruthy();
    expect(await db.board.get(ids.board)).toMatchObject({ zdbOhm: 0.29 });
    expect(await db.site.get(ids.site)).toMatchObject({
      earthingConductor: 'adequate', bondingWater: 'adequate', bondingGas: 'none', bondingOil: 'none', bondingSteel: 'inadequate', bondingOther: 'adequate', bondingOtherWhat: 'Lightning protection',
    });
    const outbox = await db.outbox.toArray();
    expect(outbox.map((o) => o.entity).sort()).toEqual(['board', 'site']);
  });

  it('shows the declaration, takes the position, comments and a permitted exception with its risk assessment, and offers the last position again', async () => {
    await db.visit.put({ id: '01900000-0000-7000-8000-000000000050', jobId: ids.job, siteId: ids.site, technicianIds: [], status: 'finished', signedByName: 'Sam Brannigan', signedByPosition: 'Qualifying supervisor', signedAt: at(10, -7), ...base });
    show(paths.visitSignOff.href(ids.visit));
    const form = await screen.findByRole('form', { name: 'Sign off' });
    const declaration = within(form).getByRole('note', { name: 'Declaration' });
    expect(declaration.textContent).toContain('does not impair the safety of the existing installation');
    // The amendment in force on the day it is signed: A3:2024 from 31 July 2024 (M).
    expect(declaration.textContent).toContain('in accordance with BS 7671:2018+A3:2024, in force on');
    await waitFor(() => expect((within(form).getByLabelText('Position') as HTMLInputElement).value).toBe('Qualifying supervisor'));

    type(form, 'Position', 'Electrician');
    type(form, /Comments on the existing installation \(Reg 644\.1\.2\)/, 'No main bonding to the gas meter: recommended.');
    type(form, /Permitted exceptions \(Reg 411\.3\.3\)/, 'Loft ceiling bracket out of reach, not earthed.');
    type(form, 'Risk assessment reference', '');
    fireEvent.click(within(form).getByRole('button', { name: 'Finish visit' }));
    expect(await within(form).findByText('Name the risk assessment behind the exception.')).toBeTruthy();
    expect((await db.visit.get(ids.visit))!.status).toBe('planned');
  });

  it('keeps the position, comments, exception and risk assessment in the draft when the screen is left and opened again', async () => {
    show(paths.visitSignOff.href(ids.visit));
    let form = await screen.findByRole('form', { name: 'Sign off' });
    type(form, 'Position', 'Approved electrician');
    type(form, /Comments on the existing installation \(Reg 644\.1\.2\)/, 'No main bonding to the gas meter: recommended.');
    type(form, /Permitted exceptions \(Reg 411\.3\.3\)/, 'Loft ceiling bracket out of reach, not earthed.');
    type(form, 'Risk assessment reference', 'RA-14');
    cleanup();

    show(paths.visitSignOff.href(ids.visit));
    form = await screen.findByRole('form', { name: 'Sign off' });
    const value = (label: string | RegExp) => (within(form).getByLabelText(label) as HTMLInputElement | HTMLTextAreaElement).value;
    expect(value('Position')).toBe('Approved electrician');
    expect(value(/Comments on the existing installation/)).toBe('No main bonding to the gas meter: recommended.');
    expect(value(/Permitted exceptions/)).toBe('Loft ceiling bracket out of reach, not earthed.');
    expect(value('Risk assessment reference')).toBe('RA-14');
  });

  it('refuses an exception with no risk assessment, and keeps what the certificate needs when all is given', () => {
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"/>';
    const given = {
      arrivedAt: '09:05', leftAt: '12:30', workDescription: 'Moved a socket', observations: '', departureEntries: [], signedByName: 'Sam', signedByPosition: 'Electrician',
      existingInstallationComments: 'No cpc at the hall light.', permittedExceptions: 'Loft bracket out of reach.', riskAssessmentRef: '', signatureSvg: svg,
    };
    expect(signOffSchema.safeParse(given).error?.issues[0]).toMatchObject({ path: ['riskAssessmentRef'], message: 'Name the risk assessment behind the exception.' });
    expect(signOffSchema.safeParse({ ...given, riskAssessmentRef: 'RA-14' }).success).toBe(true);
    expect(signOffSchema.safeParse({ ...given, permittedExceptions: '', riskAssessmentRef: '' }).success).toBe(true);
    expect(signOffSchema.safeParse({ ...given, signedByPosition: 'x'.repeat(101), riskAssessmentRef: 'RA-14' }).error?.issues[0]?.message).toBe('The position must be at most 100 characters.');
  });
});
