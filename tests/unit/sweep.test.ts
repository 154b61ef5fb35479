// The pure side of `tenuis sweep` (engine/case/sweep.ts): what a point is, the spacing of the points, and the table.
import { describe, expect, it } from 'vitest';
import { parseCase, type Case, type CaseInput } from '../../engine/case/schema';
import { plan, type Plan } from '../../engine/plan/plan';
import { buildPreset } from '../../engine/case/presets';
import { caseAtSweepPoint, caseValueOf } from '../../engine/plan/sweepPoints';
import { scalePressures, sweepValues } from '../../engine/case/sweep';
import { sweepCsv, sweepJson } from '../../engine/report/sweepTable';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SummaryJson } from '../../engine/report/summaryJson';

function parsed(input: unknown): Case {
  const r = parseCase(input);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.value;
}

function planned(c: Case): Plan {
  const r = plan(c);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.plan;
}

const wall = { type: 'wall', model: 'diffuse', temperatureK: 300 } as const;

/** A channel of gap 1 µm and length 3 µm between two vessels at 2:1, with flowReport pressures of its own. */
function vesselCase(geometry: 'planar' | 'axisymmetric'): Case {
  const input: CaseInput = {
    schemaVersion: 1,
    name: 'vessels',
    gas: { species: 'N2', model: 'VHS' },
    initial: { pressurePa: 15_000, temperatureK: 300 },
    domain: { lengthXM: 3e-6, lengthYM: 1e-6, characteristicLengthM: 1e-6, geometry },
    boundaries: {
      left: { type: 'reservoir', pressurePa: 20_000, temperatureK: 300 },
      right: { type: 'reservoir', pressurePa: 10_000, temperatureK: 300 },
      bottom: geometry === 'axisymmetric' ? { type: 'axis' } : wall,
      top: wall,
    },
    flowSections: [{ name: 'middle', xM: 1.5e-6 }],
    flowReport: {
      duct: geometry === 'axisymmetric' ? 'tube' : 'channel',
      sizeM: 1e-6,
      lengthM: 3e-6,
      upstreamPressurePa: 19_000,
      downstreamPressurePa: 11_000,
    },
    numerics: { cellsX: 9, cellsY: 3, particlesPerCell: 20 },
  };
  return parsed(input);
}

/** Every number under a key ending in "pressurePa" (any case), by its path. */
function pressuresOf(x: unknown, path = ''): Map<string, number> {
  const out = new Map<string, number>();
  if (x !== null && typeof x === 'object') {
    for (const [k, v] of Object.entries(x)) {
      const p = path ? `${path}.${k}` : k;
      if (typeof v === 'number' && /pressurepa$/i.test(k)) out.set(p, v);
      else for (const [q, w] of pressuresOf(v, p)) out.set(q, w);
    }
  }
  return out;
}

/** The case with every pressure replaced by 0, to compare everything else. */
function withoutPressures(x: unknown): unknown {
  if (Array.isArray(x)) return x.map(withoutPressures);
  if (x === null || typeof x !== 'object') return x;
  return Object.fromEntries(Object.entries(x).map(([k, v]) => [k, /pressurepa$/i.test(k) ? 0 : withoutPressures(v)]));
}

describe('scalePressures()', () => {
  it('multiplies every pressure of the case (initial, reservoirs, flowReport) by the factor and changes nothing else', () => {
    const c = vesselCase('planar');
    const before = pressuresOf(c);
    expect([...before.keys()].sort()).toEqual([
      'boundaries.left.pressurePa',
      'boundaries.right.pressurePa',
      'flowReport.downstreamPressurePa',
      'flowReport.upstreamPressurePa',
      'initial.pressurePa',
    ]);
    const scaled = scalePressures(c, 0.37);
    for (const [path, p] of pressuresOf(scaled)) expect(p, path).toBeCloseTo(0.37 * before.get(path)!, 9);
    expect(withoutPressures(scaled)).toEqual(withoutPressures(c));
    expect(pressuresOf(c)).toEqual(before); // the input is not changed
  });

  it('leaves a vacuum reservoir at 0 and flowReport pressures unset when they are unset', () => {
    const c = vesselCase('planar');
    const open = parsed({
      ...c,
      boundaries: { ...c.boundaries, right: { type: 'reservoir', pressurePa: 0, temperatureK: 300 } },
      flowReport: { duct: 'slit', sizeM: 1e-6 },
    });
    const scaled = scalePressures(open, 4);
    expect(scaled.boundaries.right).toMatchObject({ type: 'reservoir', pressurePa: 0 });
    expect(scaled.flowReport).toEqual({ duct: 'slit', sizeM: 1e-6 });
    expect(parseCase(scaled).ok).toBe(true);
  });
});

describe('caseAtSweepPoint()', () => {
  it('knudsen: plan() of the point gives the requested Kn to 1e-12, δ = √π/(2 Kn), and the same pressure ratios', () => {
    for (const geometry of ['planar', 'axisymmetric'] as const) {
      const c = vesselCase(geometry);
      for (const kn of [1e-3, 0.05, 1, 37.5]) {
        const point = caseAtSweepPoint(c, 'knudsen', kn);
        expect(parseCase(point).ok).toBe(true);
        const r = planned(point).reference;
        expect(Math.abs(r.knudsen / kn - 1), `${geometry} Kn ${kn}`).toBeLessThan(1e-12);
        expect(r.rarefaction * r.knudsen).toBeCloseTo(Math.sqrt(Math.PI) / 2, 12);
        const p = pressuresOf(point);
        expect(p.get('boundaries.left.pressurePa')! / p.get('boundaries.right.pressurePa')!).toBeCloseTo(2, 12);
        expect(p.get('flowReport.upstreamPressurePa')! / p.get('initial.pressurePa')!).toBeCloseTo(19 / 15, 12);
      }
    }
  });

  it('knudsen: the Couette preset swept to Kn = 0.25 is the preset built at Kn = 0.25 (same pressure to 1e-12)', () => {
    const c = parsed(buildPreset('couette', { knudsen: '1', cellsY: '10' }));
    expect(caseValueOf(c, 'knudsen')).toBeCloseTo(1, 12);
    const point = caseAtSweepPoint(c, 'knudsen', 0.25);
    const direct = parsed(buildPreset('couette', { knudsen: '0.25', cellsY: '10' }));
    expect(point.initial.pressurePa / direct.initial.pressurePa).toBeCloseTo(1, 12);
    expect(point.name).toBe(`${c.name}, knudsen 0.25`);
  });

  it('pressure: puts the reference pressure at the value exactly and scales the others alike', () => {
    const c = vesselCase('planar');
    const point = caseAtSweepPoint(c, 'pressure', 150);
    expect(point.initial.pressurePa).toBe(150);
    expect(planned(point).reference.pressurePa).toBe(150);
    expect(point.boundaries.left).toMatchObject({ pressurePa: expect.closeTo(200, 9) });
    expect(point.boundaries.right).toMatchObject({ pressurePa: expect.closeTo(100, 9) });
    expect(point.name).toBe('vessels, pressure 150 Pa');
  });

  it('cells the case leaves open are planned again for each point; cells it fixes are kept and the planner warns', () => {
    const c = vesselCase('planar');
    const open = parsed({ ...c, numerics: { particlesPerCell: 20 } });
    const coarse = planned(caseAtSweepPoint(open, 'knudsen', 1)).grid;
    const fine = planned(caseAtSweepPoint(open, 'knudsen', 0.01)).grid;
    expect(fine.cellsY).toBeGreaterThan(coarse.cellsY);
    expect(fine.cellSizeYM).toBeLessThanOrEqual(((0.01e-6 * 15_000) / 20_000 / 3) * (1 + 1e-9)); // λ/3 at the densest vessel
    const fixed = planned(caseAtSweepPoint(c, 'knudsen', 0.01));
    expect([fixed.grid.cellsX, fixed.grid.cellsY]).toEqual([9, 3]);
    expect(fixed.warnings.join('\n')).toMatch(/cell size is [\d.]+ mean free paths/);
  });
});

describe('sweepValues()', () => {
  it('linear: equal steps with exact ends; one point is just from; a range may run downwards', () => {
    expect(sweepValues(1, 3, 3, 'linear')).toEqual([1, 2, 3]);
    expect(sweepValues(0.1, 0.7, 4, 'linear')).toEqual([0.1, 0.3, 0.5, 0.7]); // not 0.30000000000000004
    expect(sweepValues(5, 9, 1, 'linear')).toEqual([5]);
    expect(sweepValues(5, 9, 1, 'log')).toEqual([5]);
    expect(sweepValues(3, 1, 3, 'linear')).toEqual([3, 2, 1]);
  });

  it('log: equal ratios with exact ends, rounded to 15 significant digits in between', () => {
    const v = sweepValues(0.01, 10, 4, 'log');
    expect(v[0]).toBe(0.01);
    expect(v[3]).toBe(10);
    expect(v).toEqual([0.01, 0.1, 1, 10]);
    expect(sweepValues(0.5, 4, 4, 'log')).toEqual([0.5, 1, 2, 4]); // round numbers come out round
    const odd = sweepValues(1, 7, 5, 'log');
    for (let k = 1; k < 5; k++) expect(Math.abs(odd[k] / odd[k - 1] / 7 ** 0.25 - 1)).toBeLessThan(1e-14);
    const down = sweepValues(100, 1, 5, 'log');
    for (let k = 1; k < 5; k++) expect(down[k - 1] / down[k]).toBeCloseTo(Math.sqrt(10), 12);
  });
});

describe('sweepCsv()', () => {
  /** A summary holding just what the table reads. */
  const summary = (kn: number, extra: Partial<SummaryJson>): SummaryJson =>
    ({
      reference: { knudsen: kn, rarefaction: Math.sqrt(Math.PI) / (2 * kn), pressure: 10 / kn },
      walls: {},
      ...extra,
    }) as unknown as SummaryJson;

  it('flow cases: swept value, reference state and every flow quantity with its half-width, units per metre when planar', () => {
    const flow = {
      massFlowRate: { mean: 2e-9, ci95: 1e-10 },
      throughput: { mean: 3, ci95: null },
      conductance: undefined,
    };
    const rows: SweepRow[] = [
      { point: 1, value: 0.1, status: 'complete', summary: summary(0.1, { flow: flow as never }) },
      { point: 2, value: 1, status: 'interrupted', summary: null },
    ];
    const [header, first, second] = sweepCsv(rows, { parameter: 'knudsen', planar: true, hasFlow: true })
      .trimEnd()
      .split('\n');
    expect(header.split(',').slice(0, 8)).toEqual([
      'point [1]',
      'knudsen [1]',
      'status',
      'reference knudsen [1]',
      'reference rarefaction [1]',
      'reference pressure [Pa]',
      'massFlowRate [kg/(s m)]',
      'massFlowRate ci95 [kg/(s m)]',
    ]);
    expect(header).toContain('reducedFlowRate ci95 [1]');
    expect(header.split(',')).toHaveLength(6 + 2 * 7);
    const cells = first.split(',');
    expect(cells.slice(0, 8)).toEqual([
      '1',
      '0.1',
      'complete',
      '0.1',
      String(Math.sqrt(Math.PI) / 0.2),
      '100',
      '2e-9',
      '1e-10',
    ]);
    expect(cells.slice(8, 12)).toEqual(['3', '', '', '']); // throughput without a half-width; molarFlow not there
    expect(second).toBe(`2,1,interrupted${','.repeat(3 + 14)}`);
    const axi = sweepCsv(rows, { parameter: 'pressure', planar: false, hasFlow: true }).split('\n')[0];
    expect(axi).toMatch(
      /^point \[1\],pressure \[Pa\],status,.*massFlowRate \[kg\/s\].*throughput \[Pa m\^3\/s\].*molarFlow \[sccm\]/,
    );
  });

  it("cases without flow sections: every wall's shear stress and heat flux with half-widths", () => {
    const e = (mean: number) => ({ mean, ci95: mean / 10 });
    const walls = { bottom: { shearStress: e(-2), heatFlux: e(5) }, top: { shearStress: e(2), heatFlux: e(-5) } };
    const csv = sweepCsv(
      [{ point: 1, value: 0.5, status: 'complete', summary: summary(0.5, { walls: walls as never }) }],
      { parameter: 'knudsen', planar: true, hasFlow: false },
    );
    const [header, row] = csv.trimEnd().split('\n');
    expect(header.split(',').slice(6)).toEqual([
      'bottom shearStress [Pa]',
      'bottom shearStress ci95 [Pa]',
      'bottom heatFlux [W/m^2]',
      'bottom heatFlux ci95 [W/m^2]',
      'top shearStress [Pa]',
      'top shearStress ci95 [Pa]',
      'top heatFlux [W/m^2]',
      'top heatFlux ci95 [W/m^2]',
    ]);
    expect(row.split(',').slice(6)).toEqual(['-2', '-0.2', '5', '0.5', '2', '0.2', '-5', '-0.5']);
  });

  it('sweepJson() lists every point with its folder (none when nothing was written) and says whether it was interrupted', () => {
    const rows: SweepRow[] = [
      { point: 1, value: 0.1, status: 'complete', summary: summary(0.1, {}) },
      { point: 2, value: 1, status: 'interrupted', summary: null },
    ];
    const j = sweepJson(rows, {
      caseName: 'c',
      parameter: 'knudsen',
      from: 0.1,
      to: 10,
      points: 3,
      spacing: 'log',
      interrupted: true,
    });
    expect(j).toMatchObject({
      format: 'tenuis-sweep',
      parameter: 'knudsen',
      unit: '1',
      pointsRequested: 3,
      interrupted: true,
    });
    expect(j.points.map((p) => p.folder)).toEqual(['points/001', null]);
  });
});
