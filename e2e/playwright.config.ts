import { defineConfig } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 3100);
const baseURL = `http://127.0.0.1:${PORT}`;

// Debian's Chromium, never a downloaded browser; the flags keep it from calling out to the internet.
const chromium = {
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-dev-shm-usage'],
};

export default defineConfig({
  testDir: './tests',
  outputDir: './test-results',
  fullyParallel: true,
  forbidOnly: !!process.env.CI,
  retries: process.env.CI ? 1 : 0,
  workers: 2,
  timeout: 30_000,
  reporter: process.env.CI ? [['list']] : [['list'], ['html', { open: 'never', outputFolder: 'playwright-report' }]],
  use: {
    baseURL,
    launchOptions: chromium,
    serviceWorkers: 'allow',
    locale: 'en-GB',
    timezoneId: 'Europe/London',
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
  },
  projects: [
    // Signs each role in once and keeps its session; the specs open pages already signed in (fixtures.ts).
    { name: 'setup', testMatch: /auth\.setup\.ts$/, use: { browserName: 'chromium' } },
    { name: 'chromium', use: { browserName: 'chromium' }, dependencies: ['setup'] },
  ],
  webServer: {
    command: 'node ../scripts/e2e-server.mjs',
    url: `${baseURL}/api/health`,
    reuseExistingServer: !process.env.CI,
    timeout: 240_000,
    env: { E2E_PORT: String(PORT) },
    stdout: 'ignore',
    stderr: 'pipe',
  },
});
