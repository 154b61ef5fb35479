// `tenuis continuum cavity` where it really runs: node dist-cli/tenuis.mjs (built by tests/setup/buildCli.ts) as a
// child process; only its exit code, stderr and the files it writes are looked at, and compared with the solver
// called directly in this process.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solveCavity } from '../../engine/continuum/cavity/solveCavity';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');

function tenuis(...args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** centerlines.csv as numbers, after checking its header. */
function readCenterlines(dir: string): number[][] {
  const lines = readFileSync(join(dir, 'centerlines.csv'), 'utf8').split('\n');
  expect(lines[0]).toBe('y [side],u [lid speed],x [side],v [lid speed]');
  expect(lines.at(-1)).toBe('');
  return lines.slice(1, -1).map((line) => line.split(',').map(Number));
}

let work: string;
beforeAll(() => {
  work = mkdtempSync(join(tmpdir(), 'tenuis-continuum-test-'));
});
afterAll(() => {
  rmSync(work, { recursive: true, force: true });
});

// The bundled command line and this process run the same arithmetic; 1e-12 only guards against a bundler
// reassociating an expression, which would still be a correct result.
const SAME = 1e-12;

describe('tenuis continuum cavity', () => {
  it('--reynolds 100 --grid 33 writes centerlines.csv and summary.json that agree with solveCavity()', () => {
    const out = join(work, 're100');
    const r = tenuis('continuum', 'cavity', '--reynolds', '100', '--grid', '33', '--out', out);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/converged in \d+ pseudo-time steps/);
    expect(readdirSync(out).sort()).toEqual(['centerlines.csv', 'summary.json']);

    const direct = solveCavity({ reynolds: 100, grid: 33 });
    const c = direct.centerline;
    const rows = readCenterlines(out);
    expect(rows).toHaveLength(33);
    rows.forEach(([y, u, x, v], k) => {
      expect(y).toBe(k / 32);
      expect(x).toBe(k / 32);
      expect(u).toBeCloseTo(c.u[k], 12);
      expect(v).toBeCloseTo(c.v[k], 12);
    });
    // Lid and walls: u = 1 at y = 1, u = v = 0 at the other ends.
    expect(rows[32][1]).toBe(1);
    expect(rows[0][1]).toBe(0);
    expect(rows[0][3]).toBe(0);
    expect(rows[32][3]).toBe(0);

    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary).toMatchObject({ reynolds: 100, grid: 33, converged: true, iterations: direct.iterations });
    expect(summary.slip).toMatchObject({ model: 'none', slipLength: 0 });
    expect(Math.abs(summary.residual - direct.residual)).toBeLessThan(SAME);
    expect(summary.residual).toBeLessThanOrEqual(1e-10);
    for (const [key, where] of [
      ['uMin', 'y'],
      ['vMax', 'x'],
      ['vMin', 'x'],
    ] as const) {
      const expected = c[key] as unknown as Record<string, number>;
      expect(summary.centerline[key].value).toBeCloseTo(expected.value, 12);
      expect(summary.centerline[key][where]).toBeCloseTo(expected[where], 12);
    }
  });

  it('--slip first --knudsen 0.05 --accommodation 0.8 records the slip and matches the solver', () => {
    const out = join(work, 'slip');
    const r = tenuis(
      'continuum',
      'cavity',
      '--reynolds',
      '100',
      '--grid',
      '17',
      '--slip',
      'first',
      '--knudsen',
      '0.05',
      '--accommodation',
      '0.8',
      '--out',
      out,
      '--quiet',
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toBe('');
    const direct = solveCavity({ reynolds: 100, grid: 17, slip: 'first', knudsen: 0.05, accommodation: 0.8 });
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary.slip).toMatchObject({ model: 'first', knudsen: 0.05, accommodation: 0.8 });
    // ((2 − σ)/σ)·Kn = (1.2/0.8)·0.05
    expect(summary.slip.slipLength).toBeCloseTo(0.075, 15);
    expect(summary.centerline.uMin.value).toBeCloseTo(direct.centerline.uMin.value, 12);
    // The gas at the lid lags it.
    const rows = readCenterlines(out);
    expect(rows[16][1]).toBeLessThan(1);
  });

  it.each([
    [['--grid', '33'], /needs --reynolds/],
    [['--reynolds', '100', '--grid', '5'], /--grid 5: .*at least 9/],
    [['--reynolds', '100', '--slip', 'first', '--knudsen', '-0.1'], /--knudsen -0\.1: .*at least 0/],
    [
      ['--reynolds', '100', '--slip', 'first', '--knudsen', '0.1', '--accommodation', '1.5'],
      /--accommodation 1\.5: .*above 0 and at most 1/,
    ],
    [['--reynolds', '100', '--slip', 'second'], /--slip second: .*none, first/],
    [['--reynolds', '100', '--slip', 'first'], /--knudsen: required with --slip first/],
  ])('bad input %j names the option and what is allowed, exits 2 and writes nothing', (args, message) => {
    const out = join(work, 'bad');
    const r = tenuis('continuum', 'cavity', ...args, '--out', out);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stderr).toContain('Usage:');
    expect(r.stdout).toBe('');
    expect(existsSync(out)).toBe(false);
  });

  it('a run that does not converge in --max-iterations says so, exits 1 and writes nothing', () => {
    const out = join(work, 'short');
    const r = tenuis('continuum', 'cavity', '--reynolds', '100', '--grid', '17', '--max-iterations', '5', '--out', out);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/did not converge: residual .* after 5 pseudo-time steps/);
    expect(existsSync(out)).toBe(false);
  });

  it('`help continuum` and `continuum --help` print the usage; an unknown problem exits 2', () => {
    for (const args of [
      ['help', 'continuum'],
      ['continuum', '--help'],
    ]) {
      const r = tenuis(...args);
      expect(r.code, r.stderr).toBe(0);
      expect(r.stdout).toMatch(/tenuis continuum cavity --reynolds R/);
    }
    const r = tenuis('continuum', 'channel', '--reynolds', '1');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/unknown continuum problem "channel"/);
  });
});
