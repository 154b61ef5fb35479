import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test, expect } from './fixtures';

/**
 * The Long duct view gives the answer of `tenuis duct` for the same inputs (the same engine functions: duct.csv byte
 * for byte, summary.json's numbers), says what is wrong with a bad field, loads a user's coefficient table and keeps
 * the form and the table over a reload.
 *
 * Example on the page: the microchannel geometry of Arkilic, Schmidt & Breuer (1997, J. MEMS 6:167), 1.33 µm ×
 * 52.25 µm × 7.5 mm, helium at 300 K between 2.5 bar and 1 bar, on the built-in channel table.
 */
test('the Long duct view answers as tenuis duct does, names a bad field, and keeps a loaded table', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(90_000);
  await w.open();
  await page.getByRole('tab', { name: 'Long duct' }).click();
  const numbers = page.getByTestId('long-duct-numbers');
  await expect(numbers).toContainText('mass flow');
  await expect(numbers).toContainText('sccm');
  await expect(page.getByTestId('long-duct-table-source')).toContainText('Tenuis');
  await expect(page.getByTestId('long-duct-profile-plot')).toHaveAttribute('data-drawn', 'yes', { timeout: 20_000 });

  const { text: pageCsv } = await w.download('Download duct.csv');
  const { text: pageSummary } = await w.download('Download summary.json');
  const dir = mkdtempSync(join(tmpdir(), 'tenuis-e2e-duct-'));
  try {
    const cli = spawnSync(
      process.execPath,
      [
        'bin/tenuis.mjs',
        'duct',
        ...['shape=channel', 'gap=1.33um', 'width=52.25um', 'length=7.5mm', 'gas=He', 'temperature=300K'].flatMap(
          (s) => ['--set', s],
        ),
        ...['upstreamPressure=2.5bar', 'downstreamPressure=1bar'].flatMap((s) => ['--set', s]),
        '--out',
        join(dir, 'out'),
      ],
      { encoding: 'utf8' },
    );
    expect(cli.status, cli.stderr).toBe(0);
    expect(pageCsv).toBe(readFileSync(join(dir, 'out', 'duct.csv'), 'utf8'));
    const a = JSON.parse(pageSummary);
    const b = JSON.parse(readFileSync(join(dir, 'out', 'summary.json'), 'utf8'));
    expect(a.flow).toEqual(b.flow);
    expect(a.upstream).toEqual(b.upstream);
    expect(a.downstream).toEqual(b.downstream);

    // A bad field: the message names it and what to give.
    await page.locator('#long-duct-length').fill('-3');
    await expect(page.getByTestId('long-duct-errors')).toContainText('length: give a length above 0');
    await page.locator('#long-duct-length').fill('7.5');
    await expect(numbers).toBeVisible();

    // A user's table (here a first-order slip line G_P = δ/6 + 1.0162, the linearized BGK slip coefficient; the
    // reference notes §2) is checked, loaded, chosen and kept over a reload.
    const table = {
      shape: 'channel',
      source: 'first-order slip test table',
      gasAndWall: 'He (slip line), diffuse walls',
      points: [0.1, 1000].map((d) => ({ rarefaction: d, reducedFlowRate: d / 6 + 1.0162, reducedFlowRateCi95: 0 })),
    };
    const file = join(dir, 'slip.json');
    writeFileSync(file, JSON.stringify(table));
    await page.getByTestId('long-duct-table-file').setInputFiles(file);
    await expect(page.getByTestId('long-duct-table-message')).toContainText('loaded 2 points');
    await expect(page.getByTestId('long-duct-table-source')).toContainText('first-order slip test table');
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify({ ...table, source: 'bad', points: [table.points[1], table.points[0]] }));
    await page.getByTestId('long-duct-table-file').setInputFiles(bad);
    await expect(page.getByTestId('long-duct-table-message')).toContainText('bad');
    await page.waitForTimeout(500); // the form is saved 0.3 s after the last edit
    await page.reload();
    await page.getByRole('tab', { name: 'Long duct' }).click();
    await expect(page.getByTestId('long-duct-table-source')).toContainText('first-order slip test table');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
