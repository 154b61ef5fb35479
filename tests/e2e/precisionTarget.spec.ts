import { test, expect, TINY } from './fixtures';

test('a precision target shows its half-width against the goal while running, and ends the run once met', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  await w.open();
  await w.pickExample('mems-damping-gap');
  // A budget the target should cut short: 30 % on the wall shear of this tiny gap needs some 40 000 sampled steps in all (5 % took 1.5 million).
  await w.setParams({ knudsen: '0.8', ...TINY, sampleSteps: '100000' });
  await page.locator('#target-quantity').selectOption('walls.top.shearStress');

  // A goal outside (0, 100] % is marked at the field and blocks the run.
  await page.locator('#target-goal').fill('150');
  await expect(page.getByRole('alert').filter({ hasText: 'above 0 and at most 100' })).toBeVisible();
  await expect(w.runButton()).toBeDisabled();
  await page.locator('#target-goal').fill('30');
  await page.locator('#target-stop').check();
  await expect(w.runButton()).toBeEnabled();

  await w.runButton().click();
  const row = page.getByTestId('progress-target');
  await expect(row).toContainText('goal ±30 %', { timeout: 30_000 });
  // The row tells the current half-width (or that there is none yet) next to the goal; the run may end quickly.
  await expect(row).toContainText(/no estimate yet|now; about|goal met/);
  await w.screenshot('view-run-target');
  await expect(w.status()).toContainText('finished', { timeout: 90_000 });

  // The run ended by its rule, before the planned sampling (2 replicas × 100 000 steps): the result says so.
  await expect(page.getByTestId('result-warnings')).toContainText(/reached its target: ±[\d.]+ % ≤ ±30\.0 %/);
  const facts = (await page.getByTestId('result-facts').textContent()) ?? '';
  const sampled = Number(/([\d\s,\u202f\u00a0]+) sampled steps/.exec(facts)?.[1].replace(/[^\d]/g, ''));
  console.log(`precision target met after ${sampled} sampled steps (all replicas)`);
  expect(sampled).toBeGreaterThan(0);
  expect(sampled).toBeLessThan(2 * 100_000);
});
