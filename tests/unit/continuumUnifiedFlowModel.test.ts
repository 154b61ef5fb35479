import { describe, expect, it } from 'vitest';
import { modelFromSpecies } from '../../engine/gas/molecularModel';
import { equivalentPathOf, gasStateFromModel, mostProbableSpeedOf } from '../../engine/continuum/gasState';
import { channelReducedFlowRate, tubeReducedFlowRate } from '../../engine/continuum/poiseuille';
import {
  BESKOK_KARNIADAKIS_1999,
  rarefactionCorrection,
  unifiedFlow,
  unifiedFlowRateRatio,
  unifiedReducedFlowRate,
} from '../../engine/continuum/unifiedFlowModel';

const relativeError = (actual: number, expected: number) => Math.abs(actual / expected - 1);
const deltaOfKn = (kn: number) => Math.sqrt(Math.PI) / (2 * kn);

describe('Beskok & Karniadakis 1999 unified flow model', () => {
  it('carries the constants of the reference notes §6 (from memory): b = −1, α1 = 4, β = 0.4, channel α0 = 64/(15π)', () => {
    expect(BESKOK_KARNIADAKIS_1999.b).toBe(-1);
    expect(BESKOK_KARNIADAKIS_1999.alpha1).toBe(4);
    expect(BESKOK_KARNIADAKIS_1999.beta).toBe(0.4);
    expect(BESKOK_KARNIADAKIS_1999.alpha0.channel).toBeCloseTo(64 / (15 * Math.PI), 15);
    // α tends to α0 as Kn → ∞; the tube prefactor α0·2/π is the 128/(15π²) often quoted (from memory).
    expect(rarefactionCorrection('tube', 1e30)).toBeCloseTo(BESKOK_KARNIADAKIS_1999.alpha0.tube, 10);
    expect(BESKOK_KARNIADAKIS_1999.alpha0.tube * (2 / Math.PI)).toBeCloseTo(128 / (15 * Math.PI ** 2), 15);
  });

  it('as Kn → 0 it is first-order Maxwell slip (poiseuille.ts) up to a term of order Kn^1.4', () => {
    for (const geometry of ['channel', 'tube'] as const) {
      const firstOrder = (kn: number) =>
        geometry === 'channel'
          ? channelReducedFlowRate(deltaOfKn(kn), { kind: 'firstOrder' }) / (deltaOfKn(kn) / 6)
          : tubeReducedFlowRate(deltaOfKn(kn), { kind: 'firstOrder' }) / (deltaOfKn(kn) / 4);
      const gap = (kn: number) => unifiedFlowRateRatio(geometry, kn) - firstOrder(kn);
      expect(Math.abs(gap(1e-4))).toBeLessThan(1e-5);
      // αKn ∝ Kn^1.4 dominates the −cKn² of 1/(1 + Kn): a decade in Kn is a factor 10^1.4 = 25.1 (within 3 %).
      expect(relativeError(gap(1e-5) / gap(1e-6), 10 ** 1.4)).toBeLessThan(0.03);
    }
  });

  it('tube: Knudsen’s free-molecular G_P = 8/(3√π) = 1.50451 as Kn → ∞ (reference notes §3), within 2e-4 at Kn = 1e8', () => {
    expect(relativeError(unifiedReducedFlowRate('tube', deltaOfKn(1e8)), 8 / (3 * Math.sqrt(Math.PI)))).toBeLessThan(
      2e-4,
    );
  });

  it('tube: within 1 % of the linearized BGK flow rate from δ = 0.01 to 10 (reference notes §3: published and computed)', () => {
    // Karniadakis, Beskok & Aluru 2005 Table 15.5 after Cercignani & Sernagiotto 1966 (published), and δ = 1, 10 computed.
    const bgk: [number, number][] = [
      [0.01, 1.4768],
      [0.02, 1.4608],
      [0.04, 1.4391],
      [0.08, 1.4131],
      [1, 1.45829],
      [10, 3.56416],
    ];
    for (const [delta, gp] of bgk) {
      expect(relativeError(unifiedReducedFlowRate('tube', delta), gp)).toBeLessThan(0.01);
    }
  });

  it('channel: bounded as Kn → ∞ (G_P → 7√π α0/12 = 1.404, derived from the formula), unlike the BGK rate (3.04965 at δ = 0.01)', () => {
    const limit = (7 * Math.sqrt(Math.PI) * BESKOK_KARNIADAKIS_1999.alpha0.channel) / 12;
    expect(relativeError(unifiedReducedFlowRate('channel', deltaOfKn(1e10)), limit)).toBeLessThan(1e-4);
    // The gap to the kinetic solution (reference notes §2, computed) that the file header warns about.
    expect(unifiedReducedFlowRate('channel', 0.01)).toBeLessThan(0.5 * 3.04965);
    expect(relativeError(unifiedReducedFlowRate('channel', 1), 1.53868)).toBeGreaterThan(0.15);
    expect(relativeError(unifiedReducedFlowRate('channel', 100), 17.6933)).toBeLessThan(0.01);
  });

  it('accommodation multiplies the slip term by (2 − σ)/σ', () => {
    const kn = 0.05;
    const alpha = rarefactionCorrection('channel', kn);
    expect(unifiedFlowRateRatio('channel', kn, 0.5)).toBeCloseTo((1 + alpha * kn) * (1 + (6 * 3 * kn) / (1 + kn)), 14);
  });

  it('unifiedFlow() in SI: ṁ = (πR³/v0)(−dp/dx)G_P for a tube and (H²/v0)(−dp/dx)G_P per depth for a channel', () => {
    const gas = gasStateFromModel(modelFromSpecies('N2', 'VHS'), 50, 295);
    const r = 2 * equivalentPathOf(gas);
    const tube = unifiedFlow({ gas, geometry: { kind: 'tube', radiusM: r }, pressureGradientPaPerM: 1e3 });
    expect(tube.kind).toBe('tube');
    expect(tube.rarefactionParameter).toBeCloseTo(2, 12);
    if (tube.kind !== 'tube') throw new Error('unreachable');
    expect(
      relativeError(
        tube.massFlowRateKgPerS,
        ((Math.PI * r ** 3) / mostProbableSpeedOf(gas)) * 1e3 * unifiedReducedFlowRate('tube', 2),
      ),
    ).toBeLessThan(1e-12);
    const channel = unifiedFlow({ gas, geometry: { kind: 'channel', heightM: r }, pressureGradientPaPerM: 1e3 });
    if (channel.kind !== 'channel') throw new Error('unreachable');
    expect(
      relativeError(
        channel.massFlowRateKgPerSM,
        ((r * r) / mostProbableSpeedOf(gas)) * 1e3 * unifiedReducedFlowRate('channel', 2),
      ),
    ).toBeLessThan(1e-12);
    expect(() => unifiedFlow({ gas, geometry: { kind: 'tube', radiusM: -1 }, pressureGradientPaPerM: 1 })).toThrow(
      /tube radius \(m\) = -1/,
    );
  });
});
