import { expect, test } from '@playwright/test';

test('the engine runs as replicas in Web Workers in Chromium and reports a merged wall shear stress', async ({ page }) => {
  // A functional check, not a timing one: allow for a slow first start of Chromium and its workers on a busy machine.
  test.setTimeout(120_000);
  const errors: string[] = [];
  page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto('/');
  await page.getByRole('button', { name: 'Run the check' }).click();
  const result = page.getByTestId('quick-check-result');
  await expect(result).toBeVisible({ timeout: 100_000 });
  const text = (await result.textContent()) ?? '';
  const m = /([-\d.]+) ± ([\d.]+) Pa/.exec(text);
  expect(m, text).not.toBeNull();
  // The bottom wall (moving −x) is dragged towards +x by the gas: positive shear, with a finite error bar.
  expect(Number(m![1])).toBeGreaterThan(0);
  expect(Number(m![2])).toBeGreaterThan(0);
  expect(Number(m![2])).toBeLessThan(Number(m![1]));
  expect(text).toMatch(/from (\d+) of \1 replicas/);
  expect(errors).toEqual([]);
});
