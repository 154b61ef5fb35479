import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test, expect, TINY } from './fixtures';

/**
 * Same numbers: identical headers and row count, every value equal to 1e-12 relative. (The page's replicas are
 * snapshotted twice a second for the live views and run in chunks timed by the clock; the sums then differ from a
 * command-line run in the last bits, about 1e-15 relative: round-off, not a different result.)
 */
function expectSameTable(pageText: string, cliText: string): void {
  const a = pageText
    .trimEnd()
    .split('\n')
    .map((l) => l.split(','));
  const b = cliText
    .trimEnd()
    .split('\n')
    .map((l) => l.split(','));
  expect(a[0]).toEqual(b[0]);
  expect(a.length).toBe(b.length);
  for (let r = 1; r < a.length; r++) {
    for (let c = 0; c < a[0].length; c++) {
      const x = Number(a[r][c]);
      const y = Number(b[r][c]);
      if (a[r][c] === '' || b[r][c] === '') expect(a[r][c], `row ${r} ${a[0][c]}`).toBe(b[r][c]);
      else
        expect(Math.abs(x - y), `row ${r} ${a[0][c]}: ${x} vs ${y}`).toBeLessThanOrEqual(
          1e-12 * Math.max(Math.abs(x), Math.abs(y), 1e-300),
        );
    }
  }
}

function expectSameEstimates(a: unknown, b: unknown, path = 'walls'): void {
  if (typeof a === 'number' && typeof b === 'number') {
    expect(Math.abs(a - b), `${path}: ${a} vs ${b}`).toBeLessThanOrEqual(
      1e-12 * Math.max(Math.abs(a), Math.abs(b), 1e-300),
    );
    return;
  }
  if (typeof a !== 'object' || a === null || typeof b !== 'object' || b === null) {
    expect(a, path).toEqual(b);
    return;
  }
  expect(Object.keys(a).sort(), path).toEqual(Object.keys(b).sort());
  for (const k of Object.keys(a))
    expectSameEstimates((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`);
}

test('the profile CSV and summary exported from the page hold the same numbers as `tenuis run` of the exported case with the same replicas', async ({
  workbench: w,
  page,
}) => {
  test.setTimeout(120_000);
  await w.open();
  await w.pickExample('heated-sensor-gap');
  await page.locator('#replica-count').fill('2');
  await w.setParams({ ...TINY, sampleSteps: '3000', seed: '7' });
  await w.runToEnd();
  const caseText = (await w.download('Case (JSON)')).text;
  const pageCsv = (await w.download('Profiles (CSV)')).text;
  const pageSummary = JSON.parse((await w.download('Summary (JSON)')).text);

  const dir = mkdtempSync(join(tmpdir(), 'tenuis-e2e-'));
  try {
    writeFileSync(join(dir, 'case.json'), caseText);
    const cli = spawnSync(
      process.execPath,
      ['bin/tenuis.mjs', 'run', join(dir, 'case.json'), '--replicas', '2', '--out', join(dir, 'out'), '--quiet'],
      { encoding: 'utf8', timeout: 100_000 },
    );
    expect(cli.status, cli.stderr).toBe(0);
    expectSameTable(pageCsv, readFileSync(join(dir, 'out', 'profiles.csv'), 'utf8'));
    const cliSummary = JSON.parse(readFileSync(join(dir, 'out', 'summary.json'), 'utf8'));
    expectSameEstimates(pageSummary.walls, cliSummary.walls);
    expect(pageSummary.reference).toEqual(cliSummary.reference);
    expect(pageSummary.numerics.sampleSteps).toBe(cliSummary.numerics.sampleSteps);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
