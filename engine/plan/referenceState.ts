/**
 * The gas and the reference state of a case: the molecular model its gas section names, and the state (pressure,
 * temperature, viscosity, mean free path, Knudsen number, collision time) every result is reported against and the
 * planner sizes cells and time steps by. Cheap and pure; plan() and the set-up forms call it.
 */
import type { Case } from '../case/schema';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import {
  type MolecularModel,
  modelFromSpecies,
  viscosityPaS,
  mostProbableSpeedMPerS,
  viscosityMeanFreePathM,
  equilibriumCollisionRatePerParticle,
} from '../gas/molecularModel';

/** Reference state reported with every result. meanFreePathM is the viscosity-based λ = (μ/p)·sqrt(πkT/(2m)). */
export interface ReferenceState {
  readonly pressurePa: number;
  readonly temperatureK: number;
  readonly numberDensityPerM3: number;
  readonly massDensityKgPerM3: number;
  readonly viscosityPaS: number;
  readonly mostProbableSpeedMPerS: number;
  readonly meanFreePathM: number;
  /** Kn = λ / lengthScaleM. */
  readonly knudsen: number;
  /** δ = p L / (μ v0) = sqrt(π) / (2 Kn). */
  readonly rarefaction: number;
  readonly lengthScaleM: number;
  readonly meanCollisionTimeS: number;
}

export interface GasPlan {
  readonly name: string;
  readonly model: MolecularModel;
  readonly rotationalCollisionNumber: number;
}

export function gasModelOf(c: Case): GasPlan {
  const g = c.gas;
  if (g.custom) {
    const hs = g.model === 'HS';
    return {
      name: g.custom.name,
      rotationalCollisionNumber: g.rotationalCollisionNumber,
      model: {
        kind: g.model,
        name: g.custom.name,
        massKg: g.custom.massKg,
        referenceDiameterM: g.custom.referenceDiameterM,
        referenceTemperatureK: g.custom.referenceTemperatureK,
        viscosityIndex: hs ? 0.5 : g.custom.viscosityIndex,
        scatteringExponent: g.model === 'VSS' ? g.custom.scatteringExponent : 1,
        rotationalDof: g.custom.rotationalDof,
      },
    };
  }
  const model = modelFromSpecies(g.species!, g.model);
  return { name: model.name, model, rotationalCollisionNumber: g.rotationalCollisionNumber };
}

export function referenceStateOf(c: Case, model: MolecularModel): ReferenceState {
  const p = c.initial.pressurePa;
  const t = c.initial.temperatureK;
  const n = p / (K_B * t);
  const mu = viscosityPaS(model, t);
  const v0 = mostProbableSpeedMPerS(model.massKg, t);
  const lambda = viscosityMeanFreePathM(mu, p, t, model.massKg);
  const length = c.domain.characteristicLengthM ?? c.domain.lengthYM;
  return {
    pressurePa: p,
    temperatureK: t,
    numberDensityPerM3: n,
    massDensityKgPerM3: n * model.massKg,
    viscosityPaS: mu,
    mostProbableSpeedMPerS: v0,
    meanFreePathM: lambda,
    knudsen: lambda / length,
    rarefaction: (p * length) / (mu * v0),
    lengthScaleM: length,
    meanCollisionTimeS: 1 / equilibriumCollisionRatePerParticle(model, n, t),
  };
}
