// The glue shared by `tenuis sweep` and the browser's sweep (engine/case/sweep.ts): points planned up front, one row
// per point from a real (tiny) run, and the continuum curves over the range.
import { describe, expect, it } from 'vitest';
import { parseCase, type Case } from '../../engine/case/schema';
import { buildPreset } from '../../engine/case/presets';
import { createSimulation, runToCompletion } from '../../engine/run/simulation';
import { summarize } from '../../engine/run/simulationSamples';
import { resultFiles } from '../../engine/report/resultFiles';
import type { SummaryJson } from '../../engine/report/summaryJson';
import { continuumComparisonOf } from '../../engine/report/comparison';
import { caseModelsOf } from '../../engine/continuum/caseModels';
import { planSweepPoints } from '../../engine/plan/sweepPoints';
import { sweepContinuumCurves } from '../../engine/report/sweepCurves';
import { sweepCsv } from '../../engine/report/sweepTable';
import { sweepRowOf } from '../../engine/report/sweepRow';
import { sweepValues } from '../../engine/case/sweep';

function parsed(input: unknown): Case {
  const r = parseCase(input);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.value;
}

/** A tiny Couette case: 10 rows of 20 particles, 100 + 200 steps, seed 3. */
const couette = () =>
  parsed(
    buildPreset('couette', {
      knudsen: '1',
      cellsY: '10',
      particlesPerCell: '20',
      transientSteps: '100',
      sampleSteps: '200',
      seed: '3',
    }),
  );
const performance = { wallSeconds: 0.5, particleSteps: 6e4, particleStepsPerSecond: 1.2e5 };

describe('planSweepPoints()', () => {
  it('plans every point at its value, numbered from 1', () => {
    const r = planSweepPoints(couette(), 'knudsen', [0.5, 1, 2]);
    if (!r.ok) throw new Error(r.errors.join('\n'));
    expect(r.points.map((p) => p.point)).toEqual([1, 2, 3]);
    r.points.forEach((p, k) => expect(p.plan.reference.knudsen / [0.5, 1, 2][k] - 1).toBeCloseTo(0, 12));
  });

  it("names the first point that cannot be planned, with the planner's errors", () => {
    const c = couette();
    const open = { ...c, numerics: { ...c.numerics, cellsY: undefined, maxParticles: 1000 } };
    const r = planSweepPoints(open, 'knudsen', [1, 0.01, 0.001]);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect([r.point, r.value]).toEqual([2, 0.01]);
    expect(r.errors.join('\n')).toMatch(/numerics\.(particlesPerCell|maxParticles)/);
  });
});

describe('sweepRowOf()', () => {
  it('a sampled point: its summary is the summary.json `tenuis run` writes for the same result, and sweep.csv shows its numbers', () => {
    const r = planSweepPoints(couette(), 'knudsen', [2]);
    if (!r.ok) throw new Error(r.errors.join('\n'));
    const [p] = r.points;
    const sim = createSimulation(p.plan);
    runToCompletion(sim);
    const result = summarize(sim);
    const comparison = continuumComparisonOf(p.plan, result);
    const row = sweepRowOf(1, 2, {
      kind: 'sampled',
      result,
      comparison,
      performance,
      caseName: p.caseData.name,
      interrupted: false,
    });
    const written = JSON.parse(
      resultFiles(result, { performance, caseName: p.caseData.name, plan: p.plan })['summary.json'],
    ) as SummaryJson;
    expect(row).toEqual({ point: 1, value: 2, status: 'complete', summary: written });
    expect(Object.keys(written.continuum ?? {})).toContain('firstOrder');

    const [header, line] = sweepCsv([row], { parameter: 'knudsen', planar: true, hasFlow: false })
      .trimEnd()
      .split('\n')
      .map((l) => l.split(','));
    const at = (h: string) => line[header.indexOf(h)];
    expect(at('top shearStress [Pa]')).toBe(String(written.walls.top!.shearStress.mean));
    expect(at('top shearStress ci95 [Pa]')).toBe(String(written.walls.top!.shearStress.ci95));
    expect(at('top shearStress firstOrder [Pa]')).toBe(String(written.continuum!.firstOrder['walls.top.shearStress']));
    expect(Number(at('top shearStress [Pa]'))).not.toBe(0);

    const stopped = sweepRowOf(1, 2, {
      kind: 'sampled',
      result,
      comparison,
      performance,
      caseName: p.caseData.name,
      interrupted: true,
    });
    expect(stopped.status).toBe('interrupted');
    expect(stopped.summary).toEqual(written);
  });

  it('a failed point and one stopped before sampling have no summary; sweep.csv leaves their numbers empty', () => {
    expect(sweepRowOf(2, 1, { kind: 'failed' })).toEqual({ point: 2, value: 1, status: 'failed', summary: null });
    expect(sweepRowOf(3, 4, { kind: 'nothingSampled' })).toEqual({
      point: 3,
      value: 4,
      status: 'interrupted',
      summary: null,
    });
    const csv = sweepCsv([sweepRowOf(2, 1, { kind: 'failed' })], { parameter: 'knudsen', planar: true, hasFlow: true });
    expect(csv.trimEnd().split('\n')[1]).toBe(`2,1,failed${','.repeat(3 + 14)}`);
  });
});

describe('sweepContinuumCurves()', () => {
  it("on a fixed grid, gives at each value the predictions each point's own plan gives (the sweep.csv model columns)", () => {
    const c = couette();
    const values = sweepValues(0.1, 10, 5, 'log');
    const curves = sweepContinuumCurves(c, 'knudsen', values, { cellsX: 1, cellsY: 4 });
    if ('reason' in curves) throw new Error(curves.reason);
    expect(curves.problem).toBe('couette');
    expect(curves.units['walls.top.shearStress']).toBe('Pa');
    const shear = curves.curves['walls.top.shearStress'];
    expect(Object.keys(shear).sort()).toEqual(['firstOrder', 'freeMolecular', 'noSlip', 'secondOrder']);
    const planned = planSweepPoints(c, 'knudsen', values);
    if (!planned.ok) throw new Error(planned.errors.join('\n'));
    planned.points.forEach((p, k) => {
      // What continuumComparisonOf puts into the point's summary.continuum.
      const own = caseModelsOf(p.plan);
      if (!own.recognised) throw new Error(own.reason);
      const q = own.quantities.find((x) => x.key === 'walls.top.shearStress')!;
      for (const model of ['noSlip', 'firstOrder', 'freeMolecular'] as const) {
        const expected = q.values[model]!;
        expect(Math.abs(shear[model]![k] - expected)).toBeLessThanOrEqual(1e-12 * Math.abs(expected));
      }
    });
    // No-slip Couette shear does not depend on the pressure; the slip models' falls towards free-molecular flow.
    expect(new Set(shear.noSlip!.map((v) => v.toPrecision(10))).size).toBe(1);
    expect(Math.abs(shear.firstOrder![4])).toBeLessThan(Math.abs(shear.firstOrder![0]));
  });

  it('says why when no continuum model fits the case', () => {
    const c = couette();
    const specular = { ...c, boundaries: { ...c.boundaries, top: { ...c.boundaries.top, model: 'specular' } } } as Case;
    const curves = sweepContinuumCurves(specular, 'knudsen', [1, 2], { cellsX: 1, cellsY: 4 });
    expect('reason' in curves && curves.reason).toMatch(/specular|slip/);
  });
});
