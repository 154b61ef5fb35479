/**
 * The verdict rules of engine/continuum/verdict.ts on constructed inputs, one test per branch. The thresholds are
 * the module's documented ones (tolerance 2 %, kinetic above 10 %; common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_TOLERANCE, KINETIC_THRESHOLD, integralVerdict, profileVerdict } from '../../engine/report/verdict';

const dsmc = { mean: 100, ci95: 1.1 };

describe('integralVerdict()', () => {
  it('says "no-slip within DSMC error" when no-slip deviates by less than the half-width, with both numbers', () => {
    const v = integralVerdict('walls.top.shearStress', 'Pa', dsmc, { noSlip: 100.8, firstOrder: 95 });
    expect(v.category).toBe('withinError');
    expect(v.bestModel).toBe('noSlip');
    expect(v.deviation).toBeCloseTo(0.008, 12);
    expect(v.text).toBe('no-slip within DSMC error (deviation 0.8 %, DSMC ±1.1 %)');
    expect(v.models[0].normalizedDeviation).toBeCloseTo(0.8 / 1.1, 12);
  });

  it('says "no-slip adequate" when it is outside the half-width but inside the 2 % tolerance', () => {
    const v = integralVerdict('q', 'W/m^2', dsmc, { noSlip: 101.5 });
    expect(v.category).toBe('adequate');
    expect(v.threshold).toBe(DEFAULT_TOLERANCE);
    expect(v.text).toBe('no-slip adequate (deviation 1.5 %, within the 2.0 % tolerance; DSMC ±1.1 %)');
  });

  it('names the simplest adequate model and how far off the simpler ones are', () => {
    const v = integralVerdict('q', 'Pa', dsmc, { noSlip: 111, firstOrder: 101.2, secondOrder: 100.1 });
    expect(v.bestModel).toBe('firstOrder');
    expect(v.text).toBe(
      'first-order slip adequate, no-slip not (no-slip off by 11 %; first-order slip 1.2 %, DSMC ±1.1 %)',
    );
    const w = integralVerdict('q', 'Pa', dsmc, { noSlip: 140, firstOrder: 92, secondOrder: 100.5 });
    expect(w.text).toBe(
      'second-order slip adequate, first-order slip and no-slip not (first-order slip off by 8.0 %; no-slip off by 40 %; second-order slip 0.5 %, DSMC ±1.1 %)',
    );
    const u = integralVerdict('q', '1', dsmc, {
      noSlip: 60,
      firstOrder: 85,
      secondOrder: 90,
      unified: 99,
      freeMolecular: 130,
    });
    expect(u.bestModel).toBe('unified');
    const f = integralVerdict('q', '1', dsmc, { noSlip: 400, firstOrder: 150, freeMolecular: 99.5 });
    expect(f.text).toMatch(/^free-molecular limit adequate, first-order slip and no-slip not/);
  });

  it('says kinetic effects dominate when every continuum model is off by more than 10 %, naming the closest', () => {
    const v = integralVerdict('q', 'Pa', dsmc, { noSlip: 300, firstOrder: 112, secondOrder: 89, freeMolecular: 160 });
    expect(KINETIC_THRESHOLD).toBe(0.1);
    expect(v.category).toBe('kinetic');
    expect(v.bestModel).toBe('secondOrder');
    expect(v.deviation).toBeCloseTo(-0.11, 12);
    expect(v.text).toBe(
      'continuum models off by more than 10 %: kinetic effects dominate (closest: second-order slip off by 11 %; DSMC ±1.1 %)',
    );
  });

  it('says no model is within tolerance when the closest is off by more than the threshold but not by 10 %', () => {
    const v = integralVerdict('q', 'Pa', dsmc, { noSlip: 130, firstOrder: 106, secondOrder: 96.6 });
    expect(v.category).toBe('noneAdequate');
    expect(v.bestModel).toBe('secondOrder');
    expect(v.text).toBe(
      'no model within tolerance: closest is second-order slip off by 3.4 % (tolerance 2.0 %, DSMC ±1.1 %)',
    );
  });

  it('uses the DSMC half-width as the threshold when it is larger than the tolerance, and a user tolerance when given', () => {
    const wide = integralVerdict('q', 'Pa', { mean: 100, ci95: 8 }, { noSlip: 107 });
    expect(wide.threshold).toBeCloseTo(0.08, 12);
    expect(wide.category).toBe('withinError');
    const loose = integralVerdict('q', 'Pa', dsmc, { noSlip: 104.5 }, { tolerance: 0.05 });
    expect(loose.category).toBe('adequate');
    expect(loose.text).toContain('within the 5.0 % tolerance');
  });

  it('falls back to the tolerance and says so when DSMC has no half-width', () => {
    const v = integralVerdict('q', 'Pa', { mean: 100, ci95: NaN }, { noSlip: 101 });
    expect(v.threshold).toBe(DEFAULT_TOLERANCE);
    expect(v.category).toBe('adequate');
    expect(v.text).toBe('no-slip adequate (deviation 1.0 %, within the 2.0 % tolerance; DSMC error not available)');
    expect(Number.isNaN(v.models[0].normalizedDeviation)).toBe(true);
  });

  it('gives no verdict without a DSMC value or a prediction', () => {
    expect(integralVerdict('q', 'Pa', { mean: NaN, ci95: 1 }, { noSlip: 1 }).category).toBe('noData');
    expect(integralVerdict('q', 'Pa', { mean: 0, ci95: 1 }, { noSlip: 1 }).category).toBe('noData');
    const none = integralVerdict('q', 'Pa', dsmc, {});
    expect(none.category).toBe('noData');
    expect(none.bestModel).toBeNull();
  });
});

describe('profileVerdict()', () => {
  const n = 40;
  const y = Array.from({ length: n }, (_, i) => (i + 0.5) / n);
  const truth = y.map((s) => 100 * (s - 0.5));
  // Deterministic "noise" of RMS 0.5 (about half-width/1.96 for a half-width of 1): a model that is right but for it.
  const noise = y.map((_, i) => 0.5 * Math.SQRT2 * Math.sin(2.3 * i + 0.4));
  const mean = truth.map((t, i) => t + noise[i]);
  const ci95 = y.map(() => 1);

  it('computes the RMS and max relative deviation over the points, the RMS half-width, and the normalized RMS', () => {
    const biased = truth.map((t) => t + 3);
    const v = profileVerdict('profile.velocityX', 'm/s', mean, ci95, 100, { noSlip: biased });
    const d = biased.map((b, i) => (b - mean[i]) / 100);
    expect(v.models[0].deviation).toBeCloseTo(Math.sqrt(d.reduce((a, x) => a + x * x, 0) / n), 12);
    expect(v.models[0].maxDeviation).toBeCloseTo(Math.max(...d.map(Math.abs)), 12);
    expect(v.models[0].normalizedDeviation).toBeCloseTo(100 * v.models[0].deviation, 10);
    expect(v.relativeHalfWidth).toBeCloseTo(0.01, 12);
    expect(v.points).toBe(n);
  });

  it('finds a model adequate that differs from DSMC by noise only, and one 10 % too steep (2.9 % RMS of the scale) not', () => {
    const v = profileVerdict('profile.velocityX', 'm/s', mean, ci95, 100, {
      noSlip: truth.map((t) => t * 1.1),
      firstOrder: truth,
    });
    expect(v.bestModel).toBe('firstOrder');
    expect(v.text).toMatch(
      /^first-order slip adequate, no-slip not \(no-slip off by 2\.9 % RMS, max 5\.\d %; first-order slip 0\.\d % RMS, DSMC ±1\.0 % RMS\)$/,
    );
  });

  it('leaves out points where DSMC or any model has no value, and gives no verdict with fewer than two', () => {
    const holes = mean.slice();
    holes[0] = NaN;
    const model = truth.slice();
    model[1] = NaN;
    const v = profileVerdict('p', 'K', holes, ci95, 100, { noSlip: model });
    expect(v.points).toBe(n - 2);
    const none = profileVerdict('p', 'K', [1, NaN], [1, 1], 1, { noSlip: [1, 1] });
    expect(none.category).toBe('noData');
  });

  it('calls a profile kinetic when every continuum model is off by more than 10 % of its scale', () => {
    const v = profileVerdict('profile.temperature', 'K', mean, ci95, 100, {
      noSlip: truth.map((t) => t + 30),
      firstOrder: truth.map((t) => t - 15),
      freeMolecular: truth.map(() => 0),
    });
    expect(v.category).toBe('kinetic');
    expect(v.text).toMatch(
      /^continuum models off by more than 10 %: kinetic effects dominate \(closest: first-order slip off by 15 % RMS, max 1\d %; DSMC ±1\.0 % RMS\)$/,
    );
  });
});
