import { afterEach, describe, expect, it } from 'vitest';
import { queryClient } from './react-query';
import { type Session, setSession } from './session';

const as = (id: string, accessToken = 'a'): Session => ({
  accessToken,
  refreshToken: 'r',
  user: { id, email: `${id}@larkfield.example`, name: id, role: 'office', organisationId: 'o1' },
});

describe('the server-state cache', () => {
  afterEach(() => setSession(null));

  it("never shows one user's data to the next, and keeps it over a refreshed token", () => {
    setSession(as('dan'));
    queryClient.setQueryData(['jobs'], ['J-1']);
    setSession(as('dan', 'refreshed'));
    expect(queryClient.getQueryData(['jobs'])).toEqual(['J-1']);
    setSession(as('priya'));
    expect(queryClient.getQueryData(['jobs'])).toBeUndefined();
    queryClient.setQueryData(['jobs'], ['J-2']);
    setSession(null);
    expect(queryClient.getQueryData(['jobs'])).toBeUndefined();
  });
});
