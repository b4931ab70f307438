import { chromium } from '@playwright/test';

/** Debian's Chromium, headless, with nothing calling out to the internet. */
export function launchChromium() {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-dev-shm-usage'],
  });
}
