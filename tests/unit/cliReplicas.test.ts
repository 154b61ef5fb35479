// tenuis run --replicas / --save-samples and tenuis merge, where they really run: the built dist-cli/tenuis.mjs
// spawned as a child process, replicas on worker threads.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const cli = join(fileURLToPath(new URL('../..', import.meta.url)), 'dist-cli', 'tenuis.mjs');
const tenuis = (...args: string[]) => {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 120_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
};
const SMALL = [
  '--set',
  'cellsY=10',
  '--set',
  'particlesPerCell=30',
  '--set',
  'transientSteps=200',
  '--set',
  'sampleSteps=2000',
];

let work: string;
let casePath: string;
beforeAll(() => {
  work = mkdtempSync(join(tmpdir(), 'tenuis-replicas-test-'));
  const r = tenuis('preset', 'couette', ...SMALL);
  expect(r.code, r.stderr).toBe(0);
  casePath = join(work, 'case.json');
  writeFileSync(casePath, r.stdout);
});
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('tenuis run --replicas and tenuis merge', () => {
  it('runs two replicas on worker threads, merges them and lists each in replicas.json', () => {
    const out = join(work, 'two');
    const r = tenuis(
      'run',
      casePath,
      '--out',
      out,
      '--replicas',
      '2',
      '--save-samples',
      join(work, 'two.samples'),
      '--quiet',
    );
    expect(r.code, r.stderr).toBe(0);
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary.numerics.replicas).toBe(2);
    const replicas = JSON.parse(readFileSync(join(out, 'replicas.json'), 'utf8')).replicas;
    expect(replicas.map((x: { status: string }) => x.status)).toEqual(['completed', 'completed']);
    expect(existsSync(join(work, 'two.samples'))).toBe(true);
  });

  it('merges sample files from separate runs (different seeds) into one result; the same file twice is refused', () => {
    for (const seed of ['1', '2']) {
      const r = tenuis(
        'run',
        casePath,
        '--out',
        join(work, `seed${seed}`),
        '--seed',
        seed,
        '--save-samples',
        join(work, `seed${seed}.samples`),
        '--quiet',
      );
      expect(r.code, r.stderr).toBe(0);
    }
    const merged = tenuis(
      'merge',
      join(work, 'seed1.samples'),
      join(work, 'seed2.samples'),
      '--out',
      join(work, 'merged'),
      '--quiet',
    );
    expect(merged.code, merged.stderr).toBe(0);
    const s = JSON.parse(readFileSync(join(work, 'merged', 'summary.json'), 'utf8'));
    expect(s.numerics.replicas).toBe(2);
    const one = JSON.parse(readFileSync(join(work, 'seed1', 'summary.json'), 'utf8'));
    expect(s.walls.bottom.shearStress.ci95).toBeLessThan(one.walls.bottom.shearStress.ci95);
    const twice = tenuis('merge', join(work, 'seed1.samples'), join(work, 'seed1.samples'), '--out', join(work, 'bad'));
    expect(twice.code).toBe(1);
    expect(twice.stderr).toMatch(/same samples/);
    expect(existsSync(join(work, 'bad'))).toBe(false);
  });

  it('--target stops sampling once the quantity is precise enough, and says so', () => {
    const out = join(work, 'target');
    const r = tenuis(
      'run',
      casePath,
      '--out',
      out,
      '--target',
      'walls.bottom.normalStress=0.01',
      '--max-steps',
      '200000',
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/reached its target/);
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    const p = s.walls.bottom.normalStress;
    expect(p.ci95 / p.mean).toBeLessThanOrEqual(0.01);
    expect(s.numerics.sampleSteps).toBeLessThan(200000);
    const bad = tenuis('run', casePath, '--out', join(work, 'never2'), '--target', 'walls.left.shearStress=0.01');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/did you mean/);
  });

  it('--checkpoint then --resume reproduces the uninterrupted run byte for byte', () => {
    const ckpt = join(work, 'run.checkpoint');
    const a = tenuis(
      'run',
      casePath,
      '--out',
      join(work, 'straight'),
      '--checkpoint',
      ckpt,
      '--checkpoint-every',
      '700',
      '--quiet',
    );
    expect(a.code, a.stderr).toBe(0);
    expect(existsSync(ckpt)).toBe(true);
    const b = tenuis('run', '--resume', ckpt, '--out', join(work, 'resumed'), '--quiet');
    expect(b.code, b.stderr).toBe(0);
    for (const f of ['profiles.csv', 'surfaces.csv', 'fields.csv']) {
      expect(readFileSync(join(work, 'resumed', f), 'utf8')).toBe(readFileSync(join(work, 'straight', f), 'utf8'));
    }
    const bad = tenuis('run', '--resume', casePath, '--out', join(work, 'never3'));
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/not a checkpoint/);
  });

  it('refuses a damaged sample file with a message naming the file', () => {
    const damaged = join(work, 'damaged.samples');
    writeFileSync(damaged, Buffer.from('not a sample file at all'));
    const r = tenuis('merge', damaged, '--out', join(work, 'never'));
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('damaged.samples');
    expect(existsSync(join(work, 'never'))).toBe(false);
  });
});
