// @vitest-environment happy-dom
import { fireEvent, screen, within } from '@testing-library/react';
import { certificateThatApplies, defaultParticulars, type InstallationCertificatePreview } from '@wiretrail/core';
import { describe, expect, it } from 'vitest';
import type { FakeAnswer, FakeCall } from '@/lib/fake-api';
import { JOB, showJobDocuments, signedInAtTheDesk } from './job-documents-harness';

const choice = certificateThatApplies({ visitIds: ['v1'], circuits: [{ id: 'c2', number: '2', description: 'Garden office sockets', newOnVisitId: 'v1' }], boards: [] });
// Fernhill Close as recorded on site: TT, Ze 38 Ω, PFC 0.6 kA, nothing recorded of the earthing conductor or bonding.
const PREVIEW: InstallationCertificatePreview = {
  choice,
  defaults: defaultParticulars({ site: { id: 's1', earthing: 'TT', zeOhm: 38, pfcKa: 0.6 }, signer: 'Aled Pryce', choice, boardReplaced: false, existingComments: [] }),
  problems: [],
  circuits: ['Consumer unit: circuit 1 (Sockets, ground floor)', 'Consumer unit: circuit 2 (Garden office sockets)'],
};

function show(answer: (c: FakeCall) => FakeAnswer = () => undefined) {
  return showJobDocuments({ name: 'Tom Okonjo', email: 'okonjo@example.com' }, (c) => {
    if (c.path === `/api/jobs/${JOB}/documents` && c.method === 'GET') return { status: 200, body: { items: [] } };
    if (c.path === `/api/jobs/${JOB}/installation-certificate`) return { status: 200, body: PREVIEW };
    return answer(c);
  });
}

describe('issuing an installation certificate at the desk', () => {
  signedInAtTheDesk();

  it('says which certificate applies, starts from the site’s records, and sends nothing until the particulars are complete', async () => {
    const calls = show((c) => (c.method === 'POST' ? { status: 201, body: { id: 'd1', number: 'EIC-0001', kind: 'installation-certificate', notices: [] } } : undefined));
    fireEvent.click(await screen.findByRole('button', { name: 'Issue installation certificate' }));
    const dialog = screen.getByRole('dialog', { name: 'Issue the electrical installation certificate?' });
    expect((await within(dialog).findByRole('alert', { name: 'Which certificate applies' })).textContent).toContain('Circuit 2 (Garden office sockets) was installed as a new circuit.');
    expect((await within(dialog).findByLabelText('Ze (Ω)') as HTMLInputElement).value).toBe('38');
    expect((within(dialog).getByLabelText('Inspection and testing by') as HTMLInputElement).value).toBe('Aled Pryce');

    // A TT supply needs its electrode, and continuity verified: named beside each field, and nothing sent.
    fireEvent.click(within(dialog).getByRole('button', { name: 'Issue' }));
    expect(await within(dialog).findByText('a TT installation needs its earth electrode’s resistance to earth.')).toBeTruthy();
    expect(within(dialog).getByText('the main protective bonding conductors’ continuity must be verified before a certificate is issued.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);

    fireEvent.change(within(dialog).getByLabelText('Earth electrode resistance (Ω)'), { target: { value: '36' } });
    fireEvent.click(within(dialog).getByLabelText('Earthing conductor continuity verified'));
    fireEvent.click(within(dialog).getByLabelText('Main bonding continuity verified'));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Issue' }));
    await screen.findByText('EIC-0001 issued.');
    const sent = calls.find((c) => c.method === 'POST')!.body as { kind: string; particulars: { origin: { electrodeOhm: number; bondingContinuity: boolean }; supply: { system: string } } };
    expect(sent.kind).toBe('installation-certificate');
    expect(sent.particulars.origin).toMatchObject({ electrodeOhm: 36, bondingContinuity: true });
    expect(sent.particulars.supply.system).toBe('TT');
  });

  it('warns, before issuing, that the minor works certificate will be refused for new work', async () => {
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Issue minor works certificate' }));
    const dialog = screen.getByRole('dialog', { name: 'Issue the minor works certificate?' });
    const note = await within(dialog).findByRole('alert', { name: 'Which certificate applies' });
    expect(note.textContent).toContain('This work needs the electrical installation certificate');
    expect(note.textContent).toContain('Issuing the minor works certificate will be refused.');
  });
});
