/**
 * The tube example in vacuum units: a short run, then conductance in L/s and throughput in mbar·L/s chosen in the
 * results card, each consistent with its SI value (1 L/s = 1e-3 m³/s, 1 mbar·L/s = 0.1 Pa·m³/s: exact), and the
 * page's flow CSV carrying the chosen units beside SI. The run is left to finish while the user is back on the
 * set-up: the view stays, a notice links to the result. The vessel pressures are entered in mbar, as an engineer
 * knows them, instead of the example's Knudsen number.
 */
import { test, expect } from './fixtures';

/** The mean of "1.234 ± 0.056" or "1.23e-5 ± 4.5e-7". */
const meanOf = (text: string | null) => Number((text ?? '').split('±')[0].trim());

/** Half a unit in the last digit shown of that mean, relative to it: how far display rounding can move it. */
function relativeRoundingOf(text: string | null): number {
  const shown = (text ?? '').split('±')[0].trim();
  const [mantissa, exponent = '0'] = shown.toLowerCase().split('e');
  const decimals = (mantissa.split('.')[1] ?? '').length;
  return (0.5 * 10 ** (Number(exponent) - decimals)) / Math.abs(Number(shown));
}

test('the tube example shows conductance in L/s and throughput in mbar·L/s, consistent with SI', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  await w.open();
  await w.pickExample('roughing-line-stub');
  // The vessel pressures as an engineer knows them, in mbar (0.08 and 0.04 mbar = 8 and 4 Pa).
  await page.getByRole('radio', { name: 'Upstream and downstream pressures' }).check();
  await page.getByRole('combobox', { name: 'upstreamPressure unit' }).selectOption('mbar');
  await page.getByRole('combobox', { name: 'downstreamPressure unit' }).selectOption('mbar');
  await w.setParam('upstreamPressure', '0.08');
  await w.setParam('downstreamPressure', '0.04');
  await expect
    .poll(async () => JSON.parse(await page.getByLabel('case JSON').inputValue()).boundaries.left.pressurePa)
    .toBeCloseTo(8, 9);
  expect(JSON.parse(await page.getByLabel('case JSON').inputValue()).boundaries.right.pressurePa).toBeCloseTo(4, 9);
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
  const siConductanceText = await page.getByTestId('flow-value-conductance').textContent();
  const siThroughputText = await page.getByTestId('flow-value-throughput').textContent();
  const siConductance = meanOf(siConductanceText);
  const siThroughput = meanOf(siThroughputText);
  expect(siConductance).toBeGreaterThan(0);
  expect(siThroughput).toBeGreaterThan(0);

  await page.getByTestId('flow-unit-conductance').selectOption('L/s');
  await page.getByTestId('flow-unit-throughput').selectOption('mbar·L/s');
  const litresText = await page.getByTestId('flow-value-conductance').textContent();
  const mbarLitresText = await page.getByTestId('flow-value-throughput').textContent();
  const litres = meanOf(litresText);
  const mbarLitres = meanOf(mbarLitresText);
  // Both numbers are shown to a few significant digits: they agree to within the two displays' rounding.
  const conductanceBound = relativeRoundingOf(siConductanceText) + relativeRoundingOf(litresText);
  const throughputBound = relativeRoundingOf(siThroughputText) + relativeRoundingOf(mbarLitresText);
  expect(Math.abs(litres / (siConductance * 1e3) - 1)).toBeLessThanOrEqual(conductanceBound * (1 + 1e-9));
  expect(Math.abs(mbarLitres / (siThroughput * 10) - 1)).toBeLessThanOrEqual(throughputBound * (1 + 1e-9));
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
