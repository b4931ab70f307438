// @vitest-environment happy-dom
import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { FakeAnswer, FakeCall } from '@/lib/fake-api';
import { JOB, showJobDocuments, signedInAtTheDesk } from './job-documents-harness';
import type { JobDocument } from '../api/get-job-documents';

const doc = (n: number, extra: Partial<JobDocument>): JobDocument => ({
  id: `01900000-0000-7000-8000-00000000002${n}`, jobId: JOB, kind: 'photo-record', number: `PR-000${n}`, title: null, signerName: 'Dan Whitlow',
  pdfSha256: 'a'.repeat(64), pdfBytes: 1000, issuedAt: '2026-03-14T11:00:00.000Z', issuedById: null, emailState: null, emailedTo: null, emailedAt: null, emailError: null,
  coverage: null, supersedesId: null, revisionReason: null, supersededAt: null, supersededById: null,
  ...extra,
});

function show(answer: (c: FakeCall) => FakeAnswer) {
  return showJobDocuments({ name: 'Hannah Greaves', email: 'hannah.greaves@example.com' }, answer);
}

describe('JobDocuments', () => {
  signedInAtTheDesk();

  it('lists what was issued with how each e-mail is getting on', async () => {
    show(() => ({
      status: 200,
      body: {
        items: [
          doc(3, { emailState: 'failed', emailedTo: 'x@example.com', emailError: 'Not sent after 6 attempts: 550 5.1.1 No such mailbox' }),
          doc(2, { emailState: 'queued', emailedTo: 'hannah.greaves@example.com', emailError: 'Attempt 1 of 6 failed, trying again: 451 busy' }),
          doc(1, { kind: 'minor-works', number: 'MW-0001', signerName: 'Aled Pryce', emailState: 'sent', emailedTo: 'hannah.greaves@example.com', emailedAt: '2026-03-14T11:05:00.000Z' }),
        ],
      },
    }));
    const table = await screen.findByRole('table', { name: 'Issued documents' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getAllByRole('cell')[0]!.textContent)).toEqual(['PR-0003', 'PR-0002', 'MW-0001']);
    expect(within(rows[0]!).getByText('Failed')).toBeTruthy();
    expect(within(rows[0]!).getByText('Not sent after 6 attempts: 550 5.1.1 No such mailbox')).toBeTruthy();
    expect(within(rows[1]!).getByText('Retrying')).toBeTruthy();
    expect(within(rows[2]!).getByText('Sent')).toBeTruthy();
    expect(within(rows[2]!).getByText('Signed by Aled Pryce')).toBeTruthy();
  });

  it("asks before issuing, then shows the server's refusal plainly, every reason of it", async () => {
    const calls = show((c) =>
      c.method === 'POST'
        ? {
            status: 422,
            body: {
              statusCode: 422,
              error: 'Unprocessable Entity',
              message: [
                'Circuit 1 (Sockets, ground floor): Earth fault loop impedance Zs fails. Zs 1.52 Ω is above 1.10 Ω.',
                'Circuit 1 (Sockets, ground floor): RCD operating time at 30 mA has no reading (RCD operating time).',
              ],
            },
          }
        : { status: 200, body: { items: [] } },
    );
    expect(await screen.findByText('No documents issued for this job yet.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Issue minor works certificate' }));
    const confirm = screen.getByRole('dialog', { name: 'Issue the minor works certificate?' });
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
    fireEvent.click(within(confirm).getByRole('button', { name: 'Issue' }));
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The minor works certificate was not issued')).toBeTruthy();
    expect(within(alert).getByText(/Zs 1\.52 Ω is above 1\.10 Ω/)).toBeTruthy();
    expect(within(alert).getByText(/RCD operating time at 30 mA has no reading/)).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([{ method: 'POST', path: `/api/jobs/${JOB}/documents`, body: { kind: 'minor-works' } }]);
  });

  it('asks which cables a cabling report covers, and names each cable that fails once issued', async () => {
    const calls = show((c) =>
      c.method === 'POST'
        ? { status: 201, body: { ...doc(1, { kind: 'cabling-report', number: 'CR-0001', coverage: 'site' }), notices: ['RC-03 fails: The pair on pins 1,2 lands on pins 3,6 at the other end.'] } }
        : { status: 200, body: { items: [doc(2, { kind: 'minor-works', number: 'MW-0002', supersedesId: doc(3, {}).id, revisionReason: 'Breaker is 20 A' }), doc(3, { kind: 'minor-works', number: 'MW-0001', supersededAt: '2026-03-15T09:00:00.000Z', supersededById: doc(2, {}).id })] } },
    );
    const table = await screen.findByRole('table', { name: 'Issued documents' });
    expect(within(table).getByText('Superseded by MW-0002')).toBeTruthy();
    expect(within(table).getByText('Revision of MW-0001: Breaker is 20 A')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Issue cabling report' }));
    const confirm = screen.getByRole('dialog', { name: 'Issue the cabling report?' });
    fireEvent.click(within(confirm).getByLabelText(/The site’s whole cable schedule/));
    fireEvent.click(within(confirm).getByRole('button', { name: 'Issue' }));
    expect(await screen.findByText('CR-0001 records a fault')).toBeTruthy();
    expect(screen.getByText(/RC-03 fails: The pair on pins 1,2 lands on pins 3,6/)).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([{ method: 'POST', path: `/api/jobs/${JOB}/documents`, body: { kind: 'cabling-report', coverage: 'site' } }]);
  });

  it("opens the e-mail form with the customer's address filled in", async () => {
    show(() => ({ status: 200, body: { items: [doc(1, {})] } }));
    fireEvent.click(await screen.findByRole('button', { name: 'E-mail PR-0001 to the customer' }));
    const dialog = await screen.findByRole('dialog', { name: 'E-mail photo record PR-0001 to the customer' });
    await vi.waitFor(() => expect((within(dialog).getByLabelText('To') as HTMLInputElement).value).toBe('hannah.greaves@example.com'));
  });
});
