import { test as base } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page.js';

export const PHONE = { width: 390, height: 844 };
export const DESK = { width: 1440, height: 900 };

export const test = base.extend<{ signInPage: SignInPage }>({
  signInPage: async ({ page }, use) => {
    await use(new SignInPage(page));
  },
});

export { expect } from '@playwright/test';
