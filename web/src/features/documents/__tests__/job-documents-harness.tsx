import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render } from '@testing-library/react';
import { afterEach, beforeEach, vi } from 'vitest';
import { fakeApi, type FakeAnswer, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import { JobDocuments } from '../components/job-documents';

export const JOB = '01900000-0000-7000-8000-000000000010';

/** The job's documents at the desk over a fake API that knows the job and its customer; `answer` takes the rest. */
export function showJobDocuments(customer: { name: string; email: string }, answer: (c: FakeCall) => FakeAnswer): FakeCall[] {
  const api = fakeApi((c) => {
    if (c.path === `/api/jobs/${JOB}`) return { status: 200, body: { id: JOB, customerId: 'c1' } };
    if (c.path === '/api/customers/c1') return { status: 200, body: customer };
    return answer(c);
  });
  vi.stubGlobal('fetch', api.fetch);
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <JobDocuments jobId={JOB} />
    </QueryClientProvider>,
  );
  return api.calls;
}

/** Office staff signed in for each test, and everything undone after it. */
export function signedInAtTheDesk(): void {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });
}
