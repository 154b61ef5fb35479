import { describe, expect, it } from 'vitest';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { modelFromSpecies, viscosityMeanFreePathM, viscosityPaS } from '../../engine/gas/molecularModel';
import { pressureDrivenDuctFlow, type PressureDrivenDuctInput } from '../../engine/continuum/pressureDrivenDuct';
import { channelReducedFlowRate, tubeReducedFlowRate } from '../../engine/continuum/poiseuille';
import {
  CERCIGNANI_SECOND_ORDER,
  DEISSLER_SECOND_ORDER,
  KINETIC_BGK_SLIP,
  type ContinuumSlipModel,
} from '../../engine/continuum/slipCoefficients';
import { gasStateFromModel, equivalentPathOf, mostProbableSpeedOf } from '../../engine/continuum/gasState';

const relativeError = (actual: number, expected: number) => Math.abs(actual / expected - 1);
const ATM = 101325; // Pa, exact by definition

// Arkilic, Schmidt & Breuer 1997 (J. MEMS 6:167): helium, channel 52.25 µm × 1.33 µm × 7500 µm, outlet atmospheric,
// inlet 1.6–4.2 atm (published abstract, as in the reference notes §7). Temperature 300 K: our choice.
const helium = modelFromSpecies('He', 'VHS');
const T = 300;
const heliumGas = { viscosityPaS: viscosityPaS(helium, T), massKg: helium.massKg, temperatureK: T };
const arkilicChannel = { kind: 'channel', heightM: 1.33e-6, widthM: 52.25e-6, lengthM: 7500e-6 } as const;

/** The Arkilic formula as printed in the reference notes §7 (from memory), typed independently of the engine. */
function arkilicFormula(pin: number, pout: number, sigma: number, knOut: number): number {
  const { heightM: h, widthM: w, lengthM: l } = arkilicChannel;
  const rGas = K_B / helium.massKg;
  const ratio = pin / pout;
  return (
    ((h ** 3 * w * pout ** 2) / (24 * heliumGas.viscosityPaS * rGas * T * l)) *
    (ratio ** 2 - 1 + 12 * ((2 - sigma) / sigma) * knOut * (ratio - 1))
  );
}

function arkilic(pinAtm: number, slip: ContinuumSlipModel, accommodation = 1) {
  return pressureDrivenDuctFlow({
    gas: heliumGas,
    geometry: arkilicChannel,
    inletPressurePa: pinAtm * ATM,
    outletPressurePa: ATM,
    slip,
    accommodation,
  });
}

/** Local flow rate K p_o² (P + A + B/P)(−dP/dx) written from the momentum equation, with dp/dx by finite difference. */
function localFlowRate(input: PressureDrivenDuctInput, p: (x: number) => number, x: number, a1: number, a2: number) {
  const { gas } = input;
  const lengthM = input.geometry.lengthM;
  const dx = 1e-5 * lengthM;
  const dpdx = (p(x + dx) - p(x - dx)) / (2 * dx);
  const rho = (p(x) * gas.massKg) / (K_B * gas.temperatureK);
  const kn = (len: number) => viscosityMeanFreePathM(gas.viscosityPaS, p(x), gas.temperatureK, gas.massKg) / len;
  if (input.geometry.kind === 'channel') {
    const { heightM: h, widthM: w } = input.geometry;
    return ((rho * h ** 3 * w) / (12 * gas.viscosityPaS)) * (1 + 6 * a1 * kn(h) + 12 * a2 * kn(h) ** 2) * -dpdx;
  }
  const r = input.geometry.radiusM;
  return ((rho * Math.PI * r ** 4) / (8 * gas.viscosityPaS)) * (1 + 4 * a1 * kn(r) + 4 * a2 * kn(r) ** 2) * -dpdx;
}

describe('pressureDrivenDuctFlow(), Arkilic channel', () => {
  it('first-order Maxwell slip reproduces the Arkilic, Schmidt & Breuer 1997 formula (reference notes §7, from memory)', () => {
    for (const [pin, sigma] of [
      [1.6, 1],
      [2.5, 1],
      [4.2, 0.8],
    ] as const) {
      const s = arkilic(pin, { kind: 'firstOrder' }, sigma);
      const knOut = viscosityMeanFreePathM(heliumGas.viscosityPaS, ATM, T, helium.massKg) / arkilicChannel.heightM;
      expect(relativeError(s.outletKnudsen, knOut)).toBeLessThan(1e-13);
      expect(relativeError(s.massFlowRateKgPerS, arkilicFormula(pin * ATM, ATM, sigma, knOut))).toBeLessThan(1e-13);
    }
  });

  it('no slip is the Arkilic formula at Kn_o = 0 (compressible Poiseuille law)', () => {
    expect(
      relativeError(arkilic(2.5, { kind: 'noSlip' }).massFlowRateKgPerS, arkilicFormula(2.5 * ATM, ATM, 1, 0)),
    ).toBeLessThan(1e-13);
  });

  it('slip raises the flow of the helium channel by 12 Kn_o/(Π + 1) over no slip (the Arkilic formula’s ratio)', () => {
    const slip = arkilic(2.5, { kind: 'firstOrder' });
    // Slip-flow regime at the outlet (0.001 < Kn < 0.1–0.2; reference notes §9, common practice).
    expect(slip.outletKnudsen).toBeGreaterThan(0.05);
    expect(slip.outletKnudsen).toBeLessThan(0.2);
    const gain = slip.massFlowRateKgPerS / arkilic(2.5, { kind: 'noSlip' }).massFlowRateKgPerS - 1;
    expect(gain).toBeCloseTo((12 * slip.outletKnudsen) / 3.5, 12);
  });

  it('p(x) meets p_in and p_out and matches Arkilic’s closed-form profile P² + 12Kn_o P linear in x', () => {
    const s = arkilic(3, { kind: 'firstOrder' });
    const l = arkilicChannel.lengthM;
    expect(s.pressurePa(0)).toBe(3 * ATM);
    expect(s.pressurePa(l)).toBe(ATM);
    const kn = s.outletKnudsen;
    for (const xi of [0.1, 0.5, 0.9]) {
      // P = −6Kn_o + sqrt(36Kn_o² + (1 − x̃)(Π² + 12Kn_oΠ) + x̃(1 + 12Kn_o)) (Arkilic et al. 1997; from memory).
      const expected = -6 * kn + Math.sqrt(36 * kn * kn + (1 - xi) * (9 + 36 * kn) + xi * (1 + 12 * kn));
      expect(relativeError(s.pressurePa(xi * l) / ATM, expected)).toBeLessThan(1e-13);
    }
    // Compressibility bends the profile above the straight line between the ends (Arkilic et al. 1997).
    expect(s.pressurePa(l / 2)).toBeGreaterThan(2 * ATM);
  });
});

describe('pressureDrivenDuctFlow(), every model and both geometries', () => {
  const argon = gasStateFromModel(modelFromSpecies('Ar', 'HS'), 100, 300);
  const gas = { viscosityPaS: argon.viscosityPaS, massKg: argon.massKg, temperatureK: 300 };
  const models: [ContinuumSlipModel, number, number][] = [
    [{ kind: 'noSlip' }, 0, 0],
    [{ kind: 'firstOrder' }, 1.25, 0],
    [{ kind: 'secondOrder', coefficients: DEISSLER_SECOND_ORDER }, 1, 9 / 8],
  ];

  it('the local flow rate from the pressure profile is the same ṁ everywhere (mass conservation, to 1e-6)', () => {
    for (const geometry of [
      { kind: 'channel', heightM: 50e-6, widthM: 1e-3, lengthM: 5e-3 },
      { kind: 'tube', radiusM: 30e-6, lengthM: 3e-3 },
    ] as const) {
      for (const [slip, a1, a2] of models) {
        const input = {
          gas,
          geometry,
          inletPressurePa: 400,
          outletPressurePa: 100,
          slip,
          accommodation: slip.kind === 'firstOrder' ? 2 / 2.25 : 1,
        };
        const s = pressureDrivenDuctFlow(input);
        expect(s.pressurePa(0)).toBe(400);
        expect(s.pressurePa(geometry.lengthM)).toBe(100);
        for (const xi of [0.05, 0.3, 0.6, 0.95]) {
          const local = localFlowRate(input, s.pressurePa, xi * geometry.lengthM, a1, a2);
          expect(relativeError(local, s.massFlowRateKgPerS)).toBeLessThan(1e-6);
        }
      }
    }
  });

  it('a small pressure difference gives the force-driven G_P at the mean pressure (ṁ = (H²W/v0) G_P Δp/L; tube (πR³/v0) G_P Δp/L)', () => {
    const pMean = 20;
    const dp = 0.002;
    const ell = equivalentPathOf({ ...argon, pressurePa: pMean });
    const v0 = mostProbableSpeedOf(argon);
    for (const slip of [
      { kind: 'firstOrder', coefficient: KINETIC_BGK_SLIP },
      { kind: 'secondOrder', coefficients: CERCIGNANI_SECOND_ORDER },
    ] as const) {
      const h = 5 * ell;
      const ch = pressureDrivenDuctFlow({
        gas,
        geometry: { kind: 'channel', heightM: h, widthM: 1, lengthM: 1 },
        inletPressurePa: pMean + dp / 2,
        outletPressurePa: pMean - dp / 2,
        slip,
      });
      expect(relativeError(ch.massFlowRateKgPerS, ((h * h) / v0) * dp * channelReducedFlowRate(5, slip))).toBeLessThan(
        1e-7,
      );
      const tb = pressureDrivenDuctFlow({
        gas,
        geometry: { kind: 'tube', radiusM: h, lengthM: 1 },
        inletPressurePa: pMean + dp / 2,
        outletPressurePa: pMean - dp / 2,
        slip,
      });
      expect(
        relativeError(tb.massFlowRateKgPerS, ((Math.PI * h ** 3) / v0) * dp * tubeReducedFlowRate(5, slip)),
      ).toBeLessThan(1e-7);
    }
  });

  it('slip tends to no slip as Kn_o → 0: outlet at 100 atm in the 1.33 µm helium channel (Kn_o ≈ 0.0015) changes ṁ by < 1 %', () => {
    const run = (slip: ContinuumSlipModel) =>
      pressureDrivenDuctFlow({
        gas: heliumGas,
        geometry: arkilicChannel,
        inletPressurePa: 200 * ATM,
        outletPressurePa: 100 * ATM,
        slip,
      });
    const s = run({ kind: 'firstOrder' });
    expect(s.outletKnudsen).toBeLessThan(2e-3);
    const gain = s.massFlowRateKgPerS / run({ kind: 'noSlip' }).massFlowRateKgPerS - 1;
    expect(gain).toBeGreaterThan(0);
    expect(gain).toBeLessThan(0.01);
  });

  it('the mean velocity is ṁ/(ρA) and rises towards the outlet as the gas expands', () => {
    const s = arkilic(3, { kind: 'firstOrder' });
    const { heightM: h, widthM: w, lengthM: l } = arkilicChannel;
    const rhoOut = (ATM * helium.massKg) / (K_B * T);
    expect(relativeError(s.meanVelocityMPerS(l), s.massFlowRateKgPerS / (rhoOut * h * w))).toBeLessThan(1e-13);
    expect(s.meanVelocityMPerS(l) / s.meanVelocityMPerS(0)).toBeCloseTo(3, 12);
  });

  it('reverse flow: p_in < p_out gives a negative ṁ and a monotone profile', () => {
    const s = pressureDrivenDuctFlow({
      gas: heliumGas,
      geometry: { kind: 'tube', radiusM: 1e-6, lengthM: 1e-3 },
      inletPressurePa: ATM,
      outletPressurePa: 2 * ATM,
      slip: { kind: 'secondOrder', coefficients: CERCIGNANI_SECOND_ORDER },
    });
    expect(s.massFlowRateKgPerS).toBeLessThan(0);
    expect(s.pressurePa(2e-4)).toBeLessThan(s.pressurePa(8e-4));
  });

  it('refuses non-positive pressures and sizes, naming the field', () => {
    expect(() => arkilic(0, { kind: 'noSlip' })).toThrow(/inlet pressure \(Pa\) = 0/);
    expect(() =>
      pressureDrivenDuctFlow({
        gas: heliumGas,
        geometry: { kind: 'tube', radiusM: 0, lengthM: 1 },
        inletPressurePa: 2,
        outletPressurePa: 1,
        slip: { kind: 'noSlip' },
      }),
    ).toThrow(/tube radius \(m\) = 0/);
  });
});
