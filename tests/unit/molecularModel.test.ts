import { describe, expect, it } from 'vitest';
import {
  AVOGADRO_PER_MOL,
  BOLTZMANN_J_PER_K as K_B,
  SCCM_REFERENCE_PRESSURE_PA,
  SCCM_REFERENCE_TEMPERATURE_K,
} from '../../engine/physics/constants';
import { SPECIES, SPECIES_IDS, type SpeciesId } from '../../engine/gas/species';
import {
  collisionCrossSectionM2,
  equilibriumCollisionRatePerParticle,
  knudsenFromRarefaction,
  meanCollisionTimeS,
  meanSpeedMPerS,
  modelFromSpecies,
  mostProbableSpeedMPerS,
  rarefactionFromKnudsen,
  rarefactionParameter,
  sigmaCrCoefficient,
  viscosityMeanFreePathM,
  viscosityPaS,
  type MolecularModel,
} from '../../engine/gas/molecularModel';

const relativeError = (actual: number, expected: number) => Math.abs(actual / expected - 1);

// Bird 1994, Molecular Gas Dynamics and the Direct Simulation of Gas Flows, Appendix A — FROM MEMORY (as copied in
// the project's reference notes §5). T_ref = 273 K; m in 1e-27 kg, μ_ref in 1e-5 Pa·s, d in 1e-10 m.
// Columns: ζ, m, μ_ref, ω, d_VHS, α_VSS, d_VSS.
const BIRD_TABLE: Record<SpeciesId, [number, number, number, number, number, number | null, number | null]> = {
  H2: [2, 3.34, 0.845, 0.67, 2.92, 1.35, 2.88],
  He: [0, 6.65, 1.865, 0.66, 2.33, 1.26, 2.3],
  Ne: [0, 33.5, 2.975, 0.66, 2.77, 1.31, 2.72],
  Ar: [0, 66.3, 2.117, 0.81, 4.17, 1.4, 4.11],
  Kr: [0, 139.1, 2.328, 0.8, 4.76, 1.32, 4.7],
  Xe: [0, 218.0, 2.107, 0.85, 5.74, 1.44, 5.65],
  N2: [2, 46.5, 1.656, 0.74, 4.17, 1.36, 4.11],
  O2: [2, 53.12, 1.919, 0.77, 4.07, 1.4, 4.01],
  air: [2, 48.1, 1.719, 0.77, 4.19, null, null],
  CO2: [2, 73.1, 1.38, 0.93, 5.62, 1.61, 5.54],
  CH4: [3, 26.63, 1.024, 0.84, 4.83, 1.6, 4.78],
};

// Deviation of Bird's first-approximation VHS/VSS law at T_ref from the tabulated μ_ref (computed from the table
// above): within 0.3 % for most gases, but H2 VHS +0.59 %, CH4 VHS +0.47 %, Ne VHS −0.35 % and Ne VSS +0.54 %, and
// H2 VSS +0.50 % — more than rounding d to 3 figures explains (±0.34 % in μ at most), so Bird's rows themselves
// disagree slightly. These gases get 0.6 %; the rest keep the 0.3 % claimed in the reference notes.
const LOOSE_VHS: readonly SpeciesId[] = ['H2', 'Ne', 'CH4'];
const LOOSE_VSS: readonly SpeciesId[] = ['H2', 'Ne'];

describe('constants', () => {
  it('are the exact SI 2019 values and 0 °C / 1 atm for sccm', () => {
    // SI brochure 9th ed. (2019), exact by definition — published.
    expect(K_B).toBe(1.380649e-23);
    expect(AVOGADRO_PER_MOL).toBe(6.02214076e23);
    // Common practice for sccm.
    expect(SCCM_REFERENCE_TEMPERATURE_K).toBe(273.15);
    expect(SCCM_REFERENCE_PRESSURE_PA).toBe(101325);
  });
});

describe('SPECIES', () => {
  it('matches Bird 1994 Appendix A (from memory) row by row, in SI units', () => {
    expect([...SPECIES_IDS].sort()).toEqual(Object.keys(BIRD_TABLE).sort());
    for (const id of SPECIES_IDS) {
      const [zeta, m, mu, w, dVhs, alpha, dVss] = BIRD_TABLE[id];
      const s = SPECIES[id];
      expect(s.id).toBe(id);
      expect(s.rotationalDof).toBe(zeta);
      expect(relativeError(s.massKg, m * 1e-27)).toBeLessThan(1e-12);
      expect(s.referenceTemperatureK).toBe(273);
      expect(relativeError(s.referenceViscosityPaS, mu * 1e-5)).toBeLessThan(1e-12);
      expect(s.viscosityIndex).toBe(w);
      expect(relativeError(s.vhsDiameterM, dVhs * 1e-10)).toBeLessThan(1e-12);
      expect(s.vssScatteringExponent).toBe(alpha);
      if (dVss === null) expect(s.vssDiameterM).toBeNull();
      else expect(relativeError(s.vssDiameterM!, dVss * 1e-10)).toBeLessThan(1e-12);
      expect(s.source).toMatch(/Bird 1994.*from memory/);
    }
  });
});

describe('modelFromSpecies()', () => {
  it('throws a clear error for VSS air (no VSS row in Bird 1994 Appendix A)', () => {
    expect(() => modelFromSpecies('air', 'VSS')).toThrow(/air/);
  });

  it('HS is VHS with ω = 1/2 and α = 1, isotropic VHS has α = 1', () => {
    const hs = modelFromSpecies('N2', 'HS');
    expect(hs.viscosityIndex).toBe(0.5);
    expect(hs.scatteringExponent).toBe(1);
    expect(modelFromSpecies('N2', 'VHS').scatteringExponent).toBe(1);
    expect(modelFromSpecies('N2', 'VSS').scatteringExponent).toBe(1.36);
  });
});

describe('viscosityPaS()', () => {
  it('VHS at T_ref reproduces μ_ref within 0.3 % (0.6 % for H2, Ne, CH4): Bird 1994 table consistency', () => {
    for (const id of SPECIES_IDS) {
      const s = SPECIES[id];
      const tolerance = LOOSE_VHS.includes(id) ? 0.006 : 0.003;
      const mu = viscosityPaS(modelFromSpecies(id, 'VHS'), s.referenceTemperatureK);
      expect(relativeError(mu, s.referenceViscosityPaS), id).toBeLessThan(tolerance);
    }
  });

  it('VSS at T_ref reproduces μ_ref within 0.3 % (0.6 % for H2, Ne): Bird 1994 table consistency', () => {
    for (const id of SPECIES_IDS) {
      if (id === 'air') continue;
      const s = SPECIES[id];
      const tolerance = LOOSE_VSS.includes(id) ? 0.006 : 0.003;
      const mu = viscosityPaS(modelFromSpecies(id, 'VSS'), s.referenceTemperatureK);
      expect(relativeError(mu, s.referenceViscosityPaS), id).toBeLessThan(tolerance);
    }
  });

  it('HS at T_ref is 1.016034 μ_ref (Chapman & Cowling higher-approximation factor, published)', () => {
    for (const id of SPECIES_IDS) {
      const s = SPECIES[id];
      const mu = viscosityPaS(modelFromSpecies(id, 'HS'), s.referenceTemperatureK);
      expect(relativeError(mu, 1.016034 * s.referenceViscosityPaS), id).toBeLessThan(1e-12);
    }
  });

  it('scales as T^ω (definition of the viscosity index)', () => {
    for (const kind of ['HS', 'VHS', 'VSS'] as const) {
      const m = modelFromSpecies('Ar', kind);
      expect(relativeError(viscosityPaS(m, 600) / viscosityPaS(m, 300), 2 ** m.viscosityIndex)).toBeLessThan(1e-12);
    }
  });
});

describe('speeds, mean free path and rarefaction', () => {
  it('mean speed is 2/sqrt(π) times the most probable speed (Maxwell distribution)', () => {
    const m = SPECIES.Ar.massKg;
    expect(
      relativeError(meanSpeedMPerS(m, 300), (2 / Math.sqrt(Math.PI)) * mostProbableSpeedMPerS(m, 300)),
    ).toBeLessThan(1e-14);
    // Argon at 273 K: v0 = sqrt(2kT/m) = 337.195 m/s (computed: sqrt(2 × 1.380649e-23 × 273 / 6.63e-26)).
    expect(mostProbableSpeedMPerS(m, 273)).toBeCloseTo(337.195, 2);
  });

  it('Kn = λ/H equals sqrt(π)/(2δ) (reference notes, notation of Sharipov & Seleznev 1998)', () => {
    const model = modelFromSpecies('Ar', 'VHS');
    for (const [pressurePa, temperatureK, gapM] of [
      [100, 300, 1e-3],
      [1, 500, 0.1],
      [1e5, 273, 1e-6],
    ]) {
      const mu = viscosityPaS(model, temperatureK);
      const lambda = viscosityMeanFreePathM(mu, pressurePa, temperatureK, model.massKg);
      const delta = rarefactionParameter(pressurePa, gapM, mu, mostProbableSpeedMPerS(model.massKg, temperatureK));
      expect(relativeError(lambda / gapM, knudsenFromRarefaction(delta))).toBeLessThan(1e-12);
      expect(relativeError(rarefactionFromKnudsen(knudsenFromRarefaction(delta)), delta)).toBeLessThan(1e-12);
    }
  });
});

describe('collision cross-section and rate', () => {
  it('σ_T·c_r = sigmaCrCoefficient·c_r^(2−2ω), and HS σ_T = πd² at every speed', () => {
    const vhs = modelFromSpecies('CO2', 'VHS');
    for (const c of [10, 300, 2000]) {
      expect(
        relativeError(collisionCrossSectionM2(vhs, c) * c, sigmaCrCoefficient(vhs) * c ** (2 - 2 * 0.93)),
      ).toBeLessThan(1e-12);
    }
    const hs = modelFromSpecies('Ar', 'HS');
    const d = hs.referenceDiameterM;
    expect(relativeError(collisionCrossSectionM2(hs, 123), Math.PI * d * d)).toBeLessThan(1e-8);
  });

  it('HS rate equals √2 π d² n c̄ (standard kinetic theory, published)', () => {
    const hs = modelFromSpecies('Ar', 'HS');
    const n = 2.5e21;
    for (const t of [150, 273, 800]) {
      const d = hs.referenceDiameterM;
      const expected = Math.SQRT2 * Math.PI * d * d * n * meanSpeedMPerS(hs.massKg, t);
      expect(relativeError(equilibriumCollisionRatePerParticle(hs, n, t), expected)).toBeLessThan(1e-12);
      expect(relativeError(meanCollisionTimeS(hs, n, t), 1 / expected)).toBeLessThan(1e-12);
    }
  });

  /**
   * n·⟨σ_T c_r⟩ by quadrature over the Maxwellian relative-speed distribution
   * f(c) = 4π (m_r/(2πkT))^{3/2} c² exp(−m_r c²/(2kT)), m_r = m/2 (standard kinetic theory) — independent of the
   * closed form under test. Composite Simpson on c ∈ [0, 12 c_s], c_s = sqrt(2kT/m_r): the tail beyond is e^{−144}.
   */
  function rateByQuadrature(model: MolecularModel, n: number, temperatureK: number): number {
    const reducedMass = model.massKg / 2;
    const beta = reducedMass / (2 * K_B * temperatureK);
    const norm = 4 * Math.PI * (beta / Math.PI) ** 1.5;
    const integrand = (c: number) => norm * c * c * Math.exp(-beta * c * c) * collisionCrossSectionM2(model, c) * c;
    const upper = 12 / Math.sqrt(beta);
    const intervals = 20000;
    const h = upper / intervals;
    let sum = 0; // integrand(0) = 0 for every ω ≤ 1
    for (let i = 1; i < intervals; i++) sum += (i % 2 === 1 ? 4 : 2) * integrand(i * h);
    sum += integrand(upper);
    return (n * (sum * h)) / 3;
  }

  it('closed-form rate equals n⟨σ_T c_r⟩ by quadrature to 1e-6 (HS Ar, VHS Ar ω 0.81, VHS CO2 ω 0.93, VSS N2)', () => {
    const n = 3.2e22;
    const models = [
      modelFromSpecies('Ar', 'HS'),
      modelFromSpecies('Ar', 'VHS'),
      modelFromSpecies('CO2', 'VHS'),
      modelFromSpecies('N2', 'VSS'),
    ];
    for (const model of models) {
      for (const t of [100, 273, 1000]) {
        const closed = equilibriumCollisionRatePerParticle(model, n, t);
        expect(relativeError(closed, rateByQuadrature(model, n, t)), `${model.name} at ${t} K`).toBeLessThan(1e-6);
      }
    }
  });
});
