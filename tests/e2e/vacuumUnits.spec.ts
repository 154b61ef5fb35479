/**
 * The tube example in vacuum units: a short run, then conductance in L/s and throughput in mbar·L/s chosen in the
 * results card, each consistent with its SI value (1 L/s = 1e-3 m³/s, 1 mbar·L/s = 0.1 Pa·m³/s: exact), and the
 * page's flow CSV carrying the chosen units beside SI. The run is left to finish while the user is back on the
 * set-up: the view stays, a notice links to the result. Pressures are entered in mbar where the form has pressure
 * inputs; otherwise the example's pressures (from its Kn) stand.
 */
import { test, expect } from './fixtures';

/** The mean of "1.234 ± 0.056" or "1.23e-5 ± 4.5e-7". */
const meanOf = (text: string | null) => Number((text ?? '').split('±')[0].trim());

test('the tube example shows conductance in L/s and throughput in mbar·L/s, consistent with SI', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  await w.open();
  await w.pickExample('roughing-line-stub');
  const upstream = w.param('upstreamPressure');
  if ((await upstream.count()) > 0) {
    await page.getByLabel('upstreamPressure unit').selectOption('mbar');
    await w.setParam('upstreamPressure', '0.08');
    if ((await w.param('downstreamPressure').count()) > 0) {
      await page.getByLabel('downstreamPressure unit').selectOption('mbar');
      await w.setParam('downstreamPressure', '0.04');
    }
  }
  await w.setParams({ particlesPerCell: '20', transientSteps: '200', sampleSteps: '400' });
  await expect(page.getByTestId('plan-pending')).toHaveCount(0);

  // Start, then go back to the set-up: the run's end must not take the user away from it.
  await w.runButton().click();
  await w.view('1 Set up and check');
  const notice = page.getByTestId('run-end-notice');
  await expect(notice).toContainText('finished', { timeout: 90_000 });
  await expect(page.getByTestId('plan-review')).toBeVisible();
  await notice.getByRole('link', { name: 'Show the results' }).click();

  const flow = page.getByTestId('flow-numbers');
  await expect(flow).toBeVisible();
  const siConductance = meanOf(await page.getByTestId('flow-value-conductance').textContent());
  const siThroughput = meanOf(await page.getByTestId('flow-value-throughput').textContent());
  expect(siConductance).toBeGreaterThan(0);
  expect(siThroughput).toBeGreaterThan(0);

  await page.getByTestId('flow-unit-conductance').selectOption('L/s');
  await page.getByTestId('flow-unit-throughput').selectOption('mbar·L/s');
  const litres = meanOf(await page.getByTestId('flow-value-conductance').textContent());
  const mbarLitres = meanOf(await page.getByTestId('flow-value-throughput').textContent());
  // Shown to a few significant digits: agreement to the display's rounding (0.5 % is far above it).
  expect(Math.abs(litres / (siConductance * 1e3) - 1)).toBeLessThan(5e-3);
  expect(Math.abs(mbarLitres / (siThroughput * 10) - 1)).toBeLessThan(5e-3);
  await expect(page.getByTestId('flow-si-conductance')).toContainText('m^3/s');

  // The page's flow CSV: the command line's columns, then the chosen units beside SI.
  const { text } = await w.download('Flow numbers (CSV)');
  const lines = text.trimEnd().split('\n');
  expect(lines[0]).toBe('quantity,unit,mean,ci95,chosen unit,chosen mean,chosen ci95');
  const row = (prefix: string) => lines.find((l) => l.startsWith(prefix))!.split(',');
  const c = row('conductance,m^3/s,');
  expect(c[4]).toBe('L/s');
  expect(Number(c[5]) / (Number(c[2]) * 1e3)).toBeCloseTo(1, 12);
  const t = row('throughput,Pa m^3/s,');
  expect(t[4]).toBe('mbar·L/s');
  expect(Number(t[5]) / (Number(t[2]) * 10)).toBeCloseTo(1, 12);

  // The saved run is named for the case as run, and the units stay chosen after a reload.
  await w.view(/Saved runs/);
  await expect(page.getByTestId('saved-runs').or(page.locator('main'))).toContainText('tube, N2, R 2 mm');
  await page.reload();
  await expect(page.locator('#preset-select')).toBeVisible();
  const saved = await page.evaluate(
    () =>
      new Promise<unknown>((resolve, reject) => {
        const open = indexedDB.open('tenuis-workbench');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const get = open.result.transaction('settings').objectStore('settings').get('flowUnits');
          get.onsuccess = () => resolve(get.result);
          get.onerror = () => reject(get.error);
        };
      }),
  );
  expect(saved).toMatchObject({ conductance: 'L/s', throughput: 'mbar·L/s' });
});
