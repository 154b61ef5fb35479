/**
 * The verdict rules of engine/report/verdict.ts, the headline of headline.ts, verdict.csv and the applicability
 * limits of engine/continuum/caseApplicability.ts on constructed inputs, one test per branch. The equivalence test
 * is Schuirmann's two one-sided tests (1987, J. Pharmacokinet. Biopharm. 15:657) on the DSMC 95 % interval; the
 * tolerance 2 % is the module's default (common practice, no source). Expected values are worked out by hand from
 * the constructed inputs.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_TOLERANCE, integralVerdict, profileVerdict } from '../../engine/report/verdict';
import { extraTimeText, sampledWallSeconds, verdictHeadline } from '../../engine/report/headline';
import { verdictCsv } from '../../engine/report/verdictCsv';
import type { ContinuumComparison } from '../../engine/report/comparison';
import {
  cavityApplicability,
  couetteApplicability,
  ductApplicability,
  fourierApplicability,
} from '../../engine/continuum/caseApplicability';
import { gasStateFromModel } from '../../engine/continuum/gasState';
import { modelFromSpecies } from '../../engine/gas/molecularModel';

const statusOf = (v: ReturnType<typeof integralVerdict>, model: string) =>
  v.models.find((d) => d.model === model)?.status;

describe('integralVerdict(): equivalence, not closeness', () => {
  it('no-slip adequate when the whole interval of the deviation is inside ±2 %', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 1.1 }, { noSlip: 100.8, firstOrder: 95 });
    expect(DEFAULT_TOLERANCE).toBe(0.02);
    expect(v.status).toBe('adequate');
    expect(v.bestModel).toBe('noSlip');
    expect(v.models[0].lowerAbs).toBe(0);
    expect(v.models[0].upperAbs).toBeCloseTo(0.019, 12);
    expect(v.halfWidthToDecide).toBe(0);
    expect(v.samplingFactor).toBe(1);
    expect(v.text).toBe('no-slip adequate (within ±2.0 %: deviation 0.8 %, DSMC ±1.1 %)');
  });

  it('an interval touching +2 % from inside is adequate (the edge counts as inside)', () => {
    // d = 0.01 and h = 0.01 exactly: the upper end 0.02 is the tolerance.
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 1 }, { noSlip: 101 });
    expect(v.models[0].upperAbs).toBe(0.02);
    expect(v.status).toBe('adequate');
  });

  it('first-order adequate, no-slip not adequate: both intervals decided', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 0.5 }, { noSlip: 110, firstOrder: 100.3 });
    expect(statusOf(v, 'noSlip')).toBe('notAdequate');
    expect(statusOf(v, 'firstOrder')).toBe('adequate');
    expect(v.status).toBe('adequate');
    expect(v.bestModel).toBe('firstOrder');
    expect(v.text).toBe(
      'first-order slip adequate (within ±2.0 %: deviation 0.3 %, DSMC ±0.5 %); not adequate: no-slip off by 10 %',
    );
  });

  it("the issue's noise-as-agreement case (deviation 8.4 %, DSMC ±15 %) is undecided and says what would decide", () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 15 }, { noSlip: 108.4, firstOrder: 99 });
    expect(v.status).toBe('undecided');
    expect(v.bestModel).toBeNull();
    expect(statusOf(v, 'noSlip')).toBe('undecided');
    expect(statusOf(v, 'firstOrder')).toBe('undecided');
    // no-slip decides below |8.4 − 2| = 6.4 %, first-order below |2 − 1| = 1 %: the smaller settles both.
    expect(v.halfWidthToDecide).toBeCloseTo(0.01, 12);
    expect(v.samplingFactor).toBeCloseTo(225, 8);
    expect(v.text).toBe(
      'undecided: DSMC ±15 % cannot tell no-slip from first-order slip, which differ by 9.4 % (tolerance ±2.0 %); DSMC ±1.0 % would decide (about 225 times the sampling so far)',
    );
  });

  it('a short run\'s "deviation 236 %, DSMC ±659 %" is undecided, not a pass', () => {
    const v = integralVerdict('q', 'Pa', { mean: 1, ci95: 6.59 }, { noSlip: 3.36 });
    expect(v.status).toBe('undecided');
    expect(v.text).toMatch(/^undecided: DSMC ±659 % cannot tell whether no-slip \(off by 236 %\) is within ±2\.0 %/);
  });

  it('adequate with a simpler model still undecided: the best model holds, the text says what would settle the simpler', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 1.5 }, { noSlip: 102.5, firstOrder: 100.2 });
    expect(statusOf(v, 'noSlip')).toBe('undecided');
    expect(v.status).toBe('adequate');
    expect(v.bestModel).toBe('firstOrder');
    expect(v.halfWidthToDecide).toBeCloseTo(0.005, 12);
    expect(v.samplingFactor).toBeCloseTo(9, 8);
    expect(v.text).toMatch(/whether a simpler model would do is undecided: DSMC ±1\.5 % cannot tell whether no-slip/);
  });

  it('not adequate when every model is off: only the kinetic result holds (no "kinetic effects dominate")', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 1 }, { noSlip: 130, firstOrder: 115 });
    expect(v.status).toBe('notAdequate');
    expect(v.text).toBe(
      'not adequate: every model applicable here is off by more than ±2.0 % (closest: first-order slip off by 15 %; DSMC ±1.0 %); only the kinetic (DSMC) result holds',
    );
  });

  it('a model outside its range is "not applicable here" with the reason, and is not judged', () => {
    const v = integralVerdict(
      'q',
      'Pa',
      { mean: 100, ci95: 0.5 },
      { noSlip: 100.1, firstOrder: 100.2 },
      {},
      { noSlip: 'a reason' },
    );
    expect(statusOf(v, 'noSlip')).toBe('notApplicable');
    expect(v.bestModel).toBe('firstOrder');
    expect(v.text).toMatch(/; not applicable here: no-slip \(a reason\)$/);
    const none = integralVerdict('q', 'Pa', { mean: 100, ci95: 0.5 }, { noSlip: 150 }, {}, { noSlip: 'short duct' });
    expect(none.status).toBe('notApplicable');
    expect(none.text).toBe('no model applies here: no-slip (short duct); only the kinetic (DSMC) result holds');
  });

  it('without a DSMC half-width nothing is decided; without a DSMC value there is no verdict', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: NaN }, { noSlip: 100 });
    expect(v.status).toBe('undecided');
    expect(v.text).toMatch(/DSMC error not available/);
    expect(integralVerdict('q', 'Pa', { mean: 0, ci95: 1 }, { noSlip: 1 }).status).toBe('noData');
  });

  it('a custom tolerance moves the edge', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: 0.5 }, { noSlip: 104 }, { tolerance: 0.05 });
    expect(v.status).toBe('adequate');
  });
});

describe('profileVerdict()', () => {
  const n = 40;
  const y = Array.from({ length: n }, (_, i) => (i + 0.5) / n);
  const truth = y.map((s) => 100 * (s - 0.5));
  // Deterministic "noise" of RMS 0.25 of a scale 100, about h/1.96 for a half-width of 0.5.
  const noise = y.map((_, i) => 0.25 * Math.SQRT2 * Math.sin(2.3 * i + 0.4));
  const mean = truth.map((t, i) => t + noise[i]);

  it('RMS and max deviation, RMS half-width, and the bounds of the RMS deviation', () => {
    const ci95 = y.map(() => 0.5);
    const biased = truth.map((t) => t + 3);
    const v = profileVerdict('profile.velocityX', 'm/s', mean, ci95, 100, { noSlip: biased });
    const d = biased.map((b, i) => (b - mean[i]) / 100);
    const rms = (a: number[]) => Math.sqrt(a.reduce((s, x) => s + x * x, 0) / a.length);
    expect(v.models[0].deviation).toBeCloseTo(rms(d), 12);
    expect(v.models[0].maxDeviation).toBeCloseTo(Math.max(...d.map(Math.abs)), 12);
    expect(v.models[0].lowerAbs).toBeCloseTo(rms(d.map((x) => Math.max(0, Math.abs(x) - 0.005))), 12);
    expect(v.models[0].upperAbs).toBeCloseTo(rms(d.map((x) => Math.abs(x) + 0.005)), 12);
    expect(v.relativeHalfWidth).toBeCloseTo(0.005, 12);
    expect(v.points).toBe(n);
    expect(v.status).toBe('notAdequate');
  });

  it('a model right but for noise is adequate at ±0.5 %, one 20 % too steep is not', () => {
    const v = profileVerdict(
      'profile.velocityX',
      'm/s',
      mean,
      y.map(() => 0.5),
      100,
      {
        noSlip: truth.map((t) => t * 1.2),
        firstOrder: truth,
      },
    );
    expect(statusOf(v, 'noSlip')).toBe('notAdequate');
    expect(statusOf(v, 'firstOrder')).toBe('adequate');
    expect(v.bestModel).toBe('firstOrder');
  });

  it('the same right model with ±5 % point half-widths is undecided: noise is not agreement', () => {
    const v = profileVerdict(
      'profile.velocityX',
      'm/s',
      mean,
      y.map(() => 5),
      100,
      { firstOrder: truth },
    );
    expect(v.status).toBe('undecided');
    expect(v.halfWidthToDecide).toBeGreaterThan(0);
    expect(v.halfWidthToDecide).toBeLessThan(0.02);
  });

  it('leaves out points without a value, and gives no verdict with fewer than two', () => {
    const holes = mean.slice();
    holes[0] = NaN;
    const model = truth.slice();
    model[1] = NaN;
    const v = profileVerdict(
      'p',
      'K',
      holes,
      y.map(() => 0.5),
      100,
      { noSlip: model },
    );
    expect(v.points).toBe(n - 2);
    expect(profileVerdict('p', 'K', [1, NaN], [1, 1], 1, { noSlip: [1, 1] }).status).toBe('noData');
  });
});

/** A comparison holding one verdict, as headline.ts and verdictCsv read it. */
function comparisonWith(v: ReturnType<typeof integralVerdict>, values: Record<string, number>): ContinuumComparison {
  return {
    recognised: true,
    predictions: { headline: v.quantity },
    continuum: Object.fromEntries(Object.entries(values).map(([m, x]) => [m, { [v.quantity]: x }])),
    verdict: { [v.quantity]: v },
  } as unknown as ContinuumComparison;
}

describe('verdictHeadline(): one answer first', () => {
  const key = 'walls.bottom.shearStress';
  const headline = (dsmc: { mean: number; ci95: number }, values: Record<string, number>, na = {}) =>
    verdictHeadline(comparisonWith(integralVerdict(key, 'Pa', dsmc, values, {}, na), values));

  it('names the simplest adequate model', () => {
    expect(headline({ mean: 100, ci95: 0.5 }, { noSlip: 110, firstOrder: 100.3 }).text).toBe(
      'For the wall shear stress, first-order slip is the simplest adequate model: within ±2.0 % of DSMC (deviation 0.3 %, DSMC ±0.5 %).',
    );
  });

  it('adds when a simpler model might do too, and what would decide', () => {
    const h = headline({ mean: 100, ci95: 1.5 }, { noSlip: 102.5, firstOrder: 100.2 });
    expect(h.text).toMatch(/; whether no-slip would do too is undecided: DSMC ±0\.5 % would decide \(about 9\.0 times/);
  });

  it("says the run cannot decide yet, the half-width that would, and the time from the run's own error scaling", () => {
    const h = headline({ mean: 100, ci95: 15 }, { noSlip: 109, firstOrder: 99.5 });
    expect(h.text).toMatch(
      /^This run cannot decide yet which model is adequate for the wall shear stress: DSMC ±15 % cannot tell no-slip from first-order slip, which differ by 9\.5 %/,
    );
    // Needed: first-order |2 − 0.5| = 1.5 % (no-slip: 7 %); factor (15/1.5)² = 100; 99 × 10 s sampled.
    expect(h.halfWidthToDecide).toBeCloseTo(0.015, 12);
    expect(h.samplingFactor).toBeCloseTo(100, 8);
    expect(extraTimeText(h, 10)).toBe("Expected time to decide: about 17 min more sampling at this run's speed.");
    expect(sampledWallSeconds(20, 300, 600)).toBe(10);
  });

  it('says only the kinetic result holds when every model is off, or none applies', () => {
    expect(headline({ mean: 100, ci95: 1 }, { noSlip: 130 }).text).toBe(
      'Only the kinetic (DSMC) result holds for the wall shear stress: every model applicable here is off by more than ±2.0 % (DSMC ±1.0 %).',
    );
    const h = headline({ mean: 100, ci95: 1 }, { noSlip: 100 }, { noSlip: 'a short tube' });
    expect(h.text).toBe(
      'Only the kinetic (DSMC) result holds for the wall shear stress: no continuum model applies here. Not applicable here: no-slip (a short tube).',
    );
    expect(extraTimeText(h, 10)).toBe('');
  });
});

describe('verdictCsv()', () => {
  it('one row per quantity and model with status, deviation and half-width; units in the headers', () => {
    const v = integralVerdict(
      'walls.bottom.shearStress',
      'Pa',
      { mean: 100, ci95: 0.5 },
      { noSlip: 110, firstOrder: 100.3 },
    );
    const lines = verdictCsv(comparisonWith(v, { noSlip: 110, firstOrder: 100.3 }))
      .trim()
      .split('\n');
    expect(lines[0]).toBe(
      'quantity,unit,model,status,quantity status,best model,model value [unit],DSMC mean [unit],scale [unit],deviation [1],deviation lower [1],deviation upper [1],DSMC half-width [1],tolerance [1],half-width to decide [1],reason',
    );
    expect(lines).toHaveLength(3);
    expect(lines[1]).toMatch(/^walls\.bottom\.shearStress,Pa,noSlip,notAdequate,adequate,firstOrder,110,100,100,0\.1,/);
    expect(lines[2]).toMatch(/^walls\.bottom\.shearStress,Pa,firstOrder,adequate,adequate,firstOrder,100\.3,100,/);
  });
});

describe('caseApplicability: models only where they apply', () => {
  const argon = gasStateFromModel(modelFromSpecies('Ar', 'HS'), 100, 273);

  it('long-duct models need L/R or L/H of at least 50', () => {
    expect(ductApplicability('tube', 10e-3, 1e-3, ['noSlip', 'freeMolecular']).notApplicable.noSlip).toMatch(
      /this tube is short \(L\/R = 10\.0 < 50\)/,
    );
    expect(ductApplicability('channel', 60e-6, 1e-6, ['noSlip']).notApplicable).toEqual({});
    expect(ductApplicability('tube', 1, 1, ['noSlip']).headline).toBe('flow.massFlowRate');
  });

  it('Couette: linear theory up to wall Mach number 0.5 (argon at 273 K: c = 307 m/s)', () => {
    expect(couetteApplicability(argon, 150).notApplicable).toEqual({});
    expect(couetteApplicability(argon, 200).notApplicable.firstOrder).toMatch(
      /wall Mach number \|ΔU\|\/c here is 0\.65/,
    );
    expect(couetteApplicability(argon, 100).headline).toBe('walls.bottom.shearStress');
  });

  it('Fourier: |ΔT|/T_mean ≤ 0.1 and the reference temperature near the mean', () => {
    expect(fourierApplicability(263, 283, 273).notApplicable).toEqual({});
    expect(fourierApplicability(200, 400, 300).notApplicable.noSlip).toMatch(/\|ΔT\|\/T_mean = 0\.667 > 0\.1/);
    expect(fourierApplicability(263, 283, 300).notApplicable.noSlip).toMatch(/reference temperature is 9\.89 %/);
  });

  it('cavity: Re ≤ 1000, the range its solver is checked at', () => {
    expect(cavityApplicability(1000).notApplicable).toEqual({});
    expect(cavityApplicability(3200).notApplicable.noSlip).toMatch(/Re = 3\.20e\+3 is above 1000/);
  });
});
