// Regression tests for the inputs a seeded fuzz of 10,000 mutated case files found to crash, hang or flood the
// engine (issue 12; the cases are in tests/fixtures/fuzz-cases/, each with a note of what happened before the fix).
// Each goes through the command line as a user would: `tenuis check`, then, if accepted, a 50-step `tenuis run`.
// Each must be refused with a message naming the field, or run to the end with finite numbers: never an internal
// error, a lost replica, a hang or a flood.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');
const casesDir = join(repoRoot, 'tests', 'fixtures', 'fuzz-cases');
const CASES = readdirSync(casesDir)
  .filter((f) => f.endsWith('.json'))
  .sort();

/** Generous wall-clock bounds: a hang was a run that never ended; these only catch that, they time nothing. */
const CHECK_TIMEOUT_MS = 20_000;
const RUN_TIMEOUT_MS = 90_000;
/** A message that names the field: a dotted case path such as numerics.particlesPerCell or domain.lengthYM. */
const NAMES_A_FIELD =
  /\b(gas|initial|domain|boundaries|blocks|flowSections|numerics|sampling|bodyAccelerationXMPerS2)\b/;

function tenuis(args: string[], timeout: number) {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout });
  return { code: r.status, signal: r.signal, stdout: r.stdout ?? '', stderr: r.stderr ?? '' };
}

/** The reference state and numerics of a summary: every one a finite positive number (JSON writes ±∞ as null). */
const POSITIVE_REFERENCE = [
  'pressure',
  'temperature',
  'numberDensity',
  'viscosity',
  'mostProbableSpeed',
  'meanFreePath',
];
const POSITIVE_NUMERICS = ['cells', 'particles', 'moleculesPerParticle', 'timeStep', 'steps'];

const work = mkdtempSync(join(tmpdir(), 'tenuis-fuzz-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('fuzz-found cases are refused with a message naming the field, or run cleanly', () => {
  for (const file of CASES) {
    it(file.replace(/\.json$/, ''), () => {
      const path = join(casesDir, file);
      const check = tenuis(['check', path], CHECK_TIMEOUT_MS);
      expect(check.signal, `check of ${file} did not end`).toBeNull();
      expect(check.stderr).not.toMatch(/internal error/);
      if (check.code !== 0) {
        expect(check.code, check.stderr).toBe(1);
        expect(check.stderr).toMatch(NAMES_A_FIELD);
        return;
      }
      const out = join(work, file.replace(/\.json$/, ''));
      const run = tenuis(['run', path, '--out', out, '--max-steps', '50', '--quiet'], RUN_TIMEOUT_MS);
      expect(run.signal, `run of ${file} did not end`).toBeNull();
      expect(run.stderr).not.toMatch(/internal error|damaged file|replica \d+: lost/);
      if (run.code !== 0) {
        // Refused or stopped cleanly: one message naming the field or the limit that was reached.
        expect(run.code, run.stderr).toBe(1);
        expect(run.stderr).toMatch(NAMES_A_FIELD);
        return;
      }
      expect(existsSync(join(out, 'summary.json'))).toBe(true);
      const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
      for (const key of POSITIVE_REFERENCE) expect(summary.reference[key], `reference.${key}`).toBeGreaterThan(0);
      for (const key of POSITIVE_NUMERICS) expect(summary.numerics[key], `numerics.${key}`).toBeGreaterThan(0);
    });
  }
});
