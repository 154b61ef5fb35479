import { defineConfig } from '@playwright/test';
import { requireChromium } from './tests/e2e/find-chromium.mjs';

// Browser tests against the production build (`npm run build` first; tests/e2e/run-playwright.mjs
// builds when dist/ is missing or stale). Uses a system Chromium, never a downloaded one.
// TENUIS_E2E_PORT lets two checkouts on one machine run their browser tests side by side.
const port = Number(process.env.TENUIS_E2E_PORT ?? 4173);

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: '**/*.spec.ts',
  outputDir: 'test-results',
  fullyParallel: true,
  forbidOnly: !!process.env.CI,
  retries: 0,
  workers: process.env.CI ? 1 : undefined,
  reporter: process.env.CI ? 'list' : [['list'], ['html', { open: 'never', outputFolder: 'playwright-report' }]],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    trace: 'retain-on-failure',
  },
  projects: [
    {
      name: 'chromium',
      use: {
        browserName: 'chromium',
        headless: true,
        launchOptions: {
          executablePath: requireChromium(),
          args: [
            '--no-sandbox',
            '--disable-gpu',
            '--disable-quic',
            '--no-first-run',
            '--disable-background-networking',
            '--disable-component-update',
            '--disable-sync',
          ],
        },
      },
    },
  ],
  webServer: {
    command: `npx --no-install vite preview --host 127.0.0.1 --port ${port} --strictPort`,
    url: `http://127.0.0.1:${port}/`,
    reuseExistingServer: false,
    timeout: 60_000,
    stdout: 'ignore',
    stderr: 'pipe',
  },
});
