import { type APIRequestContext, type Browser, type BrowserContext, type Page, test as base } from '@playwright/test';
import { DEMO_PASSWORD, SignInPage } from './pages/sign-in-page.js';

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

/** Signs in through the API, as a device would, and returns the session. */
export async function apiSession(request: APIRequestContext, email: string, password = DEMO_PASSWORD): Promise<{ accessToken: string; user: { id: string } }> {
  const res = await request.post('/api/auth/sign-in', { data: { email, password } });
  if (!res.ok()) throw new Error(`sign-in as ${email} answered ${res.status()}`);
  return res.json();
}

/** A second person at a desk-sized browser, signed in through the sign-in page; close the context when done. */
export async function signedInAtDesk(browser: Browser, email: string): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: DESK, serviceWorkers: 'block' });
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.goto();
  await signIn.signIn(email);
  return { context, page };
}
