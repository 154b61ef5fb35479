import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test, expect } from './fixtures';

/** Header and rows of a CSV without quoted fields (the sweep table has none). */
function readCsv(text: string): { header: string[]; rows: string[][] } {
  const [header, ...rows] = text
    .trimEnd()
    .split('\n')
    .map((l) => l.split(','));
  return { header, rows };
}

/**
 * Same numbers: identical headers, same rows, every number equal to 1e-12 relative (the page's replicas run in
 * chunks timed by the clock and are snapshotted for the live views: last-bit round-off, as sameAsCommandLine.spec.ts).
 */
function expectSameTable(pageText: string, cliText: string): void {
  const a = readCsv(pageText);
  const b = readCsv(cliText);
  expect(a.header).toEqual(b.header);
  expect(a.rows.length).toBe(b.rows.length);
  a.rows.forEach((row, r) =>
    row.forEach((x, c) => {
      const y = b.rows[r][c];
      if (x === '' || y === '' || Number.isNaN(Number(x))) expect(x, `row ${r + 1} ${a.header[c]}`).toBe(y);
      else
        expect(Math.abs(Number(x) - Number(y)), `row ${r + 1} ${a.header[c]}: ${x} vs ${y}`).toBeLessThanOrEqual(
          1e-12 * Math.max(Math.abs(Number(x)), Math.abs(Number(y)), 1e-300),
        );
    }),
  );
}

test('sweeps the tube over Kn 1 to 10 (3 log-spaced points): points with error bars and continuum lines, sweep.csv with units equal to the table and to `tenuis sweep`', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  await w.open();
  await w.pickExample('roughing-line-stub');
  await page.locator('#replica-count').fill('1');
  // A tiny budget: 5 particles per cell, fixed transient, 1000 sampled steps (a second or two per point).
  await w.setParams({ particlesPerCell: '5', transientSteps: '300', sampleSteps: '1000', seed: '5' });
  await expect(w.runButton()).toBeEnabled();

  await w.view(/^Sweep$/);
  await page.locator('#sweep-from').fill('0');
  await expect(page.locator('#sweep-from-error')).toHaveText(/from: give a Knudsen number above 0/);
  await expect(page.getByRole('button', { name: 'Run the sweep' })).toBeDisabled();
  await page.locator('#sweep-from').fill('1');
  await page.locator('#sweep-to').fill('10');
  await page.locator('#sweep-points').fill('3');
  await page.locator('#sweep-spacing').selectOption('log');
  await page.getByRole('button', { name: 'Run the sweep' }).click();
  await expect(page.getByTestId('sweep-status')).toContainText(/point [123] of 3|finished/);
  await expect(page.getByTestId('sweep-status')).toContainText('finished', { timeout: 90_000 });

  const table = page.getByTestId('sweep-values');
  const rows = table.locator('tbody tr');
  await expect(rows).toHaveCount(3);
  await expect(table.locator('thead')).toContainText('massFlowRate [kg/s] ± 95 %');
  const shown: { value: string; mean: string; ci95: string }[] = [];
  for (let k = 0; k < 3; k++) {
    const row = rows.nth(k);
    await expect(row).toHaveAttribute('data-status', 'complete');
    const value = (await row.locator('td[data-value]').first().getAttribute('data-value'))!;
    const cell = row.locator('td[data-mean]');
    const mean = (await cell.getAttribute('data-mean'))!;
    const ci95 = (await cell.getAttribute('data-ci95'))!;
    expect(Number(mean)).toBeGreaterThan(0); // gas flows from the upstream vessel downstream
    expect(Number(ci95)).toBeGreaterThan(0);
    shown.push({ value, mean, ci95 });
  }
  expect(shown.map((s) => Number(s.value))).toEqual([1, expect.closeTo(Math.sqrt(10), 12), 10]);
  // The continuum models' predictions of the tube's mass flow rate beside each point, free-molecular among them.
  await expect(table.locator('thead')).toContainText('freeMolecular [kg/s]');
  await expect(table.locator('thead')).toContainText('firstOrder [kg/s]');

  const plot = page.getByTestId('sweep-plot');
  await expect(plot).toHaveAttribute('data-drawn', 'yes');
  // Three DSMC points, each with its error bar; the models as lines in the legend.
  await expect(plot.locator('.scatterlayer .trace').first().locator('.points path')).toHaveCount(3);
  await expect(plot.locator('.scatterlayer .trace').first().locator('.errorbar')).toHaveCount(3);
  await expect(plot.locator('.legendtext')).toContainText([
    'DSMC (95 % error bars)',
    'no-slip',
    'first-order slip',
    'second-order slip',
    'unified model',
    'free-molecular limit',
  ]);
  await expect(plot.locator('.xaxislayer-above')).toBeVisible();
  await w.screenshot('view-sweep');

  const csv = (await w.download('sweep.csv')).text;
  const { header, rows: csvRows } = readCsv(csv);
  expect(header.slice(0, 8)).toEqual([
    'point [1]',
    'knudsen [1]',
    'status',
    'reference knudsen [1]',
    'reference rarefaction [1]',
    'reference pressure [Pa]',
    'massFlowRate [kg/s]',
    'massFlowRate ci95 [kg/s]',
  ]);
  for (const h of header) if (h !== 'status') expect(h).toMatch(/ \[[^\]]+\]$/);
  expect(header).toContain('massFlowRate freeMolecular [kg/s]');
  expect(csvRows).toHaveLength(3);
  csvRows.forEach((r, k) => {
    expect(r[2]).toBe('complete');
    expect([r[1], r[6], r[7]]).toEqual([shown[k].value, shown[k].mean, shown[k].ci95]);
  });

  // The same case, seed and replicas through `tenuis sweep` give the same table.
  const caseText = (await w.download('Sweep case (JSON)')).text;
  const dir = mkdtempSync(join(tmpdir(), 'tenuis-e2e-sweep-'));
  try {
    writeFileSync(join(dir, 'case.json'), caseText);
    const cli = spawnSync(
      process.execPath,
      [
        'bin/tenuis.mjs',
        'sweep',
        join(dir, 'case.json'),
        '--param',
        'knudsen',
        '--from',
        '1',
        '--to',
        '10',
        '--points',
        '3',
        '--log',
        '--replicas',
        '1',
        '--out',
        join(dir, 'out'),
        '--quiet',
      ],
      { encoding: 'utf8', timeout: 100_000 },
    );
    expect(cli.status, cli.stderr).toBe(0);
    expectSameTable(csv, readFileSync(join(dir, 'out', 'sweep.csv'), 'utf8'));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
