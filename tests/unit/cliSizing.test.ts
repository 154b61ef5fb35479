// The run sizing on the command line (cli/sizedRun.ts): `tenuis check` shows it, `tenuis run` applies it to a case
// that leaves sampling.sampleSteps unset and records the steps in case.json; a case or run that fixes its own
// sampling runs exactly that.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');
const work = mkdtempSync(join(tmpdir(), 'tenuis-sizing-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function tenuis(...args: string[]) {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 120_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function presetFile(name: string, ...sets: string[]): string {
  const r = tenuis('preset', name, ...sets.flatMap((s) => ['--set', s]));
  expect(r.code, r.stderr).toBe(0);
  const file = join(work, `${name}-${sets.join('-').replace(/[^a-z0-9]/gi, '_')}.json`);
  writeFileSync(file, r.stdout);
  return file;
}

describe('run sizing on the command line', () => {
  it('tenuis check shows the sizing of a duct, and the plan it shows is the sized one', () => {
    const file = presetFile('tube', 'knudsen=100');
    const r = tenuis('check', file);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/run sizing:\n {2}headline flow\.massFlowRate, expected about [\d.e+-]+ \(/);
    const steps = Number(/(\d+) sampled steps per replica: expected ±1\.0 %/.exec(r.stdout)?.[1]);
    expect(steps).toBeGreaterThan(10_000);
    expect(r.stdout).toMatch(/the cap allows the target/);
    expect(r.stdout).toMatch(new RegExp(`steps +transient .*\\+ ${steps} sampled`));
  });

  it('a short cap: check says the target is out of reach and what it would need', () => {
    const file = presetFile('tube', 'knudsen=100');
    const r = tenuis('check', file, '--time-cap', '3');
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/the cap does not allow the target: it needs \d+ steps, about .*; raise the cap/);
  });

  it('a case that fixes sampling.sampleSteps is shown, not sized', () => {
    const file = presetFile('couette', 'knudsen=1', 'sampleSteps=3000');
    const r = tenuis('check', file);
    expect(r.stdout).toMatch(/not applied: the case fixes sampling\.sampleSteps/);
    expect(r.stdout).toMatch(/\+ 3000 sampled/);
  });

  it('tenuis run applies the sizing within the cap and writes the steps into case.json', () => {
    const file = presetFile('couette', 'knudsen=1', 'transientSteps=200');
    const out = join(work, 'sized-run');
    const r = tenuis('run', file, '--out', out, '--time-cap', '2');
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/run sizing:/);
    const ran = JSON.parse(readFileSync(join(out, 'case.json'), 'utf8'));
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(ran.sampling.sampleSteps).toBe(summary.numerics.sampleSteps);
    // 2 s at the sizing's 2e7 particle-steps/s with 2000 particles: about 20,000 steps, less the transient.
    expect(ran.sampling.sampleSteps).toBeGreaterThan(10_000);
    expect(ran.sampling.sampleSteps).toBeLessThan(25_000);
  });

  it('a step budget of its own (--max-steps) runs exactly that, unsized', () => {
    const file = presetFile('couette', 'knudsen=1', 'transientSteps=200');
    const out = join(work, 'own-budget');
    const r = tenuis('run', file, '--out', out, '--max-steps', '1000');
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).not.toMatch(/run sizing:/);
    expect(JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8')).numerics.sampleSteps).toBe(1000);
  });
});
