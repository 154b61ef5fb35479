import type { Page } from '@playwright/test';
import { test, expect, type Workbench } from './fixtures';

/** The tube example at a tiny budget (as sweep.spec.ts): 5 particles per cell, fixed transient, a second or two per point. */
async function tinyTube(w: Workbench, page: Page, sampleSteps: string): Promise<void> {
  await w.pickExample('roughing-line-stub');
  await page.locator('#replica-count').fill('1');
  await w.setParams({ particlesPerCell: '5', transientSteps: '300', sampleSteps, seed: '5' });
  await expect(w.runButton()).toBeEnabled();
}

async function startKnudsenSweep(w: Workbench, page: Page, points: string): Promise<void> {
  await w.view(/^Sweep$/);
  await page.locator('#sweep-from').fill('1');
  await page.locator('#sweep-to').fill('10');
  await page.locator('#sweep-points').fill(points);
  await page.locator('#sweep-spacing').selectOption('log');
  await page.getByRole('button', { name: 'Run the sweep' }).click();
}

/** Each shown point as the table holds it: swept value, status, mean and half-width (exact strings of the numbers). */
async function shownRows(page: Page): Promise<{ value: string; status: string; mean: string; ci95: string }[]> {
  return page
    .getByTestId('sweep-values')
    .locator('tbody tr')
    .evaluateAll((trs) =>
      trs.map((tr) => ({
        value: tr.querySelector('td[data-value]')!.getAttribute('data-value')!,
        status: tr.getAttribute('data-status')!,
        mean: tr.querySelector('td[data-mean]')!.getAttribute('data-mean')!,
        ci95: tr.querySelector('td[data-mean]')!.getAttribute('data-ci95')!,
      })),
    );
}

test('a finished sweep is kept in IndexedDB next to runs an older workbench saved: reload shows the same rows, plot and export; rename and delete', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  page.on('dialog', (d) => void d.accept());
  // A database at version 1 (runs and settings, no sweeps) holding one run, seeded on the page's origin before the
  // workbench first opens it; the workbench upgrades it to version 2.
  // A blank page of the workbench's origin (no favicon request) to seed it from.
  await page.route('**/seed-database', (r) =>
    r.fulfill({ contentType: 'text/html', body: '<!doctype html><link rel="icon" href="data:,"><title>seed</title>' }),
  );
  await page.goto('/seed-database');
  await page.evaluate(
    () =>
      new Promise<void>((resolve, reject) => {
        const open = indexedDB.open('tenuis-workbench', 1);
        open.onupgradeneeded = () => {
          open.result.createObjectStore('runs', { keyPath: 'id' });
          open.result.createObjectStore('settings');
        };
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const d = open.result;
          const tx = d.transaction('runs', 'readwrite');
          tx.objectStore('runs').put({
            id: 'run-old-1',
            name: 'run kept by version 1',
            finishedAt: '2026-11-30T10:00:00.000Z',
            caseName: 'mems-damping-gap',
            status: 'finished',
            replicas: 1,
            lostReplicas: 0,
            sampledSteps: 4000,
            knudsen: 0.6,
            caseInput: { name: 'mems-damping-gap' },
            samples: new ArrayBuffer(24),
            runWarnings: [],
            performance: { wallSeconds: 1, particleSteps: 1, particleStepsPerSecond: 1 },
            replicaEnds: [],
          });
          tx.oncomplete = () => {
            d.close();
            resolve();
          };
          tx.onerror = () => reject(tx.error);
        };
      }),
  );
  await w.open();
  await expect(page.getByRole('tab', { name: 'Saved runs (1)' })).toBeVisible();
  const upgraded = await page.evaluate(
    () =>
      new Promise<{ version: number; stores: string[]; samplesBytes: number }>((resolve, reject) => {
        const open = indexedDB.open('tenuis-workbench');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const d = open.result;
          const get = d.transaction('runs').objectStore('runs').get('run-old-1');
          get.onsuccess = () => {
            resolve({
              version: d.version,
              stores: [...d.objectStoreNames],
              samplesBytes: (get.result?.samples as ArrayBuffer | undefined)?.byteLength ?? -1,
            });
            d.close();
          };
          get.onerror = () => reject(get.error);
        };
      }),
  );
  expect(upgraded).toEqual({ version: 2, stores: ['runs', 'settings', 'sweeps'], samplesBytes: 24 });

  await tinyTube(w, page, '1000');
  await startKnudsenSweep(w, page, '2');
  await expect(page.getByTestId('sweep-status')).toContainText('finished', { timeout: 90_000 });
  const before = await shownRows(page);
  expect(before.map((r) => [Number(r.value), r.status])).toEqual([
    [1, 'complete'],
    [10, 'complete'],
  ]);
  for (const r of before) expect(Number(r.mean)).toBeGreaterThan(0);
  const saved = page.getByTestId('saved-sweep');
  await expect(saved).toHaveCount(1);
  await expect(saved.locator('.run-name')).toHaveText(/^tube .*: Kn 1–10, 2 points \(log\)$/);
  await expect(saved.getByTestId('saved-sweep-status')).toHaveText('finished, 2 of 2 points');
  await expect(saved.locator('td').nth(2)).toHaveText('1'); // replicas per point
  await page.locator('#sweep-quantity').selectOption('flow.conductance');
  const conductance = await shownRows(page);

  // Reload: the Sweep view shows the same sweep again, to the last digit, with its plot, curves and exports.
  await page.reload();
  await w.view(/^Sweep$/);
  await expect(page.getByTestId('sweep-status')).toContainText('finished — 2 of 2 points run');
  await expect(page.locator('#sweep-quantity')).toHaveValue('flow.massFlowRate');
  expect(await shownRows(page)).toEqual(before);
  await page.locator('#sweep-quantity').selectOption('flow.conductance');
  expect(await shownRows(page)).toEqual(conductance);
  await page.locator('#sweep-quantity').selectOption('flow.massFlowRate');
  await expect(page.locator('#sweep-points')).toHaveValue('2');
  const plot = page.getByTestId('sweep-plot');
  await expect(plot).toHaveAttribute('data-drawn', 'yes');
  await expect(plot.locator('.scatterlayer .trace').first().locator('.points path')).toHaveCount(2);
  await expect(plot.locator('.legendtext')).toContainText(['DSMC (95 % error bars)', 'free-molecular limit']);
  const csv = (await w.download('sweep.csv')).text
    .trimEnd()
    .split('\n')
    .map((l) => l.split(','));
  expect(csv.slice(1).map((r) => [r[1], r[2], r[6], r[7]])).toEqual(
    before.map((r) => [r.value, r.status, r.mean, r.ci95]),
  );
  await expect(saved.getByTestId('saved-sweep-status')).toHaveText('finished, 2 of 2 points');
  await expect(saved).toHaveAttribute('data-shown', 'yes');
  await w.screenshot('view-sweep-saved');

  // Rename; the name survives a reload.
  await saved.getByRole('button', { name: 'Rename' }).click();
  await page.getByLabel('new sweep name').fill('tube, Kn 1 and 10');
  await page.getByRole('button', { name: 'Keep name' }).click();
  await expect(saved).toContainText('tube, Kn 1 and 10');
  await page.reload();
  await w.view(/^Sweep$/);
  await expect(saved).toContainText('tube, Kn 1 and 10');
  expect(await shownRows(page)).toEqual(before);
  await expect(plot).toHaveAttribute('data-drawn', 'yes');

  // Delete: the view no longer shows it, and after a reload there is nothing to show; the old run is still kept.
  await saved.getByRole('button', { name: 'Delete' }).click();
  await expect(saved).toHaveCount(0);
  await expect(page.getByTestId('sweep-values')).toHaveCount(0);
  await page.reload();
  await w.view(/^Sweep$/);
  await expect(page.getByText('No saved sweeps yet')).toBeVisible();
  await expect(page.getByTestId('sweep-values')).toHaveCount(0);
  await expect(page.getByTestId('sweep-status')).toHaveCount(0);
  await expect(page.getByRole('tab', { name: 'Saved runs (1)' })).toBeVisible();
});

test('a sweep a reload ends is shown as interrupted at the point that was running, with the points finished before it', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  await w.open();
  // Longer points (several seconds each), so the reload lands while the second one runs.
  await tinyTube(w, page, '6000');
  await startKnudsenSweep(w, page, '3');
  const saved = page.getByTestId('saved-sweep');
  // The list follows each write: once it says point 1 is done, point 1 is in IndexedDB.
  await expect(saved.getByTestId('saved-sweep-status')).toHaveText(/^running, [12] of 3 points done$/, {
    timeout: 90_000,
  });
  await page.reload();
  await w.view(/^Sweep$/);
  const status = page.getByTestId('sweep-status');
  await expect(status).toContainText(/interrupted at point [23] of 3/);
  const k = Number((await status.textContent())!.match(/interrupted at point (\d) of 3/)![1]);
  const rows = await shownRows(page);
  expect(rows.map((r) => r.status)).toEqual(Array(k - 1).fill('complete'));
  expect(Number(rows[0].value)).toBe(1);
  expect(Number(rows[0].mean)).toBeGreaterThan(0);
  await expect(status).toContainText(`${k - 1} finished point${k === 2 ? '' : 's'} kept`);
  await expect(saved.getByTestId('saved-sweep-status')).toHaveText(
    `interrupted at point ${k} of 3 (${k - 1} finished point${k === 2 ? '' : 's'} kept)`,
  );
  await expect(page.getByTestId('sweep-plot')).toHaveAttribute('data-drawn', 'yes');
  // Nothing runs any more: a new sweep can start.
  await expect(page.getByRole('button', { name: 'Run the sweep' })).toBeEnabled();
  await expect(page.getByRole('button', { name: /Stop the sweep/ })).toBeDisabled();

  // A new one-point sweep replaces it in the view; Open shows the interrupted one again, the same to the last digit.
  await w.view('1 Set up and check');
  await w.setParam('sampleSteps', '1000');
  await startKnudsenSweep(w, page, '1');
  await expect(status).toContainText('finished — 1 of 1 points run', { timeout: 60_000 });
  await expect(saved).toHaveCount(2);
  await saved.filter({ hasText: 'interrupted' }).getByRole('button', { name: 'Open' }).click();
  await expect(status).toContainText(`interrupted at point ${k} of 3`);
  expect(await shownRows(page)).toEqual(rows);
  await expect(saved.filter({ hasText: 'interrupted' })).toHaveAttribute('data-shown', 'yes');
});
