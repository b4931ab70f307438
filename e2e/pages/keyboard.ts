import type { Locator, Page } from '@playwright/test';

/** Whether the keyboard's focus is on the element or inside it. */
const holdsFocus = (target: Locator) => target.evaluate((el) => el === document.activeElement || el.contains(document.activeElement)).catch(() => false);

/**
 * Presses Tab (or Shift+Tab) until the focus reaches the element, as someone without a mouse moves through a screen;
 * fails if it never does, which is what a keyboard user would meet too.
 */
export async function tabTo(page: Page, target: Locator, { back = false, max = 120 } = {}): Promise<void> {
  for (let i = 0; i < max; i++) {
    if (await holdsFocus(target)) return;
    await page.keyboard.press(back ? 'Shift+Tab' : 'Tab');
  }
  throw new Error(`Tab never reached ${String(target)}`);
}

/** Tabs to a button or link and presses Enter on it. */
export async function pressOn(page: Page, target: Locator, options?: { back?: boolean }): Promise<void> {
  await tabTo(page, target, options);
  await page.keyboard.press('Enter');
}
