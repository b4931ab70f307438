import { afterEach } from 'vitest';

// Forms keep what is typed as drafts in the browser's storage; one test's half-typed form must not open the next's.
afterEach(() => {
  if (typeof localStorage === 'undefined') return;
  for (const key of Object.keys(localStorage)) if (key.startsWith('wiretrail.draft.') || key.startsWith('wiretrail.sign-off-draft.')) localStorage.removeItem(key);
});
