/**
 * What the duct presets (poiseuille, channel, tube, slit, orifice) share: their temperature, accommodation,
 * pressure-ratio, length-ratio and numerics parameters, the wall their accommodation gives, and the gas, numerics and
 * sampling part of their cases. One module, so each preset module holds only its own geometry.
 */
import type { CaseInput } from './schema';
import { CASE_SCHEMA_VERSION } from './caseConstants';
import type { SpeciesId } from '../gas/species';
import type { CollisionModelKind } from '../gas/molecularModel';
import { type PresetParameter, type PresetValues, presetSampling } from './presetParameters';

export const temperatureParameter: PresetParameter = {
  name: 'temperature',
  label: 'Temperature',
  kind: 'temperature',
  unitShown: 'K',
  default: 300,
  min: 0,
  exclusiveMin: true,
  description: 'gas, wall and vessel temperature',
};
export const accommodationParameter: PresetParameter = {
  name: 'accommodation',
  label: 'Wall accommodation',
  kind: 'dimensionless',
  unitShown: '',
  default: 1,
  min: 0,
  description: 'tangential momentum accommodation of the walls (Maxwell model; 1 = diffuse)',
};
export const pressureRatioParameter: PresetParameter = {
  name: 'pressureRatio',
  label: 'Pressure ratio upstream / downstream',
  kind: 'dimensionless',
  unitShown: '',
  default: 2,
  min: 1,
  exclusiveMin: true,
  description: 'upstream over downstream vessel pressure',
};
export const ductNumerics: readonly PresetParameter[] = [
  {
    name: 'cellsY',
    label: 'Cells across',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'cells across the domain; default: cells of at most λ/3 at the densest state, at least 20 across',
  },
  {
    name: 'particlesPerCell',
    label: 'Particles per cell',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'simulated particles per cell at the start; default 30',
  },
  {
    name: 'transientSteps',
    label: 'Steps before sampling',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 0,
    description: 'steps before sampling starts; default: ended automatically at steady state',
  },
  {
    name: 'sampleSteps',
    label: 'Sampled steps',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description:
      'sampled steps; default: sized before the run so that the flow rate reaches ±1 % (95 %) within the time cap (tenuis check shows the sizing)',
  },
  { name: 'seed', label: 'Random seed', kind: 'count', unitShown: '', default: 1, min: 0, description: 'random seed' },
];

export const lengthParameter = (
  name: string,
  of: string,
  def: number,
  description: string,
  label: string,
): PresetParameter => ({
  name,
  label,
  kind: 'dimensionless',
  unitShown: '',
  default: def,
  min: 0,
  description: `${description} (in units of the ${of})`,
});

export type Wall = NonNullable<CaseInput['blocks']>[number]['wall'];

export function wallOf(v: PresetValues): Wall {
  const t = v.temperature as number;
  const a = v.accommodation as number;
  if (a > 1) throw new Error(`accommodation ${a} must be between 0 and 1`);
  return a === 1
    ? { type: 'wall', model: 'diffuse', temperatureK: t }
    : { type: 'wall', model: 'maxwell', accommodation: a, temperatureK: t };
}

/** Gas, numerics and sampling shared by the duct presets; `cellsAcross` cells in y, square cells along x. */
export function ductCommon(
  v: PresetValues,
  pressurePa: number,
  lengthXM: number,
  lengthYM: number,
): Pick<CaseInput, 'schemaVersion' | 'gas' | 'initial' | 'numerics' | 'sampling' | 'seed'> {
  const numerics: NonNullable<CaseInput['numerics']> = {};
  if (v.cellsY !== undefined) {
    numerics.cellsY = v.cellsY as number;
    numerics.cellsX = Math.max(1, Math.round(((v.cellsY as number) * lengthXM) / lengthYM));
  }
  if (v.particlesPerCell !== undefined) numerics.particlesPerCell = v.particlesPerCell as number;
  const sampling = presetSampling(v);
  return {
    schemaVersion: CASE_SCHEMA_VERSION,
    gas: { species: v.gas as SpeciesId, model: v.model as CollisionModelKind },
    initial: { pressurePa, temperatureK: v.temperature as number },
    numerics,
    sampling,
    seed: v.seed as number,
  };
}
