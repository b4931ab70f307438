import { expect, test as setup } from '@playwright/test';
import { ROLE_USERS, type Role, signedInState } from '../fixtures.js';
import { SignInPage } from '../pages/sign-in-page.js';

/** The first screen each role lands on, which shows the sign-in took. */
const START: Record<Role, string> = { admin: 'Jobs', office: 'Jobs', technician: 'Today' };

for (const role of Object.keys(ROLE_USERS) as Role[]) {
  setup(`sign in as ${role}`, async ({ page }) => {
    const signIn = new SignInPage(page);
    await signIn.goto();
    await signIn.signIn(ROLE_USERS[role]);
    await expect(page.getByRole('heading', { level: 1, name: START[role] })).toBeVisible();
    // The session is in localStorage, and that is all that is kept. The phone's IndexedDB holds its device id,
    // clock and synced rows: a test that shared them with tests running beside it would push as the same device.
    await page.context().storageState({ path: signedInState(role), indexedDB: false });
  });
}
