// `tenuis sweep` where it really runs: node dist-cli/tenuis.mjs (built by tests/setup/buildCli.ts) as a child process;
// only its exit code, stderr and the files it writes are looked at. Cases are tiny (200 particles, a few hundred steps).
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');

function tenuis(...args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** RFC 4180 without quoted fields (the sweep table has none): header and rows of cells. */
function readCsv(path: string): { header: string[]; rows: string[][] } {
  const [header, ...rows] = readFileSync(path, 'utf8')
    .trimEnd()
    .split('\n')
    .map((line) => line.split(','));
  return { header, rows };
}

const json = (path: string) => JSON.parse(readFileSync(path, 'utf8'));
/** A CSV cell as written from a summary.json number (null: empty). */
const cell = (x: number | null | undefined) => (typeof x === 'number' ? String(x) : '');

const TINY_COUETTE = [
  '--set',
  'knudsen=1',
  '--set',
  'cellsY=10',
  '--set',
  'particlesPerCell=20',
  '--set',
  'sampleSteps=200',
  '--set',
  'transientSteps=100',
];

let work: string;
let couettePath: string;

function presetFile(name: string, args: string[]): string {
  const r = tenuis('preset', ...args);
  expect(r.code, r.stderr).toBe(0);
  const path = join(work, name);
  writeFileSync(path, r.stdout);
  return path;
}

beforeAll(() => {
  work = mkdtempSync(join(tmpdir(), 'tenuis-sweep-test-'));
  couettePath = presetFile('couette.json', ['couette', ...TINY_COUETTE]);
});

afterAll(() => {
  rmSync(work, { recursive: true, force: true });
});

describe('tenuis sweep', () => {
  it("sweeps Couette over Kn = 0.5, 1, 2 (--log): one row per point with units, equal to each point's own summary.json", () => {
    const out = join(work, 'couette-sweep');
    const r = tenuis(
      'sweep',
      couettePath,
      '--param',
      'knudsen',
      '--from',
      '0.5',
      '--to',
      '2',
      '--points',
      '3',
      '--log',
      '--out',
      out,
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/point 1\/3: knudsen = 0\.5 \(pressure [\d.]+ Pa/);
    expect(r.stderr).toMatch(/point 3\/3 done in [\d.]+s; sweep elapsed [\d.]+s, remaining ~[\d.]+s/);

    const { header, rows } = readCsv(join(out, 'sweep.csv'));
    const models = ['noSlip', 'firstOrder', 'secondOrder', 'freeMolecular'];
    const predicted = ['bottom', 'top'].flatMap((w) =>
      ['shearStress', 'heatFlux'].map((q) => ({ w, q, unit: q === 'heatFlux' ? 'W/m^2' : 'Pa' })),
    );
    expect(header).toEqual([
      'point [1]',
      'knudsen [1]',
      'status',
      'reference knudsen [1]',
      'reference rarefaction [1]',
      'reference pressure [Pa]',
      ...['bottom', 'top'].flatMap((w) => [
        `${w} shearStress [Pa]`,
        `${w} shearStress ci95 [Pa]`,
        `${w} heatFlux [W/m^2]`,
        `${w} heatFlux ci95 [W/m^2]`,
      ]),
      // The continuum models' predictions of the same quantities, next to the DSMC numbers.
      ...predicted.flatMap(({ w, q, unit }) => models.map((m) => `${w} ${q} ${m} [${unit}]`)),
    ]);
    expect(rows).toHaveLength(3);
    expect(rows.map((row) => Number(row[1]))).toEqual([0.5, 1, 2]);
    const sweep = json(join(out, 'sweep.json'));
    expect(sweep).toMatchObject({
      format: 'tenuis-sweep',
      parameter: 'knudsen',
      pointsRequested: 3,
      spacing: 'log',
      interrupted: false,
    });
    rows.forEach((row, k) => {
      const folder = join(out, 'points', String(k + 1).padStart(3, '0'));
      expect(readdirSync(folder).sort()).toEqual([
        'case.json',
        'fields.csv',
        'profiles.csv',
        'summary.json',
        'surfaces.csv',
        'verdict.csv',
      ]);
      const s = json(join(folder, 'summary.json'));
      expect(sweep.points[k].summary).toEqual(s);
      expect(Math.abs(s.reference.knudsen / Number(row[1]) - 1)).toBeLessThan(1e-12);
      expect(row.slice(0, 6)).toEqual([
        String(k + 1),
        row[1],
        'complete',
        cell(s.reference.knudsen),
        cell(s.reference.rarefaction),
        cell(s.reference.pressure),
      ]);
      expect(row.slice(6, 14)).toEqual(
        ['bottom', 'top'].flatMap((w) =>
          ['shearStress', 'heatFlux'].flatMap((q) => [cell(s.walls[w][q].mean), cell(s.walls[w][q].ci95)]),
        ),
      );
      expect(row.slice(14)).toEqual(
        predicted.flatMap(({ w, q }) => models.map((m) => cell(s.continuum[m][`walls.${w}.${q}`]))),
      );
      // The point's case.json runs the point again: the same pressures, scaled from the case's by Kn_case / Kn_k = 1 / Kn_k.
      const c = json(join(folder, 'case.json'));
      expect(c.initial.pressurePa).toBeCloseTo(json(couettePath).initial.pressurePa / Number(row[1]), 9);
      expect(c.numerics.cellsY).toBe(10);
    });
  });

  it('--param pressure takes units (1Pa to 0.02mbar) and puts the reference pressure at each value', () => {
    const out = join(work, 'pressure-sweep');
    const r = tenuis(
      'sweep',
      couettePath,
      '--param',
      'pressure',
      '--from',
      '1Pa',
      '--to',
      '0.02mbar',
      '--points',
      '2',
      '--out',
      out,
      '--quiet',
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).not.toMatch(/point 1\/2: pressure =|done in/); // --quiet: no progress (warnings still come)
    const { header, rows } = readCsv(join(out, 'sweep.csv'));
    expect(header.slice(0, 2)).toEqual(['point [1]', 'pressure [Pa]']);
    expect(rows.map((row) => [Number(row[1]), Number(row[5])])).toEqual([
      [1, 1],
      [2, expect.closeTo(2, 12)],
    ]);
  });

  it("a force-driven channel (poiseuille) gets the flow columns, per metre of depth, equal to summary.json's flow", () => {
    const path = presetFile('poiseuille.json', [
      'poiseuille',
      '--set',
      'knudsen=0.2',
      '--set',
      'cellsY=10',
      '--set',
      'particlesPerCell=20',
      '--set',
      'sampleSteps=500',
    ]);
    const out = join(work, 'poiseuille-sweep');
    const r = tenuis(
      'sweep',
      path,
      '--param',
      'knudsen',
      '--from',
      '0.2',
      '--to',
      '0.2',
      '--points',
      '1',
      '--out',
      out,
    );
    expect(r.code, r.stderr).toBe(0);
    const { header, rows } = readCsv(join(out, 'sweep.csv'));
    const flow = [
      'massFlowRate',
      'throughput',
      'molarFlow',
      'conductance',
      'transmissionProbability',
      'reducedFlowRate',
    ];
    const units = ['kg/(s m)', 'Pa m^2/s', 'sccm/m', 'm^2/s', '1', '1'];
    expect(header.slice(6, 18)).toEqual(flow.flatMap((q, i) => [`${q} [${units[i]}]`, `${q} ci95 [${units[i]}]`]));
    expect(header.slice(18)).toContain('reducedFlowRate firstOrder [1]');
    expect(rows).toHaveLength(1);
    const s = json(join(out, 'points', '001', 'summary.json'));
    expect(rows[0].slice(6, 18)).toEqual(flow.flatMap((q) => [cell(s.flow[q]?.mean), cell(s.flow[q]?.ci95)]));
    expect(Number(rows[0][6])).toBeGreaterThan(0); // mass flow along +x, the direction of the body force
    expect(rows[0][12]).toBe(''); // no conductance without a pressure difference
  });

  it('a point that cannot be planned is refused before anything runs, naming the point and its value (exit 1)', () => {
    const c = json(couettePath);
    delete c.numerics.cellsY; // the planner sizes cells for each point: 300 rows of 20 particles at Kn = 0.01
    c.numerics.maxParticles = 1000;
    const path = join(work, 'small-budget.json');
    writeFileSync(path, JSON.stringify(c));
    const out = join(work, 'refused');
    const r = tenuis('sweep', path, '--param', 'knudsen', '--from', '1', '--to', '0.01', '--points', '2', '--out', out);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(
      /point 2 of 2 \(knudsen = 0\.01\) cannot run as set up:\n {2}(domain\.length[XY]M|numerics\.cellsX\/cellsY): .*Knudsen number .*more than numerics\.maxParticles \(1000\)/,
    );
    expect(existsSync(out)).toBe(false);
  });

  it.each([
    [['--from', '1', '--to', '2', '--points', '2'], /sweep needs --param: one of knudsen, pressure/],
    [
      ['--param', 'temperature', '--from', '1', '--to', '2', '--points', '2'],
      /--param temperature: give one of knudsen, pressure/,
    ],
    [['--param', 'knudsen', '--from=-1', '--to', '2', '--points', '2'], /--from -1: give a knudsen above 0/],
    [['--param', 'knudsen', '--from', '1', '--to', '0', '--points', '2'], /--to 0: give a knudsen above 0/],
    [['--param', 'pressure', '--from', '2parsec', '--to', '3Pa', '--points', '2'], /--from 2parsec: .*accepted: Pa/],
    [
      ['--param', 'knudsen', '--from', '1', '--to', '2', '--points', '0'],
      /--points 0: give a whole number from 1 to 999/,
    ],
    [
      ['--param', 'knudsen', '--from', '1', '--to', '2', '--points', '2.5'],
      /--points 2\.5: give a whole number from 1 to 999/,
    ],
    [['--param', 'knudsen', '--from', '1', '--to', '2'], /sweep needs --points/],
    [
      ['--param', 'knudsen', '--from', '1', '--to', '2', '--points', '2', '--replicas', '0'],
      /--replicas 0: give a whole number from 1 to 256/,
    ],
  ])('refuses %j with a usage message (exit 2) and writes nothing', (args, message) => {
    const out = join(work, 'never');
    const r = tenuis('sweep', couettePath, ...args, '--out', out);
    expect(r.code, r.stderr).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stderr).toContain('tenuis sweep CASE.json --param knudsen|pressure');
    expect(existsSync(out)).toBe(false);
  });

  it('needs one case file and --out; help sweep and tenuis --help show it', () => {
    expect(
      tenuis('sweep', '--param', 'knudsen', '--from', '1', '--to', '2', '--points', '2', '--out', join(work, 'x'))
        .stderr,
    ).toMatch(/sweep needs exactly one case file/);
    const noOut = tenuis('sweep', couettePath, '--param', 'knudsen', '--from', '1', '--to', '2', '--points', '2');
    expect([noOut.code, noOut.stderr]).toEqual([2, expect.stringMatching(/sweep needs an output folder: --out DIR/)]);
    expect(tenuis('help', 'sweep').stdout).toMatch(/--log {2,}geometric spacing/);
    expect(tenuis('--help').stdout).toMatch(/tenuis sweep CASE\.json --param knudsen/);
  });

  it('Ctrl-C (SIGINT) keeps what the running point sampled, writes sweep.csv with it marked interrupted, exits 130', async () => {
    const c = json(couettePath);
    c.sampling = { transientSteps: 0, sampleSteps: 50_000_000 };
    const path = join(work, 'long.json');
    writeFileSync(path, JSON.stringify(c));
    const out = join(work, 'interrupted');
    const child = spawn(
      process.execPath,
      [cli, 'sweep', path, '--param', 'knudsen', '--from', '1', '--to', '2', '--points', '3', '--out', out],
      { stdio: ['ignore', 'pipe', 'pipe'] },
    );
    let stderr = '';
    const exit = new Promise<number | null>((resolve) => child.on('close', (code) => resolve(code)));
    // Off a terminal the progress line is printed at once: the first point is sampling when it appears.
    await new Promise<void>((resolve) =>
      child.stderr.on('data', (d) => {
        stderr += d;
        if (/sampling +step /.test(stderr)) resolve();
      }),
    );
    child.kill('SIGINT');
    expect(await exit).toBe(130);
    expect(stderr).toMatch(/sweep interrupted at point 1\/3/);
    const { rows } = readCsv(join(out, 'sweep.csv'));
    expect(rows.map((row) => row.slice(0, 3))).toEqual([['1', '1', 'interrupted']]);
    expect(json(join(out, 'sweep.json')).interrupted).toBe(true);
    const s = json(join(out, 'points', '001', 'summary.json'));
    expect(s.warnings.join('\n')).toMatch(/interrupted by the user/);
    expect(rows[0][6]).toBe(cell(s.walls.bottom.shearStress.mean));
    expect(existsSync(join(out, 'points', '002'))).toBe(false);
  });
});
