// Regression guard for restructurings (issue 11: "every result, CSV and summary.json byte for byte for the same case,
// seed and replicas"): each preset's default case, shortened to a few hundred steps, is run by the command line as a
// user runs it, and the SHA-256 of every file it writes is compared with tests/fixtures/presetOutputs.json.
//
// The fixture was written by the code before the restructuring of issue 11 (TENUIS_WRITE_PRESET_OUTPUTS=1 rewrites
// it). It holds no physics: a change of a number in it must come with a reason in its commit (a physics fix), never
// with a refactor. `performance` (wall time) is the one part of summary.json that is not reproducible and is left out.
import { createHash } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');
const fixturePath = join(repoRoot, 'tests', 'fixtures', 'presetOutputs.json');
const writing = process.env.TENUIS_WRITE_PRESET_OUTPUTS === '1';

const PRESETS = [
  'couette',
  'fourier',
  'poiseuille',
  'forceDrivenTube',
  'rectangularDuct',
  'channel',
  'tube',
  'slit',
  'orifice',
  'cavity',
];
/** Runs checked: every preset on one replica, and two presets on two worker-thread replicas (the merge path). */
const RUNS: { preset: string; replicas: number }[] = [
  ...PRESETS.map((preset) => ({ preset, replicas: 1 })),
  { preset: 'couette', replicas: 2 },
  { preset: 'tube', replicas: 2 },
];

function tenuis(args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 120_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function sha256(text: string): string {
  return createHash('sha256').update(text).digest('hex');
}

/** The preset's default case with a short, fixed sampling plan and few particles, so that ten runs take seconds. */
function shortCase(preset: string): string {
  const r = tenuis(['preset', preset]);
  if (r.code !== 0) throw new Error(`preset ${preset}: ${r.stderr}`);
  const c = JSON.parse(r.stdout);
  c.numerics.particlesPerCell = 8;
  c.sampling = { ...c.sampling, transientSteps: 60, sampleSteps: 240 };
  return JSON.stringify(c, null, 2);
}

function hashesOf(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const file of readdirSync(dir).sort()) {
    let text = readFileSync(join(dir, file), 'utf8');
    if (file === 'summary.json') {
      const s = JSON.parse(text);
      delete s.performance;
      text = JSON.stringify(s);
    }
    if (file === 'replicas.json') {
      const s = JSON.parse(text);
      for (const r of s.replicas ?? []) delete r.wallSeconds;
      text = JSON.stringify(s);
    }
    out[file] = sha256(text);
  }
  return out;
}

const work = mkdtempSync(join(tmpdir(), 'tenuis-preset-outputs-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const expected: Record<string, Record<string, string>> = writing ? {} : JSON.parse(readFileSync(fixturePath, 'utf8'));
const written: Record<string, Record<string, string>> = {};

describe('tenuis run of every preset writes the same files as before (fixed seed)', () => {
  for (const { preset, replicas } of RUNS) {
    const key = `${preset}/replicas=${replicas}`;
    it(`${key}`, () => {
      const casePath = join(work, `${preset}.json`);
      writeFileSync(casePath, shortCase(preset));
      const out = join(work, `${preset}-${replicas}`);
      const r = tenuis(['run', casePath, '--out', out, '--seed', '11', '--replicas', String(replicas), '--quiet']);
      expect(r.code, r.stderr).toBe(0);
      const hashes = hashesOf(out);
      written[key] = hashes;
      if (writing) return;
      expect(hashes).toEqual(expected[key]);
    });
  }
  it.runIf(writing)('writes the fixture', () => {
    writeFileSync(fixturePath, `${JSON.stringify(written, null, 2)}\n`);
    expect(Object.keys(written)).toHaveLength(RUNS.length);
  });
});
