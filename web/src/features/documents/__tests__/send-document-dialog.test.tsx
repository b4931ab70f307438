// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeAnswer, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { JobDocument } from '../api/get-job-documents';
import { SendDocumentDialog } from '../components/send-document-dialog';

const JOB = '01900000-0000-7000-8000-000000000010';
const DOC: JobDocument = {
  id: '01900000-0000-7000-8000-000000000020', jobId: JOB, kind: 'minor-works', number: 'MW-0001', title: null, signerName: 'Aled Pryce',
  pdfSha256: 'a'.repeat(64), pdfBytes: 51234, issuedAt: '2026-03-14T11:00:00.000Z', issuedById: null, emailState: null, emailedTo: null, emailedAt: null, emailError: null,
  coverage: null, supersedesId: null, revisionReason: null, supersededAt: null, supersededById: null,
};

const PHOTOS: JobDocument = { ...DOC, id: '01900000-0000-7000-8000-000000000021', kind: 'photo-record', number: 'PR-0001' };
const OLD: JobDocument = { ...DOC, id: '01900000-0000-7000-8000-000000000022', number: 'MW-0000', supersededAt: '2026-03-14T10:00:00.000Z', supersededById: DOC.id };

function show(answer: (c: FakeCall) => FakeAnswer, defaultTo: string | null = 'hannah.greaves@example.com', others: JobDocument[] = []) {
  const api = fakeApi(answer);
  vi.stubGlobal('fetch', api.fetch);
  const onSent = vi.fn();
  const onClose = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <SendDocumentDialog jobId={JOB} doc={DOC} others={others} defaultTo={defaultTo} customerName="Hannah Greaves" onClose={onClose} onSent={onSent} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onSent, onClose };
}

const to = () => screen.getByLabelText('To') as HTMLInputElement;
const send = () => fireEvent.click(screen.getByRole('button', { name: 'Send' }));

describe('SendDocumentDialog', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it("starts from the customer's address", () => {
    show(() => undefined);
    expect(screen.getByRole('dialog', { name: 'E-mail minor works certificate MW-0001 to the customer' })).toBeTruthy();
    expect(to().value).toBe('hannah.greaves@example.com');
  });

  it('names the field when the address is empty or not an address, and sends nothing', async () => {
    const { calls } = show(() => undefined, null);
    send();
    expect(await screen.findByText('To: enter the e-mail address to send it to.')).toBeTruthy();
    fireEvent.input(to(), { target: { value: 'hannah at example' } });
    send();
    expect(await screen.findByText('To: that is not an e-mail address.')).toBeTruthy();
    expect(to().getAttribute('aria-invalid')).toBe('true');
    expect(calls).toEqual([]);
  });

  it('sends to the address typed, with the days the link works for', async () => {
    const { calls, onSent, onClose } = show((c) => (c.method === 'POST' ? { status: 202, body: { document: { ...DOC, emailState: 'queued' }, shareLink: { id: 'l', expiresAt: '' } } } : { status: 200, body: { items: [] } }));
    fireEvent.input(to(), { target: { value: '  practice@brightwater-dental.example ' } });
    fireEvent.mouseDown(screen.getByRole('combobox', { name: 'Link works for' }));
    fireEvent.click(await screen.findByRole('option', { name: '14 days' }));
    send();
    await waitFor(() => expect(onSent).toHaveBeenCalledWith('practice@brightwater-dental.example'));
    expect(calls.find((c) => c.method === 'POST')).toEqual({ method: 'POST', path: `/api/documents/${DOC.id}/send`, body: { to: 'practice@brightwater-dental.example', linkDays: 14 } });
    expect(onClose).toHaveBeenCalled();
  });

  it('sends the job’s other documents ticked in the same e-mail, with a message and a copy to another address', async () => {
    const { calls, onSent } = show(
      (c) => (c.method === 'POST' ? { status: 202, body: { documents: [DOC, PHOTOS], shareLink: { id: 'l', expiresAt: '' } } } : { status: 200, body: { items: [] } }),
      'hannah.greaves@example.com',
      [DOC, PHOTOS, OLD],
    );
    // Only the other current documents are offered: not this one again, nor one superseded.
    expect(screen.getAllByRole('checkbox').map((c) => c.closest('label')?.textContent)).toEqual(['Photo record PR-0001']);
    fireEvent.click(screen.getByRole('checkbox', { name: 'Photo record PR-0001' }));
    fireEvent.input(screen.getByLabelText('Copy to (optional)'), { target: { value: 'Hannah.Greaves@example.com' } });
    send();
    expect(await screen.findByText('Copy to: another address than To.')).toBeTruthy();
    fireEvent.input(screen.getByLabelText('Copy to (optional)'), { target: { value: 'not an address' } });
    send();
    expect(await screen.findByText('Copy to: that is not an e-mail address.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
    fireEvent.input(screen.getByLabelText('Copy to (optional)'), { target: { value: 'accounts@greaves-lettings.example' } });
    fireEvent.input(screen.getByLabelText('Your message (optional)'), { target: { value: ' Thank you for having us. ' } });
    send();
    await waitFor(() => expect(onSent).toHaveBeenCalledWith('hannah.greaves@example.com'));
    expect(calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: `/api/jobs/${JOB}/documents/send`,
      body: { documentIds: [DOC.id, PHOTOS.id], to: 'hannah.greaves@example.com', linkDays: 30, cc: 'accounts@greaves-lettings.example', message: 'Thank you for having us.' },
    });
  });

  it("shows the server's refusal in its own words and stays open", async () => {
    const { onSent } = show(() => ({ status: 409, body: { statusCode: 409, message: 'Only an issued document can be e-mailed.', error: 'Conflict' } }));
    send();
    expect(await screen.findByText('Only an issued document can be e-mailed.')).toBeTruthy();
    expect(onSent).not.toHaveBeenCalled();
    expect(screen.getByRole('dialog')).toBeTruthy();
  });
});
