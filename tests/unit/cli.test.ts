// The command line where it really runs: node dist-cli/tenuis.mjs (built by tests/setup/buildCli.ts), spawned as a
// child process; only stdout, stderr, the exit code and the files it writes are looked at.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCase } from '../../engine/case/schema';
import { plan } from '../../engine/plan/plan';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');

function tenuis(...args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** A fast Couette case: 10 cells × 20 particles, 100 transient + 500 sampled steps. */
const TINY = [
  '--set',
  'cellsY=10',
  '--set',
  'particlesPerCell=20',
  '--set',
  'transientSteps=100',
  '--set',
  'sampleSteps=500',
];
// A Couette case is compared with the continuum models, so its run also writes verdict.csv.
const RESULT_FILES = ['case.json', 'fields.csv', 'profiles.csv', 'summary.json', 'surfaces.csv', 'verdict.csv'];

let work: string;
let tinyCase: Record<string, any>;
let tinyCasePath: string;

beforeAll(() => {
  work = mkdtempSync(join(tmpdir(), 'tenuis-cli-test-'));
  const r = tenuis('preset', 'couette', ...TINY);
  expect(r.code, r.stderr).toBe(0);
  tinyCase = JSON.parse(r.stdout);
  tinyCasePath = join(work, 'tiny.json');
  writeFileSync(tinyCasePath, r.stdout);
});

afterAll(() => {
  rmSync(work, { recursive: true, force: true });
});

describe('tenuis preset', () => {
  it('`preset couette` prints a complete case that parseCase accepts', () => {
    const r = tenuis('preset', 'couette');
    expect(r.code, r.stderr).toBe(0);
    const parsed = parseCase(JSON.parse(r.stdout));
    expect(parsed.ok).toBe(true);
    // Complete and explicit: defaults that the schema fills in are written out.
    const c = JSON.parse(r.stdout);
    expect(c.seed).toBe(1);
    expect(c.numerics.maxParticles).toBe(20_000_000);
    expect(c.boundaries.bottom).toMatchObject({
      type: 'wall',
      model: 'diffuse',
      temperatureK: 273,
      velocityMPerS: [-50, 0, 0],
    });
    expect(c.boundaries.top.velocityMPerS).toEqual([50, 0, 0]);
  });

  it('`preset couette --set gap=2mm --set knudsen=1` sets lengthYM 0.002 and the pressure of Kn = 1', () => {
    const r = tenuis('preset', 'couette', '--set', 'gap=2mm', '--set', 'knudsen=1');
    expect(r.code, r.stderr).toBe(0);
    const parsed = parseCase(JSON.parse(r.stdout));
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    expect(parsed.value.domain.lengthYM).toBeCloseTo(0.002, 15);
    const planned = plan(parsed.value);
    if (!planned.ok) throw new Error(planned.errors.join('\n'));
    // plan() recomputes λ = (μ/p)·sqrt(πkT/(2m)) from the written pressure: Kn = λ/H must come back as 1.
    expect(planned.plan.reference.knudsen).toBeCloseTo(1, 12);
    expect(planned.plan.reference.meanFreePathM).toBeCloseTo(0.002, 14);
  });

  it('`preset couette --set temperature=25C` converts Celsius', () => {
    const r = tenuis('preset', 'couette', '--set', 'temperature=25C');
    expect(r.code, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout).initial.temperatureK).toBeCloseTo(298.15, 12);
  });

  it('`preset nope` fails and lists the presets', () => {
    const r = tenuis('preset', 'nope');
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/unknown preset "nope".*couette.*fourier/);
    expect(r.stdout).toBe('');
  });

  it('`preset couette --set nope=1` fails and lists the parameters; a wrong unit lists the accepted units', () => {
    const a = tenuis('preset', 'couette', '--set', 'nope=1');
    expect(a.code).toBe(1);
    expect(a.stderr).toMatch(/no parameter "nope".*gas, model, knudsen, gap/);
    const b = tenuis('preset', 'couette', '--set', 'gap=2bar');
    expect(b.code).toBe(1);
    expect(b.stderr).toMatch(/gap.*accepted: m, cm, mm/);
  });

  it('`preset --list` and `preset couette --help` describe the presets and parameters with units', () => {
    const list = tenuis('preset', '--list');
    expect(list.code).toBe(0);
    expect(list.stdout).toMatch(/couette/);
    expect(list.stdout).toMatch(/fourier/);
    const help = tenuis('preset', 'fourier', '--help');
    expect(help.code).toBe(0);
    expect(help.stdout).toMatch(/gap=1 mm/);
    expect(help.stdout).toMatch(/hotTemperature=283 K/);
  });
});

describe('tenuis schema, help and usage', () => {
  it('`schema` prints a JSON Schema', () => {
    const r = tenuis('schema');
    expect(r.code).toBe(0);
    const schema = JSON.parse(r.stdout);
    expect(schema.$schema).toMatch(/json-schema/);
    expect(schema.properties).toHaveProperty('initial');
  });

  it('`--help` exits 0; an unknown command prints the usage and exits 2', () => {
    expect(tenuis('--help').code).toBe(0);
    expect(tenuis('help', 'run').stdout).toMatch(/--out DIR/);
    const r = tenuis('frobnicate');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/unknown command "frobnicate"/);
    expect(r.stderr).toMatch(/Usage:/);
  });
});

describe('tenuis check and run refuse bad input', () => {
  type Mutation = (c: Record<string, any>) => void;
  const invalid: [string, Mutation, RegExp][] = [
    [
      'negative gap',
      (c) => {
        c.domain.lengthYM = -0.001;
      },
      /domain\.lengthYM/,
    ],
    [
      'zero pressure',
      (c) => {
        c.initial.pressurePa = 0;
      },
      /initial\.pressurePa/,
    ],
    [
      'unknown gas',
      (c) => {
        c.gas.species = 'unobtainium';
      },
      /gas\.species/,
    ],
    [
      'accommodation 1.5 on a Maxwell wall',
      (c) => {
        c.boundaries.top = { type: 'wall', model: 'maxwell', temperatureK: 273, accommodation: 1.5 };
      },
      /boundaries\.top\.accommodation/,
    ],
    [
      'more particles than maxParticles',
      (c) => {
        c.numerics.maxParticles = 100;
      },
      /numerics\.particlesPerCell.*maxParticles/,
    ],
  ];

  it.each(invalid)('%s: check exits non-zero naming the field, run creates no output folder', (name, mutate, field) => {
    const c = structuredClone(tinyCase);
    mutate(c);
    const file = join(work, `${name.replace(/\W+/g, '-')}.json`);
    writeFileSync(file, JSON.stringify(c));
    const check = tenuis('check', file);
    expect(check.code).toBe(1);
    expect(check.stderr).toMatch(field);
    const out = join(work, `out-${name.replace(/\W+/g, '-')}`);
    const run = tenuis('run', file, '--out', out);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(field);
    expect(existsSync(out)).toBe(false);
  });

  it('a missing file and invalid JSON (with line and column) exit 1 without creating the output folder', () => {
    const out = join(work, 'out-bad-json');
    const missing = tenuis('run', join(work, 'absent.json'), '--out', out);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/cannot read .*absent\.json: no such file/);
    const bad = join(work, 'bad.json');
    writeFileSync(bad, '{\n  "schemaVersion": 1,\n  "name": ,\n}\n');
    const r = tenuis('run', bad, '--out', out);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/not valid JSON at line 3, column 11/);
    expect(existsSync(out)).toBe(false);
    expect(tenuis('check', bad).code).toBe(1);
  });

  it('`check` on a valid case prints the reference state and the advisor and exits 0', () => {
    const r = tenuis('check', tinyCasePath);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/mean free path\s+1e-4 m/);
    expect(r.stdout).toMatch(/Knudsen number\s+0\.1/);
    expect(r.stdout).toMatch(/cell size \/ mean free path/);
    expect(r.stdout).toMatch(/warnings:/);
  });
});

describe('tenuis run', () => {
  it('a tiny Couette run writes the four result files and case.json', () => {
    const out = join(work, 'tiny-out');
    const r = tenuis('run', tinyCasePath, '--out', out);
    expect(r.code, r.stderr).toBe(0);
    expect(readdirSync(out).sort()).toEqual(RESULT_FILES);
    expect(r.stderr).toMatch(/wall bottom: shear stress .* ± .* Pa, heat flux .* W\/m\^2/);
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary.numerics.sampleSteps).toBe(500);
    expect(summary.numerics.transientSteps).toBe(100);
    expect(summary.walls.top.shearStress).toHaveProperty('ci95');
    expect(parseCase(JSON.parse(readFileSync(join(out, 'case.json'), 'utf8'))).ok).toBe(true);
    // No staging folder is left next to the output.
    expect(readdirSync(work).filter((n) => n.includes('partial'))).toEqual([]);
  });

  it('two runs with the same --seed write byte-identical profiles.csv', () => {
    const a = join(work, 'seed-a');
    const b = join(work, 'seed-b');
    expect(tenuis('run', tinyCasePath, '--out', a, '--seed', '42', '--quiet').code).toBe(0);
    expect(tenuis('run', tinyCasePath, '--out', b, '--seed', '42', '--quiet').code).toBe(0);
    expect(readFileSync(join(a, 'profiles.csv'), 'utf8')).toBe(readFileSync(join(b, 'profiles.csv'), 'utf8'));
    expect(JSON.parse(readFileSync(join(a, 'case.json'), 'utf8')).seed).toBe(42);
    expect(JSON.parse(readFileSync(join(a, 'summary.json'), 'utf8')).numerics.seed).toBe(42);
  });

  it('a run into an existing folder replaces its result files and leaves other files alone', () => {
    const out = join(work, 'existing');
    mkdirSync(out);
    writeFileSync(join(out, 'notes.txt'), 'keep me');
    writeFileSync(join(out, 'profiles.csv'), 'old');
    const r = tenuis('run', tinyCasePath, '--out', out, '--quiet');
    expect(r.code, r.stderr).toBe(0);
    expect(readFileSync(join(out, 'notes.txt'), 'utf8')).toBe('keep me');
    expect(readFileSync(join(out, 'profiles.csv'), 'utf8')).toMatch(/^y \[m\],/);
  });

  it('Ctrl-C (SIGINT) stops a run, writes what was sampled (saying so) and exits 130', async () => {
    const longCase = structuredClone(tinyCase);
    longCase.sampling.sampleSteps = 50_000_000;
    longCase.sampling.transientSteps = 0;
    const file = join(work, 'long.json');
    writeFileSync(file, JSON.stringify(longCase));
    const out = join(work, 'interrupted');
    const child = spawn(process.execPath, [cli, 'run', file, '--out', out], { stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    const exit = new Promise<number | null>((resolve) => child.on('close', (code) => resolve(code)));
    // Off a terminal the progress line is printed at once: the run is under way when it appears.
    await new Promise<void>((resolve) =>
      child.stderr.on('data', (d) => {
        stderr += d;
        if (/step /.test(stderr)) resolve();
      }),
    );
    child.kill('SIGINT');
    expect(await exit).toBe(130);
    expect(stderr).toMatch(/interrupted at step \d+: writing the \d+ steps sampled so far/);
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary.warnings.join('\n')).toMatch(/interrupted by the user/);
    expect(summary.numerics.sampleSteps).toBeGreaterThan(0);
  });
});
