import { readFile } from 'node:fs/promises';
import { test, expect } from './fixtures';
import { presetNames } from '../../engine/case/presets';

test('the workbench loads cross-origin isolated with its caution, favicon and examples, and offers every engine preset', async ({
  workbench: w,
  page,
}) => {
  await w.open();
  await expect(page.getByTestId('caution')).toContainText('Results are model estimates');
  await expect(page.getByTestId('caution')).toContainText('licensed engineering practice');
  // SharedArrayBuffer needs the COOP/COEP headers from vite.config.ts.
  expect(await page.evaluate(() => globalThis.crossOriginIsolated)).toBe(true);
  const iconHref = await page.locator('link[rel="icon"]').getAttribute('href');
  const icon = await page.request.get(iconHref ?? '', { headers: { accept: 'image/*' } });
  expect(icon.status()).toBe(200);
  expect(icon.headers()['content-type']).toContain('image/svg+xml');

  // A first visit opens straight onto the first example.
  const index = JSON.parse(await readFile('public/examples/index.json', 'utf8')) as {
    examples: { id: string; preset?: string }[];
  };
  await expect(page.locator('#example-select')).toHaveValue(index.examples[0].id);
  await expect(page.getByTestId('plan-review')).toBeVisible();

  // The geometry list is the engine's PRESETS, read at run time: presets added later appear without UI changes.
  const offered = await page
    .locator('#preset-select option')
    .evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value).filter(Boolean));
  expect(offered).toEqual(presetNames());
  for (const name of presetNames()) {
    await page.locator('#preset-select').selectOption(name);
    // Either the check before running, or problems marked: never a broken page.
    await expect(page.getByRole('heading', { name: 'Check before running' })).toBeVisible();
    await expect(page.locator('#param-seed')).toBeVisible();
  }
  // Every example is a valid case for its geometry.
  for (const e of index.examples) {
    await w.pickExample(e.id);
    await expect(w.runButton()).toBeEnabled();
  }
  await page.waitForLoadState('networkidle');
});
