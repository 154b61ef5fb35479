// The equivalence test of engine/report/equivalence.ts on constructed intervals: every branch, and the edges.
// The rule is Schuirmann's two one-sided tests (1987, J. Pharmacokinet. Biopharm. 15:657) applied to the DSMC 95 %
// interval: adequate when the interval of the deviation lies wholly inside ±ε, not adequate when wholly outside.
import { describe, expect, it } from 'vitest';
import {
  extraSamplingToReach,
  integralEquivalence,
  neededHalfWidth,
  profileEquivalence,
  statusOfBounds,
} from '../../engine/report/equivalence';

const EPS = 0.02;

describe('integralEquivalence()', () => {
  it('adequate when the whole interval lies inside ±ε', () => {
    expect(integralEquivalence(0.005, 0.01, EPS).status).toBe('adequate');
    expect(integralEquivalence(-0.005, 0.01, EPS).status).toBe('adequate');
  });
  it('not adequate when the whole interval lies outside ±ε, on either side', () => {
    expect(integralEquivalence(0.05, 0.01, EPS).status).toBe('notAdequate');
    expect(integralEquivalence(-0.05, 0.01, EPS).status).toBe('notAdequate');
  });
  it('undecided when the interval straddles ±ε (the issue example: DSMC ±15 %, models 9 % apart)', () => {
    const r = integralEquivalence(0.084, 0.15, EPS);
    expect(r.status).toBe('undecided');
    expect(r.halfWidthToDecide).toBeCloseTo(0.064, 12);
  });
  it('a deviation of 0 with a wide interval is undecided, never a pass (noise is not agreement)', () => {
    expect(integralEquivalence(0, 0.15, EPS).status).toBe('undecided');
    expect(integralEquivalence(2.36, 6.59, EPS).status).toBe('undecided');
  });
  it('exactly on the edge from inside counts as adequate (closed tolerance band)', () => {
    // 0.5 + 1.5 = 2 exactly in binary-friendly units: use ε = 2, d = 0.5, h = 1.5.
    expect(integralEquivalence(0.5, 1.5, 2).status).toBe('adequate');
    expect(integralEquivalence(-0.5, 1.5, 2).status).toBe('adequate');
  });
  it('touching the edge from outside is undecided (the interval still meets the band)', () => {
    expect(integralEquivalence(3, 1, 2).status).toBe('undecided');
    expect(integralEquivalence(3, 0.999, 2).status).toBe('notAdequate');
  });
  it('without a DSMC half-width nothing is decided', () => {
    expect(integralEquivalence(0.001, NaN, EPS).status).toBe('undecided');
  });
  it('a zero half-width decides at once, on both sides of ε', () => {
    expect(integralEquivalence(0.019, 0, EPS).status).toBe('adequate');
    expect(integralEquivalence(0.021, 0, EPS).status).toBe('notAdequate');
  });
  it('decided results need no further precision; a deviation exactly at ε can never be decided', () => {
    expect(integralEquivalence(0.001, 0.001, EPS).halfWidthToDecide).toBe(0);
    expect(neededHalfWidth(2, 2)).toBe(Infinity);
    expect(integralEquivalence(2, 0.5, 2).halfWidthToDecide).toBe(Infinity);
  });
});

describe('statusOfBounds()', () => {
  it('refuses a non-positive tolerance or unknown bounds as undecided', () => {
    expect(statusOfBounds(0, 0.001, 0)).toBe('undecided');
    expect(statusOfBounds(NaN, 0.001, EPS)).toBe('undecided');
  });
});

describe('profileEquivalence()', () => {
  it('adequate when every point is close and precise', () => {
    const r = profileEquivalence([0.001, -0.002, 0.003], [0.005, 0.005, 0.005], EPS);
    expect(r.status).toBe('adequate');
    // Upper bound is the RMS of |d_i| + h_i: sqrt((0.006² + 0.007² + 0.008²)/3).
    expect(r.upperAbs).toBeCloseTo(Math.sqrt((0.006 ** 2 + 0.007 ** 2 + 0.008 ** 2) / 3), 14);
  });
  it('not adequate when the nearest ends are still beyond ε', () => {
    expect(profileEquivalence([0.1, -0.12, 0.09], [0.01, 0.01, 0.01], EPS).status).toBe('notAdequate');
  });
  it('undecided when the profile noise itself exceeds the tolerance, even with zero mean deviation', () => {
    const r = profileEquivalence([0, 0, 0], [0.05, 0.05, 0.05], EPS);
    expect(r.status).toBe('undecided');
    // Shrinking every h_i by one factor: decided (adequate) once the RMS half-width is below ε.
    expect(r.halfWidthToDecide).toBeCloseTo(EPS, 6);
  });
  it('an empty profile is undecided', () => {
    expect(profileEquivalence([], [], EPS).status).toBe('undecided');
  });
});

describe('extraSamplingToReach()', () => {
  it('scales the samples by (h/target)², error ∝ 1/√N', () => {
    const r = extraSamplingToReach(0.15, 0.05, 10);
    expect(r.factor).toBeCloseTo(9, 12);
    expect(r.extraSeconds).toBeCloseTo(80, 12);
  });
  it('needs nothing more when the target is met, and never ends when no precision decides', () => {
    expect(extraSamplingToReach(0.01, 0.05, 10)).toEqual({ factor: 1, extraSeconds: 0 });
    expect(extraSamplingToReach(0.01, Infinity, 10).extraSeconds).toBe(Infinity);
  });
});
