import { expect, test } from '@playwright/test';

test('the placeholder page loads with its title and caution, and logs no errors', async ({ page }) => {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(`console: ${message.text()} (${message.location().url})`);
  });
  page.on('pageerror', (error) => errors.push(`page error: ${error.message}`));
  page.on('requestfailed', (request) => errors.push(`request failed: ${request.url()}`));
  page.on('response', (response) => {
    if (response.status() >= 400) errors.push(`HTTP ${response.status()}: ${response.url()}`);
  });

  await page.goto('/');

  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Tenuis — rarefied gas workbench');
  await expect(page.getByText('Results are model estimates.')).toBeVisible();
  await expect(page.getByTestId('caution')).toContainText('licensed engineering practice');
  // SharedArrayBuffer needs the COOP/COEP headers from vite.config.ts.
  expect(await page.evaluate(() => globalThis.crossOriginIsolated)).toBe(true);

  // Headless Chromium does not request the favicon, so check that the icon link resolves.
  const iconHref = await page.locator('link[rel="icon"]').getAttribute('href');
  expect(iconHref).toBeTruthy();
  // (The preview server answers unknown paths with index.html, so check the type, not only 200.)
  const icon = await page.request.get(iconHref ?? '', { headers: { accept: 'image/*' } });
  expect(icon.status(), `favicon ${iconHref}`).toBe(200);
  expect(icon.headers()['content-type'], `favicon ${iconHref}`).toContain('image/svg+xml');

  // Let late requests settle before judging the log.
  await page.waitForLoadState('networkidle');
  expect(errors).toEqual([]);
});
