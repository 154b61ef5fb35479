import { test, expect, TINY } from './fixtures';

test('a user picks the MEMS damping example, sets Kn, runs it in Web Workers and exports the profile CSV that matches the page', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  // Long tasks on the main thread, recorded from the start (the Long Tasks API; buffered).
  await page.addInitScript(() => {
    const tasks: { start: number; duration: number }[] = [];
    (window as unknown as { __longTasks: typeof tasks }).__longTasks = tasks;
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) tasks.push({ start: e.startTime, duration: e.duration });
    }).observe({ type: 'longtask', buffered: true });
  });
  await w.open();
  await w.pickExample('mems-damping-gap');
  await expect(w.param('gap')).toHaveValue('2');
  await expect(page.getByLabel('gap unit')).toHaveValue('µm');
  await w.setParams({ knudsen: '0.8', ...TINY, sampleSteps: '150000' });
  const review = page.getByTestId('plan-review');
  await expect(review.getByLabel('reference state')).toContainText('Knudsen number Kn = λ/L0.8');
  await expect(review.getByLabel('numerics advisor')).toContainText('pass');
  await expect(page.getByTestId('particle-count')).toHaveText('400');
  await expect(page.getByTestId('expected-error')).toContainText('%');
  await expect(page.getByTestId('time-estimate')).toContainText('particle-steps/s');
  await w.screenshot('view-setup');

  // Let the warm-up of the run and plot chunks finish, then measure long tasks from the click to the end.
  await page.waitForLoadState('networkidle');
  // The start-up warm-up (run chunk, then plotly, never during a run) is done: what follows is the run's own work.
  await page.waitForFunction(() => performance.getEntriesByName('tenuis-warm-done').length > 0, null, {
    timeout: 60_000,
  });
  const t0 = await page.evaluate(() => performance.now());
  await w.runButton().click();
  const progress = page.getByTestId('run-progress');
  await expect
    .poll(async () => Number(await progress.getAttribute('data-fraction')), { timeout: 30_000 })
    .toBeGreaterThan(0.05);
  const midway = Number(await progress.getAttribute('data-fraction'));
  expect(midway).toBeLessThan(1);
  await expect(page.getByTestId('progress-samples')).not.toHaveText('0', { timeout: 30_000 });
  await expect(page.getByTestId('live-profile')).toBeVisible({ timeout: 30_000 });
  await w.screenshot('view-run');
  await expect(w.status()).toContainText('finished', { timeout: 90_000 });
  // The run's own work on the page's thread ends at this mark (set when its result is in); drawing the results follows.
  const t1 = await page.evaluate(
    () => performance.getEntriesByName('tenuis-run-end').at(-1)?.startTime ?? performance.now(),
  );
  const longTasks = await page.evaluate(
    ([a, b]) =>
      (window as unknown as { __longTasks: { start: number; duration: number }[] }).__longTasks.filter(
        (t) => t.start >= a && t.start <= b,
      ),
    [t0, t1],
  );
  const longest = Math.max(0, ...longTasks.map((t) => t.duration));
  console.log(
    `run took ${((t1 - t0) / 1000).toFixed(1)} s; longest main-thread task during it: ${longest.toFixed(0)} ms (${longTasks.length} over 50 ms)`,
  );
  expect.soft(longest, 'no main-thread task over 200 ms during the run').toBeLessThan(200);

  // Numbers with uncertainties; the moving walls are sheared in opposite directions.
  const top = await w.wallNumber('top', 'shearStress');
  const bottom = await w.wallNumber('bottom', 'shearStress');
  expect(top.text).toMatch(/^-?[\d.]+ ± [\d.]+/);
  expect(top.ci95).toBeGreaterThan(0);
  expect(top.mean).toBeLessThan(0);
  expect(bottom.mean).toBeGreaterThan(0);
  await expect(page.getByTestId('wall-numbers')).toContainText('shear stress [Pa]');
  await expect(page.getByTestId('result-facts')).toContainText('2 replicas');
  // One answer first: the "Which model is good enough" card, with its sentence on the headline quantity.
  await expect(page.getByTestId('comparison')).toBeVisible();
  await expect(page.getByTestId('verdict-headline')).toContainText('the wall shear stress');
  // Profiles with error bars drawn by plotly (plots draw once visible; the verdict card above moves this one down).
  await page.getByTestId('profile-plot').scrollIntoViewIfNeeded();
  await expect(page.getByTestId('profile-plot')).toHaveAttribute('data-drawn', 'yes');
  expect(await page.locator('[data-testid="profile-plot"] g.errorbar').count()).toBeGreaterThan(0);
  await w.showAllPlots();
  await w.screenshot('view-results');

  // The profile CSV: RFC 4180 header with units, ci95 columns next to values, one row per cell row, same numbers.
  const { download, text } = await w.download('Profiles (CSV)');
  expect(download.suggestedFilename()).toMatch(/-profiles\.csv$/);
  const lines = text.trimEnd().split('\n');
  const header = lines[0].split(',');
  expect(header[0]).toBe('y [m]');
  const vx = header.indexOf('velocityX [m/s]');
  expect(vx).toBeGreaterThan(0);
  expect(header[vx + 1]).toBe('velocityX ci95 [m/s]');
  for (const h of header) expect(h).toMatch(/\[[^\]]+\]$/);
  expect(lines).toHaveLength(1 + 20);
  await page.getByText(/^Profile values/).click();
  const shown = page.getByTestId('profile-values').locator('tbody td[data-mean]');
  await expect(shown).toHaveCount(20);
  for (const r of [0, 9, 19]) {
    const row = lines[1 + r].split(',').map(Number);
    expect(row[vx]).toBe(Number(await shown.nth(r).getAttribute('data-mean')));
    expect(row[vx + 1]).toBe(Number(await shown.nth(r).getAttribute('data-ci95')));
  }
  // Velocity goes from −U/2 towards +U/2 across the gap (U = 20 m/s), with slip at the walls.
  expect(lines[1].split(',').map(Number)[vx]).toBeLessThan(0);
  expect(lines[20].split(',').map(Number)[vx]).toBeGreaterThan(0);

  // The summary JSON holds the same wall numbers.
  const summary = JSON.parse((await w.download('Summary (JSON)')).text);
  expect(summary.walls.top.shearStress.mean).toBe(top.mean);
  expect(summary.walls.top.shearStress.ci95).toBe(top.ci95);
  expect(summary.units.shearStress).toBe('Pa');
  expect(summary.numerics.cellsY).toBe(20);
});

test('the round-tube example, made tiny, gives flow numbers with uncertainties and units, and a field map of the duct', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(90_000);
  await w.open();
  await w.pickExample('roughing-line-stub');
  await expect(w.param('radius')).toHaveValue('2');
  await expect(page.getByLabel('radius unit')).toHaveValue('mm');
  // Coarse on purpose: the advisor marks it.
  await w.setParams({ knudsen: '1', cellsY: '8', particlesPerCell: '20', transientSteps: '300', sampleSteps: '3000' });
  await expect(page.getByTestId('plan-review').getByLabel('numerics advisor')).toContainText('warn');
  await w.runToEnd();
  const flow = page.getByTestId('flow-numbers');
  await expect(flow).toContainText('mass flow rate [kg/s]');
  await expect(flow).toContainText('conductance [m^3/s]');
  await expect(flow).toContainText(/\d ± \d/);
  await expect(page.getByTestId('result-facts')).toContainText('Kn = 1.000');
  await w.showAllPlots();
  await w.screenshot('view-results-tube');
});
