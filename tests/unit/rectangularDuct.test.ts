// No-slip Poiseuille flow in a rectangle (engine/continuum/rectangularDuct.ts), against its known constants.
import { describe, expect, it } from 'vitest';
import {
  rectangleFlowFactor,
  rectangleNoSlipFlowPerGradient,
  rectangleNoSlipReducedFlowRate,
} from '../../engine/continuum/rectangularDuct';

describe('rectangular duct, no slip', () => {
  it('square duct: ∫u dA = 0.035144·a⁴(−dp/dx)/μ (common closed form; the project reference notes §10)', () => {
    const q = rectangleNoSlipFlowPerGradient(1, 1, 1);
    expect(q).toBeCloseTo(0.035144, 6);
  });

  it('a wide duct tends to the planar channel, with the leading correction 1 − 0.630 H/W (reference notes §10)', () => {
    // For W ≫ H every tanh is 1: the correction is (192/π⁵)·Σ_{k odd} 1/k⁵ = (192/π⁵)·(31/32)·ζ(5), ζ(5) = 1.0369277551
    // (a standard constant), i.e. 0.630247; the remaining terms are exponentially small in W/H.
    const c = (192 / Math.PI ** 5) * (31 / 32) * 1.0369277551;
    expect(c).toBeCloseTo(0.63025, 5);
    for (const r of [0.01, 0.02, 0.05]) expect(rectangleFlowFactor(r) / (1 - c * r)).toBeCloseTo(1, 9);
    expect(rectangleNoSlipReducedFlowRate(60, 1e-6)).toBeCloseTo(10, 4);
  });

  it('refuses an aspect ratio outside (0, 1], naming it', () => {
    expect(() => rectangleFlowFactor(0)).toThrow(/aspect ratio H\/W = 0/);
    expect(() => rectangleFlowFactor(1.5)).toThrow(/at most 1/);
  });
});
