import { describe, expect, it } from 'vitest';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import {
  knudsenFromRarefaction,
  modelFromSpecies,
  viscosityMeanFreePathM,
  viscosityPaS,
} from '../../engine/gas/molecularModel';
import { SPECIES } from '../../engine/gas/species';
import {
  convertMeanFreePath,
  equivalentFreePath,
  equivalentFromViscosityPath,
  hardSphereFromViscosityPath,
  hardSphereMeanFreePath,
  knudsenNumber,
  meanFreePathOfKind,
  pathPerViscosityPath,
  rarefactionOf,
  viscosityFromEquivalentPath,
  viscosityFromHardSpherePath,
  viscosityMeanFreePath,
  type EquivalentFreePath,
} from '../../engine/continuum/meanFreePath';

const argon = SPECIES.Ar;
const T = 273;
const p = 10; // Pa
const muAr = argon.referenceViscosityPaS;

describe('mean free path definitions', () => {
  it('viscosityMeanFreePath() is the λ of engine/gas/molecularModel.ts', () => {
    expect(viscosityMeanFreePath(muAr, p, T, argon.massKg)).toBe(viscosityMeanFreePathM(muAr, p, T, argon.massKg));
  });

  it('λ = ℓ·√π/2 (Sharipov & Seleznev 1998 notation; published) for argon at 273 K and 10 Pa', () => {
    const lambda = viscosityMeanFreePath(muAr, p, T, argon.massKg);
    const ell = equivalentFreePath(muAr, p, T, argon.massKg);
    expect(lambda / ell).toBeCloseTo(Math.sqrt(Math.PI) / 2, 14);
    expect(viscosityFromEquivalentPath(ell)).toBeCloseTo(lambda, 18);
    expect(equivalentFromViscosityPath(lambda)).toBeCloseTo(ell, 18);
  });

  it('ℓ = μ v0/p with v0 = sqrt(2kT/m) evaluated independently', () => {
    const v0 = Math.sqrt((2 * K_B * T) / argon.massKg);
    expect(equivalentFreePath(muAr, p, T, argon.massKg) / ((muAr * v0) / p)).toBeCloseTo(1, 14);
  });

  it('knudsenNumber(λ, L) = √π/(2δ) with δ = L/ℓ (reference notes, notation paragraph; published)', () => {
    const L = 1e-3;
    const lambda = viscosityMeanFreePath(muAr, p, T, argon.massKg);
    const delta = rarefactionOf(equivalentFreePath(muAr, p, T, argon.massKg), L);
    expect(knudsenNumber(lambda, L)).toBeCloseTo(Math.sqrt(Math.PI) / (2 * delta), 14);
    expect(knudsenNumber(lambda, L)).toBeCloseTo(knudsenFromRarefaction(delta), 14);
  });

  it('a hard-sphere gas has λ/λ_HS = 0.998, i.e. μ = 0.499 ρ c̄ λ_HS (Chapman & Cowling; from memory)', () => {
    // λ from the Tenuis hard-sphere viscosity law, λ_HS = 1/(√2 π d² n) from the same model's diameter.
    const hs = modelFromSpecies('Ar', 'HS');
    const n = p / (K_B * T);
    const lambda = viscosityMeanFreePath(viscosityPaS(hs, T), p, T, hs.massKg);
    const lambdaHs = hardSphereMeanFreePath(hs.referenceDiameterM, n);
    // 0.499 is given to three figures: ±0.0005 in it is ±0.001 in the ratio.
    expect(Math.abs(lambda / lambdaHs - 0.499 / 0.5)).toBeLessThanOrEqual(0.001);
    expect(viscosityFromHardSpherePath(lambdaHs) / lambda).toBeCloseTo(1, 12);
    expect(hardSphereFromViscosityPath(lambda) / lambdaHs).toBeCloseTo(1, 12);
  });

  it('convertMeanFreePath() round-trips through every definition', () => {
    const lambda = viscosityMeanFreePath(muAr, p, T, argon.massKg);
    const viaHs = convertMeanFreePath(
      convertMeanFreePath(lambda, 'viscosity', 'hardSphere'),
      'hardSphere',
      'equivalent',
    );
    expect(viaHs).toBeCloseTo(equivalentFromViscosityPath(lambda), 18);
    expect(pathPerViscosityPath('equivalent')).toBeCloseTo(2 / Math.sqrt(Math.PI), 15);
  });

  it('the definitions are distinct types (checked by tsc over tests/)', () => {
    const ell: EquivalentFreePath = equivalentFreePath(muAr, p, T, argon.massKg);
    // @ts-expect-error an equivalent free path is not a viscosity mean free path
    const kn = knudsenNumber(ell, 1);
    // @ts-expect-error a bare number is not a mean free path
    const kn2 = knudsenNumber(1e-3, 1);
    // @ts-expect-error `from` must name the definition the value carries
    convertMeanFreePath(ell, 'viscosity', 'hardSphere');
    expect(kn).toBeGreaterThan(0);
    expect(kn2).toBe(1e-3);
  });

  it('meanFreePathOfKind() refuses non-positive and non-finite lengths', () => {
    expect(() => meanFreePathOfKind('viscosity', 0)).toThrow(/viscosity mean free path \(m\) = 0/);
    expect(() => meanFreePathOfKind('hardSphere', Number.NaN)).toThrow(/must be a finite number > 0/);
  });
});
