/**
 * What every preset is made of — parameters with unit kinds, shown units, defaults and descriptions — and the
 * parameters several presets share (gas, collision model, Knudsen number, gap, numerics).
 */
import { SPECIES_IDS } from '../gas/species';
import { COLLISION_MODELS } from './caseConstants';
import type { CaseInput } from './schema';
import { viscosityPaS, type MolecularModel } from '../gas/molecularModel';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { QuantityKind } from '../units/engineeringUnits';

/** 'count': a whole number ≥ 0; 'choice': one of `choices`; otherwise a quantity kind parsed with units. */
export type ParameterKind = QuantityKind | 'count' | 'choice';

export interface PresetParameter {
  /** Key used in `--set name=value` and in build()'s values. */
  readonly name: string;
  /** Label in words for forms, e.g. 'Upstream pressure', 'Tube length / radius' (the unit is the unit selector's). */
  readonly label?: string;
  readonly kind: ParameterKind;
  /** Unit in which help and forms show the value ('' for counts and choices). */
  readonly unitShown: string;
  /** SI value (or choice); null = derived from the other parameters (the description says how). */
  readonly default: number | string | null;
  readonly choices?: readonly string[];
  /** Smallest allowed SI value, exclusive when `exclusiveMin`; absent = any finite number. */
  readonly min?: number;
  readonly exclusiveMin?: boolean;
  readonly description: string;
}

/** Parameter values after parsing: SI numbers, chosen strings, or undefined for a derived parameter left unset. */
export type PresetValues = Readonly<Record<string, number | string | undefined>>;

export interface Preset {
  readonly name: string;
  readonly description: string;
  readonly parameters: readonly PresetParameter[];
  /**
   * Builds the case from SI values; every parameter with a non-null default is present. `given` names the parameters
   * the user set (defaults left out): a preset whose gas state may be given as a Knudsen number or as pressures
   * (pressurePresetParameters.ts) needs it to tell which one was given; without it the Knudsen number is used.
   */
  build(values: PresetValues, given?: ReadonlySet<string>): CaseInput;
}

export const gasParameter: PresetParameter = {
  name: 'gas',
  label: 'Gas',
  kind: 'choice',
  unitShown: '',
  default: 'Ar',
  choices: SPECIES_IDS,
  description: 'table gas',
};
export const modelParameter: PresetParameter = {
  name: 'model',
  label: 'Collision model',
  kind: 'choice',
  unitShown: '',
  default: 'VHS',
  choices: COLLISION_MODELS,
  description: 'collision model',
};
export const knudsenParameter: PresetParameter = {
  name: 'knudsen',
  label: 'Knudsen number',
  kind: 'dimensionless',
  unitShown: '',
  default: 0.1,
  min: 0,
  exclusiveMin: true,
  description: 'Knudsen number λ/H, λ = (μ/p)·sqrt(πkT/(2m)) the viscosity-based mean free path; sets the pressure',
};
export const gapParameter: PresetParameter = {
  name: 'gap',
  label: 'Gap',
  kind: 'length',
  unitShown: 'mm',
  default: 1e-3,
  min: 0,
  exclusiveMin: true,
  description: 'distance H between the walls',
};
export const numericsParameters: readonly PresetParameter[] = [
  {
    name: 'cellsY',
    label: 'Cells across the gap',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'cells across the gap; default max(20, ceil(3/Kn))',
  },
  {
    name: 'particlesPerCell',
    label: 'Particles per cell',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'simulated particles per cell at the start; default 100',
  },
  {
    name: 'transientSteps',
    label: 'Steps before sampling',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 0,
    description: 'steps before sampling starts; default chosen by the planner',
  },
  {
    name: 'sampleSteps',
    label: 'Sampled steps',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description:
      'sampled steps; default: sized before the run so that the headline quantity reaches ±1 % (95 %) within the time cap (tenuis check shows the sizing)',
  },
  { name: 'seed', label: 'Random seed', kind: 'count', unitShown: '', default: 1, min: 0, description: 'random seed' },
];

/** p = μ(T)·sqrt(πkT/(2m)) / (Kn·H), Pa: the pressure at which λ (viscosity-based) equals Kn·H. */
export function pressureForKnudsenPa(
  model: MolecularModel,
  temperatureK: number,
  knudsen: number,
  gapM: number,
): number {
  return (
    (viscosityPaS(model, temperatureK) * Math.sqrt((Math.PI * K_B * temperatureK) / (2 * model.massKg))) /
    (knudsen * gapM)
  );
}

// ─── Numerics defaults: the one place to tune accuracy against speed ────────────────────────────────────────────
/**
 * Default numerics of the gap presets for a Knudsen number (λ/H).
 * cellsY: at least 20 cells, and cells no larger than λ/3 (3/Kn cells across the gap; with 2×2 sub-cells the mean
 * collision separation stays near 0.1 λ). 100 particles per cell. The sampling is left to the run sizing
 * (engine/sizing/runSizing.ts: steps for ±1 % on the headline quantity within the time cap) unless sampleSteps is given.
 */
export function defaultGapNumerics(knudsen: number): { cellsY: number; particlesPerCell: number } {
  const cellsY = Math.max(20, Math.ceil(3 / knudsen - 1e-9));
  return { cellsY, particlesPerCell: 100 };
}
// ────────────────────────────────────────────────────────────────────────────────────────────────────────────────

/** The sampling block of a preset's case from its transientSteps and sampleSteps parameters (left out when unset). */
export function presetSampling(v: PresetValues): NonNullable<CaseInput['sampling']> {
  const sampling: NonNullable<CaseInput['sampling']> = {};
  if (v.transientSteps !== undefined) sampling.transientSteps = v.transientSteps as number;
  if (v.sampleSteps !== undefined) sampling.sampleSteps = v.sampleSteps as number;
  return sampling;
}
