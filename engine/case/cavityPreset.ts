/**
 * Preset `cavity`: the lid-driven square cavity in DSMC. A planar square of side L with walls on all four sides at
 * one temperature; the lid is the top side (y = L), moving along +x at the lid speed U; the left, right and bottom
 * walls are at rest. The lid reports as `lid` (walls.lid, surfaces.csv rows `lid`: the top side's wall is named so) and
 * the other walls as `left`, `right` and `bottom`.
 *
 * The gas state is set from the Knudsen number on the side, Kn = λ/L with the viscosity-based mean free path
 * λ = (μ/p)·sqrt(πkT/(2m)) (presetParameters.ts pressureForKnudsenPa). The continuum comparison
 * (engine/continuum/caseModelsCavity.ts) solves the incompressible cavity at Re = ρUL/μ of that same state.
 */
import type { CaseInput } from './schema';
import { CASE_SCHEMA_VERSION } from './caseConstants';
import type { SpeciesId } from '../gas/species';
import type { CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import {
  type Preset,
  type PresetValues,
  gasParameter,
  modelParameter,
  knudsenParameter,
  presetSampling,
} from './presetParameters';
import { gapValues } from './gapCase';
import { knudsenText, pressureParameter } from './pressurePresetParameters';

export const CAVITY_WALL_MODELS = ['diffuse', 'maxwell'] as const;

type Wall = Extract<CaseInput['boundaries']['top'], { type: 'wall' }>;

function wallOf(v: PresetValues, speedXMPerS: number): Wall {
  const t = v.temperature as number;
  const a = v.accommodation as number;
  const velocityMPerS: [number, number, number] = [speedXMPerS, 0, 0];
  if (v.wallModel === 'diffuse') {
    if (a !== 1)
      throw new Error(
        `accommodation ${a} applies to Maxwell walls only: set wallModel=maxwell, or leave accommodation at 1`,
      );
    return { type: 'wall', model: 'diffuse', temperatureK: t, velocityMPerS };
  }
  if (!(a > 0 && a <= 1)) throw new Error(`accommodation ${a} must be above 0 and at most 1`);
  return { type: 'wall', model: 'maxwell', accommodation: a, temperatureK: t, velocityMPerS };
}

export const cavity: Preset = {
  name: 'cavity',
  description:
    'lid-driven square cavity: gas in a square box whose top wall (the lid, reported as `lid`) slides along +x; the other walls (left, right, bottom) are at rest',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      description:
        'Knudsen number λ/L on the side L, λ = (μ/p)·sqrt(πkT/(2m)) the viscosity-based mean free path; sets the pressure',
    },
    pressureParameter,
    {
      name: 'side',
      label: 'Side of the square',
      kind: 'length',
      unitShown: 'mm',
      default: 1e-3,
      min: 0,
      exclusiveMin: true,
      description: 'side L of the square',
    },
    {
      name: 'lidSpeed',
      label: 'Lid speed',
      kind: 'speed',
      unitShown: 'm/s',
      default: 100,
      min: 0,
      exclusiveMin: true,
      description: 'speed U of the lid (top wall) along +x',
    },
    {
      name: 'temperature',
      label: 'Temperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 300,
      min: 0,
      exclusiveMin: true,
      description: 'gas and wall temperature',
    },
    {
      name: 'wallModel',
      label: 'Wall model',
      kind: 'choice',
      unitShown: '',
      default: 'diffuse',
      choices: CAVITY_WALL_MODELS,
      description: 'gas–wall interaction of all four walls',
    },
    {
      name: 'accommodation',
      label: 'Wall accommodation',
      kind: 'dimensionless',
      unitShown: '',
      default: 1,
      min: 0,
      exclusiveMin: true,
      description: 'accommodation coefficient of Maxwell walls (1 = diffuse)',
    },
    {
      name: 'cells',
      label: 'Cells along a side',
      kind: 'count',
      unitShown: '',
      default: null,
      min: 1,
      description: 'cells along each side; default: cells of at most λ/3, at least 20 along a side',
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
      description: 'sampled steps; default chosen by the planner (the headline is a profile, so no run sizing)',
    },
    {
      name: 'seed',
      label: 'Random seed',
      kind: 'count',
      unitShown: '',
      default: 1,
      min: 0,
      description: 'random seed',
    },
  ],
  build(input, given) {
    const side = input.side as number;
    const t = input.temperature as number;
    const { values: v, pressureNote } = gapValues(input, given, t, side);
    const u = v.lidSpeed as number;
    const numerics: NonNullable<CaseInput['numerics']> = {};
    if (v.cells !== undefined) {
      numerics.cellsX = v.cells as number;
      numerics.cellsY = v.cells as number;
    }
    if (v.particlesPerCell !== undefined) numerics.particlesPerCell = v.particlesPerCell as number;
    const sampling = presetSampling(v);
    return {
      schemaVersion: CASE_SCHEMA_VERSION,
      name: `cavity ${v.gas} Kn ${knudsenText(v)}`,
      description: `Lid-driven square cavity of ${v.gas} (${v.model}), Kn = ${knudsenText(v)}${pressureNote} on the side ${formatQuantity(side, 'mm')}, lid (top wall) at ${u} m/s along +x, walls at ${t} K (${v.wallModel}${v.wallModel === 'maxwell' ? `, accommodation ${v.accommodation}` : ''})`,
      gas: { species: v.gas as SpeciesId, model: v.model as CollisionModelKind },
      initial: { pressurePa: v.pressure as number, temperatureK: t },
      domain: { lengthXM: side, lengthYM: side, characteristicLengthM: side },
      boundaries: {
        left: wallOf(v, 0),
        right: wallOf(v, 0),
        bottom: wallOf(v, 0),
        top: { ...wallOf(v, u), name: 'lid' },
      },
      numerics,
      sampling,
      seed: v.seed as number,
    };
  },
};
