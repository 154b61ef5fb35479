// `tenuis duct` and `tenuis coefficients` (issue 14): the long-duct solver on the command line, from a coefficient
// table, against closed forms and the linearized BGK table (sources beside each check).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { modelFromSpecies, viscosityPaS } from '../../engine/gas/molecularModel';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');
const work = mkdtempSync(join(tmpdir(), 'tenuis-duct-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function tenuis(...args: string[]) {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout: 300_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

const SIGMA_P = 1.0162; // kinetic slip coefficient in ℓ units (reference notes §2)
const slipTable = join(work, 'slip.json');
writeFileSync(
  slipTable,
  JSON.stringify({
    shape: 'channel',
    source: 'first-order slip G_P = δ/6 + σ_P',
    gasAndWall: 'any gas, diffuse walls',
    points: [0.01, 0.1, 1, 10, 100, 1000].map((d) => ({
      rarefaction: d,
      reducedFlowRate: d / 6 + SIGMA_P,
      reducedFlowRateCi95: 0,
    })),
  }),
);

describe('tenuis duct', () => {
  it('the microchannel of Arkilic et al. (1997): the first-order slip formula to 1e-6, and the files', () => {
    const out = join(work, 'arkilic');
    const r = tenuis(
      'duct',
      ...['shape=channel', 'gap=1.33um', 'width=52.25um', 'length=7.5mm', 'gas=He', 'temperature=300K'].flatMap((s) => [
        '--set',
        s,
      ]),
      ...[
        '--set',
        'upstreamPressure=2.5bar',
        '--set',
        'downstreamPressure=1bar',
        '--coefficients',
        slipTable,
        '--out',
        out,
      ],
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/mass flow rate +[\d.e+-]+ kg\/s/);
    expect(r.stdout).toMatch(/model estimates; defer to local codes/);
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    // Arkilic, Schmidt & Breuer 1997 (J. MEMS 6:167; from memory, reference notes §7), slip coefficient s = 2σ_P/√π in
    // λ = (μ/p)·sqrt(πRT/2) units: ṁ = (H³ W p_o²/(24 μ R T L))·[(Π² − 1) + 12 s Kn_o (Π − 1)].
    const he = modelFromSpecies('He', 'VHS');
    const mu = viscosityPaS(he, 300);
    const rs = K_B / he.massKg;
    const [h, w, l, pIn, pOut] = [1.33e-6, 52.25e-6, 7.5e-3, 2.5e5, 1e5];
    const knOut = ((mu / pOut) * Math.sqrt((Math.PI * rs * 300) / 2)) / h;
    const s2 = (2 * SIGMA_P) / Math.sqrt(Math.PI);
    const arkilic =
      ((h ** 3 * w * pOut ** 2) / (24 * mu * rs * 300 * l)) *
      ((pIn / pOut) ** 2 - 1 + 12 * s2 * knOut * (pIn / pOut - 1));
    expect(Math.abs(s.flow.massFlowRate.mean / arkilic - 1)).toBeLessThan(1e-6);
    expect(s.upstream.pressure).toBe(2.5e5);
    expect(s.downstream.knudsen).toBeCloseTo(knOut, 9);
    expect(s.coefficients.source).toMatch(/first-order slip/);
    const csv = readFileSync(join(out, 'duct.csv'), 'utf8').split(/\r?\n/);
    expect(csv[0]).toBe(
      'x (m),pressure (Pa),temperature (K),rarefaction δ (1),Knudsen number (1),mean speed (m/s),Mach number (1)',
    );
    // The last row is the outlet: its mean speed carries the mass flow through ρ_out A (ρ = p m/(kT)).
    const outlet = csv
      .filter((line) => line.trim() !== '')
      .at(-1)!
      .split(',')
      .map(Number);
    expect(outlet[0]).toBeCloseTo(l, 12);
    expect(outlet[1] / pOut - 1).toBeLessThan(1e-9);
    const rhoOut = (pOut * he.massKg) / (K_B * 300);
    expect(Math.abs((outlet[5] * rhoOut * h * w) / s.flow.massFlowRate.mean - 1)).toBeLessThan(1e-6);
    expect(s.flow.molarFlow.mean).toBeGreaterThan(0);
  });

  it('--sweep upstreamPressure writes the conductance curve with units in every column', () => {
    const out = join(work, 'curve');
    const r = tenuis(
      'duct',
      ...[
        'shape=channel',
        'gap=1um',
        'length=1mm',
        'gas=N2',
        'upstreamPressure=2bar',
        'downstreamPressure=1bar',
      ].flatMap((s) => ['--set', s]),
      ...['--coefficients', slipTable, '--sweep', 'upstreamPressure', '--from', '1kPa', '--to', '10bar'],
      ...['--points', '7', '--log', '--out', out],
    );
    expect(r.code, r.stderr).toBe(0);
    const lines = readFileSync(join(out, 'conductance.csv'), 'utf8').trim().split(/\r?\n/);
    expect(lines[0]).toBe(
      'upstream pressure (Pa),mean pressure (Pa),mean Knudsen number (1),conductance (m^3/s),conductance ci95 (m^3/s),no-slip (m^3/s),first-order slip (m^3/s),free-molecular (m^3/s)',
    );
    expect(lines).toHaveLength(8);
    // The table is first-order slip itself: its column equals the first-order line.
    for (const line of lines.slice(1)) {
      const [, , , c, , , slip] = line.split(',').map(Number);
      expect(c / slip - 1).toBeCloseTo(0, 6);
    }
  });

  it('a pump at the outlet: chamber pressure and effective speed, 1/S_eff = 1/S_pump + 1/C at the pressures the duct has', () => {
    const r = tenuis(
      'duct',
      ...['shape=channel', 'gap=1um', 'length=1mm', 'gas=N2', 'pumpSpeed=0.001L/s', 'gasLoad=1e-3mbar·L/s'].flatMap(
        (s) => ['--set', s],
      ),
      '--coefficients',
      slipTable,
    );
    expect(r.code, r.stderr).toBe(0);
    const num = (label: string) => Number(new RegExp(`${label} +([\\d.e+-]+)`).exec(r.stdout)?.[1]);
    // 1e-3 mbar·L/s = 1e-4 Pa·m³/s over 1e-6 m³/s: 100 Pa at the pump.
    expect(num('pump inlet pressure')).toBeCloseTo(100, 6);
    const speed = num('effective pumping speed');
    const c = num('duct conductance');
    expect(1 / speed / (1 / 0.001 + 1 / c) - 1).toBeCloseTo(0, 3);
  });

  it('a rectangle on its no-slip line gives the compressible Poiseuille flow of the rectangle to 1e-6', () => {
    // Series bracket (White, Viscous Fluid Flow, §3-3; common closed form), evaluated here:
    // f = 1 − (192 H/(π⁵ W)) Σ_{k odd} tanh(kπW/(2H))/k⁵; ṁ = f H³ W (p1² − p2²) / (24 μ (k T/m) L).
    const a = 0.25;
    let sum = 0;
    for (let k = 1; k < 400; k += 2) sum += Math.tanh((k * Math.PI) / (2 * a)) / k ** 5;
    const f = 1 - ((192 * a) / Math.PI ** 5) * sum;
    const table = join(work, 'rect-noslip.json');
    writeFileSync(
      table,
      JSON.stringify({
        shape: 'rectangle',
        aspectRatio: a,
        source: 'no-slip series',
        gasAndWall: 'continuum',
        points: [0.01, 1, 100, 1e4].map((d) => ({
          rarefaction: d,
          reducedFlowRate: (f / 6) * d,
          reducedFlowRateCi95: 0,
        })),
      }),
    );
    const out = join(work, 'rect');
    const r = tenuis(
      'duct',
      ...['shape=rectangle', 'height=5um', 'width=20um', 'length=10mm', 'gas=N2', 'temperature=300K'].flatMap((s) => [
        '--set',
        s,
      ]),
      ...['upstreamPressure=3bar', 'downstreamPressure=1bar'].flatMap((s) => ['--set', s]),
      '--coefficients',
      table,
      '--out',
      out,
    );
    expect(r.code, r.stderr).toBe(0);
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    const n2 = modelFromSpecies('N2', 'VHS');
    const mu = viscosityPaS(n2, 300);
    const expected = (f * 5e-6 ** 3 * 20e-6 * (9e10 - 1e10)) / (24 * mu * ((K_B * 300) / n2.massKg) * 0.01);
    expect(Math.abs(s.flow.massFlowRate.mean / expected - 1)).toBeLessThan(1e-6);
    expect(s.shape).toBe('rectangle');
  });

  it('refuses what it cannot use, naming the parameter or file', () => {
    const bad = (args: string[], pattern: RegExp) => {
      const r = tenuis('duct', ...args);
      expect(r.code).not.toBe(0);
      expect(r.stderr).toMatch(pattern);
    };
    bad(['--set', 'diameter=1mm', '--coefficients', slipTable], /unknown parameter "diameter"/);
    bad(['--set', 'shape=tube', '--set', 'radius=1mm', '--set', 'length=1m'], /give exactly two of upstreamPressure/);
    bad(
      [
        '--set',
        'shape=tube',
        '--set',
        'radius=1mm',
        '--set',
        'length=1m',
        '--set',
        'upstreamPressure=1Pa',
        '--set',
        'downstreamPressure=0.1Pa',
        '--coefficients',
        slipTable,
      ],
      /is for a channel, not a tube/,
    );
    bad(['--set', 'gap=1 furlong', '--coefficients', slipTable], /--set gap=1 furlong/);
    bad(
      [
        '--set',
        'shape=channel',
        '--set',
        'gap=1um',
        '--set',
        'length=1mm',
        '--set',
        'upstreamPressure=1bar',
        '--coefficients',
        slipTable,
      ],
      /exactly two of/,
    );
  });
});

describe('the built-in channel table', () => {
  it('is used without --coefficients, and says so', () => {
    const r = tenuis(
      'duct',
      ...[
        'shape=channel',
        'gap=1um',
        'length=1mm',
        'gas=Ar',
        'upstreamPressure=2bar',
        'downstreamPressure=1bar',
      ].flatMap((s) => ['--set', s]),
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/note: built-in table \(Ar \(HS\), diffuse walls\)/);
  });

  it('agrees with the linearized BGK G_P within the hard-sphere difference plus its half-width', () => {
    // BGK (reference notes §2, computed): a hard-sphere gas differs from the model equation by up to 3–4 % for
    // Poiseuille flow in the transition regime δ ≈ 0.1–10 (same section); compared where both tables have a point in
    // that range. (At δ = 0.01 the shipped hard-sphere value is 8.5 % below BGK's: near the free-molecular limit the
    // channel's logarithmic growth depends on how collision rates vary with speed, and the notes bound nothing there.)
    const bgk: Record<string, number> = { '0.1': 2.03271, '1': 1.53868, '10': 2.76864 };
    const shipped = JSON.parse(
      readFileSync(join(repoRoot, 'engine', 'longDuct', 'tables', 'channel-argon-hard-sphere.json'), 'utf8'),
    ) as { points: { rarefaction: number; reducedFlowRate: number; reducedFlowRateCi95: number }[] };
    let compared = 0;
    for (const p of shipped.points) {
      const ref = bgk[String(Number(p.rarefaction.toPrecision(6)))];
      if (ref === undefined) continue;
      compared++;
      expect(Math.abs(p.reducedFlowRate - ref), `δ = ${p.rarefaction}`).toBeLessThan(
        0.04 * ref + p.reducedFlowRateCi95,
      );
    }
    expect(compared).toBe(3);
  });

  it('the shipped tube table agrees with the linearized BGK G_P within the hard-sphere difference plus its half-width', () => {
    // Linearized BGK, round tube, diffuse walls (reference notes §3): δ = 0.01: 1.4768 (published: Karniadakis,
    // Beskok & Aluru 2005, Table 15.5, after Cercignani & Sernagiotto 1966); δ = 1: 1.45829 and δ = 10: 3.56416
    // (computed, the project's BGK solver). Hard spheres differ from the model equation by up to 3–4 % (§2).
    const bgk: Record<string, number> = { '0.01': 1.4768, '1': 1.45829, '10': 3.56416 };
    const shipped = JSON.parse(
      readFileSync(join(repoRoot, 'engine', 'longDuct', 'tables', 'tube-argon-hard-sphere.json'), 'utf8'),
    ) as { points: { rarefaction: number; reducedFlowRate: number; reducedFlowRateCi95: number }[] };
    let compared = 0;
    for (const p of shipped.points) {
      const ref = bgk[String(Number(p.rarefaction.toPrecision(6)))];
      if (ref === undefined) continue;
      compared++;
      expect(Math.abs(p.reducedFlowRate - ref), `δ = ${p.rarefaction}`).toBeLessThan(
        0.04 * ref + p.reducedFlowRateCi95,
      );
    }
    expect(compared).toBe(3);
  });
});

describe('tenuis coefficients', () => {
  it('sweeps a force-driven channel over δ into a table that tenuis duct reads; G_P near the linearized BGK values', () => {
    const caseFile = join(work, 'poiseuille.json');
    const preset = tenuis(
      'preset',
      'poiseuille',
      '--set',
      'particlesPerCell=20',
      '--set',
      'transientSteps=300',
      '--set',
      'seed=4',
    );
    expect(preset.code, preset.stderr).toBe(0);
    // Leave the cells to the planner at each point (cells of λ/3), as a coefficient case should.
    const c = JSON.parse(preset.stdout);
    delete c.numerics.cellsY;
    delete c.numerics.cellsX;
    writeFileSync(caseFile, JSON.stringify(c));
    const table = join(work, 'table.json');
    const r = tenuis(
      'coefficients',
      caseFile,
      '--from',
      '0.1',
      '--to',
      '10',
      '--points',
      '3',
      '--out',
      table,
      '--time-cap',
      '12',
      '--quiet',
    );
    expect(r.code, r.stderr).toBe(0);
    expect(existsSync(`${table}.points/sweep.json`)).toBe(true);
    const t = JSON.parse(readFileSync(table, 'utf8'));
    expect(t.shape).toBe('channel');
    expect(t.source).toMatch(/^Tenuis \d+\.\d+\.\d+ DSMC, tenuis coefficients on case /);
    expect(t.source).not.toContain(work);
    expect(t.points.map((p: { rarefaction: number }) => p.rarefaction.toPrecision(6))).toEqual([
      '0.100000',
      '1.00000',
      '10.0000',
    ]);
    // Linearized BGK G_P (reference notes §2, computed): 2.03271, 1.53868, 2.76864; a VHS gas differs from the model
    // equation by up to 3–4 % in the transition regime (same notes), so: within that plus the 95 % half-width.
    const bgk = [2.03271, 1.53868, 2.76864];
    t.points.forEach((p: { reducedFlowRate: number; reducedFlowRateCi95: number }, k: number) =>
      expect(Math.abs(p.reducedFlowRate - bgk[k])).toBeLessThan(0.04 * bgk[k] + p.reducedFlowRateCi95),
    );
    const duct = tenuis(
      'duct',
      ...[
        'shape=channel',
        'gap=1um',
        'length=1mm',
        'gas=Ar',
        'upstreamPressure=20kPa',
        'downstreamPressure=10kPa',
      ].flatMap((s) => ['--set', s]),
      '--coefficients',
      table,
    );
    expect(duct.code, duct.stderr).toBe(0);
    expect(duct.stdout).toMatch(/coefficients: Tenuis \d+\.\d+\.\d+ DSMC/);
  });

  it('sweeps a rectangular cross-section into a rectangle table of its aspect ratio that tenuis duct reads', () => {
    const caseFile = join(work, 'rect.json');
    const preset = tenuis(
      'preset',
      'rectangularDuct',
      ...['gas=Ar', 'model=HS', 'aspectRatio=0.5', 'knudsen=1', 'cellsY=4', 'particlesPerCell=40'].flatMap((s) => [
        '--set',
        s,
      ]),
      ...['transientSteps=300', 'sampleSteps=3000', 'seed=4'].flatMap((s) => ['--set', s]),
    );
    expect(preset.code, preset.stderr).toBe(0);
    writeFileSync(caseFile, preset.stdout);
    const table = join(work, 'rect-table.json');
    const r = tenuis(
      'coefficients',
      caseFile,
      '--from',
      '0.5',
      '--to',
      '2',
      '--points',
      '2',
      '--out',
      table,
      '--quiet',
    );
    expect(r.code, r.stderr).toBe(0);
    const t = JSON.parse(readFileSync(table, 'utf8'));
    expect(t.shape).toBe('rectangle');
    expect(t.aspectRatio).toBeCloseTo(0.5, 12);
    expect(t.points).toHaveLength(2);
    // The free-molecular G_P of H/W = 1/2 is 1.152 (the chord integral, tests/validation/rectangularDuct.test.ts):
    // in transition a square-ish duct's G_P stays near it (a plausibility bound, common practice).
    for (const p of t.points) expect(p.reducedFlowRate).toBeGreaterThan(0.7);
    const duct = tenuis(
      'duct',
      ...['shape=rectangle', 'height=1um', 'width=2um', 'length=1mm', 'gas=Ar'].flatMap((s) => ['--set', s]),
      ...['upstreamPressure=20kPa', 'downstreamPressure=10kPa'].flatMap((s) => ['--set', s]),
      '--coefficients',
      table,
    );
    expect(duct.code, duct.stderr).toBe(0);
    const wrong = tenuis(
      'duct',
      ...['shape=rectangle', 'height=1um', 'width=4um', 'length=1mm', 'gas=Ar'].flatMap((s) => ['--set', s]),
      ...['upstreamPressure=20kPa', 'downstreamPressure=10kPa'].flatMap((s) => ['--set', s]),
      '--coefficients',
      table,
    );
    expect(wrong.code).not.toBe(0);
    expect(wrong.stderr).toMatch(/is for a rectangle of H\/W = 0.5, the duct's is 0.2500/);
  });

  it('refuses a case that is not a force-driven duct', () => {
    const caseFile = join(work, 'couette.json');
    writeFileSync(caseFile, tenuis('preset', 'couette').stdout);
    const r = tenuis(
      'coefficients',
      caseFile,
      '--from',
      '0.1',
      '--to',
      '10',
      '--points',
      '3',
      '--out',
      join(work, 'x.json'),
    );
    expect(r.code).not.toBe(0);
    expect(r.stderr).toMatch(/force-driven channel or tube/);
  });
});
