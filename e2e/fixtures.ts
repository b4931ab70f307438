import { type Page, test as base } from '@playwright/test';
import { SignInPage } from './pages/sign-in-page.js';

export const PHONE = { width: 390, height: 844 };
export const DESK = { width: 1440, height: 900 };

export const test = base.extend<{ signInPage: SignInPage }>({
  signInPage: async ({ page }, use) => {
    await use(new SignInPage(page));
  },
});

export { expect } from '@playwright/test';

/** Waits until the service worker controls the page, so that a reload offline is served by it alone. */
export async function waitForServiceWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (!navigator.serviceWorker.controller) {
      await new Promise<void>((resolve) => navigator.serviceWorker.addEventListener('controllerchange', () => resolve(), { once: true }));
    }
  });
}
