// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeAnswer } from '@/lib/fake-api';
import type { SharedJob } from '../api/get-shared-job';
import { SharedJobPage } from '../components/shared-job-page';

const TOKEN = 'AbCdEfGhIjKlMnOpQrStUvWxYz0123456789-_abcde';
const JOB: SharedJob = {
  expiresAt: '2026-04-13T12:00:00.000Z',
  contractor: { name: 'Larkfield Electrical & Data', phone: '01632 960 418', email: 'office@larkfield.example' },
  job: { reference: 'LED-0033', title: 'Extra double socket in the front bedroom', status: 'paperwork', customerName: 'Hannah Greaves', siteAddress: '14 Orchard Rise, Wendmouth, WM2 4HD' },
  photos: [
    { id: 'p1', caption: 'Route chased down from the loft', area: 'Front bedroom', takenAt: '2026-03-08T09:35:00.000Z', thumbUrl: `/api/shared/${TOKEN}/photos/p1/thumb`, displayUrl: `/api/shared/${TOKEN}/photos/p1/display` },
    { id: 'p2', caption: 'Finished twin socket-outlet', area: 'Front bedroom', takenAt: '2026-03-08T10:40:00.000Z', thumbUrl: `/api/shared/${TOKEN}/photos/p2/thumb`, displayUrl: `/api/shared/${TOKEN}/photos/p2/display` },
  ],
  documents: [{ id: 'd1', number: 'MW-0001', kind: 'minor-works', title: null, issuedAt: '2026-03-14T11:00:00.000Z', pdfUrl: `/api/shared/${TOKEN}/documents/d1/pdf` }],
};

function show(answer: FakeAnswer) {
  const api = fakeApi(() => answer);
  vi.stubGlobal('fetch', api.fetch);
  render(
    <QueryClientProvider client={new QueryClient()}>
      <SharedJobPage token={TOKEN} />
    </QueryClientProvider>,
  );
  return api.calls;
}

describe('SharedJobPage', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it("shows the customer their job, its documents and photos, without signing in", async () => {
    const calls = show({ status: 200, body: JOB });
    expect(await screen.findByRole('heading', { level: 1, name: 'Extra double socket in the front bedroom' })).toBeTruthy();
    expect(screen.getByText('Work done; paperwork being finished')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Download MW-0001 (PDF)' }).getAttribute('href')).toBe(JOB.documents[0]!.pdfUrl);
    const photos = screen.getByRole('list', { name: 'Photos' });
    expect(within(photos).getAllByRole('img').map((i) => i.getAttribute('src'))).toEqual(JOB.photos.map((p) => p.thumbUrl));
    fireEvent.click(within(photos).getByRole('button', { name: 'Open photo: Finished twin socket-outlet' }));
    const viewer = await screen.findByRole('dialog', { name: 'Finished twin socket-outlet' });
    expect(within(viewer).getByRole('img').getAttribute('src')).toBe(JOB.photos[1]!.displayUrl);
    expect(screen.getByText(/This link works until 13 April 2026/)).toBeTruthy();
    expect(calls).toEqual([{ method: 'GET', path: `/api/shared/${TOKEN}`, body: undefined }]);
  });

  it('shows a plain page, and nothing of the job, when the link was withdrawn', async () => {
    show({ status: 410, body: { statusCode: 410, message: 'This link has been withdrawn by the contractor. Ask them for a new one if you still need it.', error: 'Gone' } });
    expect(await screen.findByRole('heading', { name: 'This link does not work' })).toBeTruthy();
    expect(screen.getByText('This link has been withdrawn by the contractor. Ask them for a new one if you still need it.')).toBeTruthy();
    expect(screen.queryByText(/Orchard/)).toBeNull();
  });
});
