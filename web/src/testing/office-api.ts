import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach, type Mock, vi } from 'vitest';
import { setSession } from '@/lib/session';

export const OFFICE_USER = { id: '01900000-0000-7000-8000-0000000000d1', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office' as const, organisationId: 'o1' };

type Answer = (url: string, init?: RequestInit) => Response | Promise<Response>;

/**
 * For component tests of office screens: each test runs signed in as the office, with `fetch` answered by the
 * test (by `answer`, or by whatever the test queues on the mock), and leaves nothing behind.
 */
export function officeApiForEachTest(answer?: Answer): { readonly fetch: Mock<Answer> } {
  let mock: Mock<Answer>;
  beforeEach(() => {
    mock = answer ? vi.fn(answer) : vi.fn<Answer>();
    vi.stubGlobal('fetch', mock);
    setSession({ accessToken: 'a', refreshToken: 'r', user: OFFICE_USER });
  });
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });
  return {
    get fetch() {
      return mock;
    },
  };
}

/** What the component sent in its nth request. */
export function sentBy(fetch: Mock<Answer>, n = 0): { url: string; method: string | undefined; body: unknown } {
  const [url, init] = fetch.mock.calls[n]!;
  return { url, method: init?.method, body: init?.body === undefined ? undefined : JSON.parse(String(init.body)) };
}
