/**
 * Presets: named, parameterised cases. Each preset lists its parameters (name, unit kind, the unit shown to people,
 * default, description) and builds a complete case file from SI values. buildPreset() is the edge where text such as
 * `gap=2mm` or `temperature=25C` is parsed (engine/units/engineeringUnits.ts); build() itself sees SI only.
 *
 * Both presets are planar 1D problems across a gap H between two diffuse walls (bottom y = 0, top y = H), one cell
 * wide in x with periodic left/right sides. The gas state is set from the Knudsen number Kn = λ/H with the
 * viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m)) (engine/gas/molecularModel.ts), i.e.
 * p = μ(T)·sqrt(πkT/(2m)) / (Kn·H).
 */
import type { CaseInput } from './schema';
import { CASE_SCHEMA_VERSION, COLLISION_MODELS } from './caseConstants';
import { SPECIES_IDS, type SpeciesId } from '../gas/species';
import { modelFromSpecies, viscosityPaS, type CollisionModelKind, type MolecularModel } from '../gas/molecularModel';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { parseQuantity, formatQuantity, unitsOf, type QuantityKind } from '../units/engineeringUnits';

import {
  type Preset,
  type PresetParameter,
  type PresetValues,
  gasParameter,
  modelParameter,
  knudsenParameter,
  gapParameter,
  numericsParameters,
  pressureForKnudsenPa,
  defaultGapNumerics,
} from './presetParameters';
import { DUCT_PRESETS } from './ductPresets';
import { cavity } from './cavityPreset';

export type { ParameterKind, Preset, PresetParameter, PresetValues } from './presetParameters';
export { pressureForKnudsenPa, defaultGapNumerics as defaultNumerics } from './presetParameters';

interface GapSetup {
  name: string;
  description: string;
  values: PresetValues;
  gasTemperatureK: number;
  bottom: { temperatureK: number; velocityXMPerS: number };
  top: { temperatureK: number; velocityXMPerS: number };
}

/** The shared 1D gap case: periodic in x with square cells, diffuse walls at y = 0 ('bottom') and y = H ('top'). */
function gapCase(s: GapSetup): CaseInput {
  const v = s.values;
  const species = v.gas as SpeciesId;
  const kind = v.model as CollisionModelKind;
  const knudsen = v.knudsen as number;
  const gapM = v.gap as number;
  const model = modelFromSpecies(species, kind);
  const auto = defaultGapNumerics(knudsen);
  const cellsY = (v.cellsY as number | undefined) ?? auto.cellsY;
  const wall = (w: GapSetup['bottom']) => ({
    type: 'wall' as const,
    model: 'diffuse' as const,
    temperatureK: w.temperatureK,
    velocityMPerS: [w.velocityXMPerS, 0, 0] as [number, number, number],
  });
  const sampling: NonNullable<CaseInput['sampling']> = {
    sampleSteps: (v.sampleSteps as number | undefined) ?? auto.sampleSteps,
  };
  if (v.transientSteps !== undefined) sampling.transientSteps = v.transientSteps as number;
  return {
    schemaVersion: CASE_SCHEMA_VERSION,
    name: s.name,
    description: s.description,
    gas: { species, model: kind },
    initial: {
      pressurePa: pressureForKnudsenPa(model, s.gasTemperatureK, knudsen, gapM),
      temperatureK: s.gasTemperatureK,
      velocityMPerS: [0, 0, 0],
    },
    domain: { lengthXM: gapM / cellsY, lengthYM: gapM, characteristicLengthM: gapM },
    boundaries: { left: { type: 'periodic' }, right: { type: 'periodic' }, bottom: wall(s.bottom), top: wall(s.top) },
    numerics: {
      cellsX: 1,
      cellsY,
      particlesPerCell: (v.particlesPerCell as number | undefined) ?? auto.particlesPerCell,
    },
    sampling,
    seed: v.seed as number,
  };
}

const couette: Preset = {
  name: 'couette',
  description: 'planar Couette flow: gas sheared between two parallel diffuse walls moving in opposite directions',
  parameters: [
    gasParameter,
    modelParameter,
    knudsenParameter,
    gapParameter,
    {
      name: 'temperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 273,
      min: 0,
      exclusiveMin: true,
      description: 'gas and wall temperature',
    },
    {
      name: 'wallSpeed',
      kind: 'speed',
      unitShown: 'm/s',
      default: 100,
      description: 'relative speed U of the walls: bottom moves at −U/2, top at +U/2 along x',
    },
    ...numericsParameters,
  ],
  build(v) {
    const t = v.temperature as number;
    const u = v.wallSpeed as number;
    return gapCase({
      name: `couette ${v.gas} ${v.model} Kn ${v.knudsen}`,
      description: `Planar Couette flow of ${v.gas} (${v.model}), Kn = ${v.knudsen}, gap ${formatQuantity(v.gap as number, 'mm')}, ${t} K, walls ±${u / 2} m/s`,
      values: v,
      gasTemperatureK: t,
      bottom: { temperatureK: t, velocityXMPerS: -u / 2 },
      top: { temperatureK: t, velocityXMPerS: u / 2 },
    });
  },
};

const fourier: Preset = {
  name: 'fourier',
  description: 'planar Fourier heat conduction: gas at rest between a cold bottom wall and a hot top wall',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, description: `${knudsenParameter.description}, at the mean wall temperature` },
    gapParameter,
    {
      name: 'hotTemperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 283,
      min: 0,
      exclusiveMin: true,
      description: 'top wall temperature',
    },
    {
      name: 'coldTemperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 263,
      min: 0,
      exclusiveMin: true,
      description: 'bottom wall temperature',
    },
    ...numericsParameters,
  ],
  build(v) {
    const hot = v.hotTemperature as number;
    const cold = v.coldTemperature as number;
    const mean = (hot + cold) / 2;
    return gapCase({
      name: `fourier ${v.gas} ${v.model} Kn ${v.knudsen}`,
      description: `Planar Fourier heat conduction in ${v.gas} (${v.model}), Kn = ${v.knudsen} at ${mean} K, gap ${formatQuantity(v.gap as number, 'mm')}, walls ${cold} K (bottom) and ${hot} K (top)`,
      values: v,
      gasTemperatureK: mean,
      bottom: { temperatureK: cold, velocityXMPerS: 0 },
      top: { temperatureK: hot, velocityXMPerS: 0 },
    });
  },
};

/** All presets by name. */
export const PRESETS = Object.freeze({ couette, fourier, ...DUCT_PRESETS, cavity } as const satisfies Record<
  string,
  Preset
>);
export type PresetName = keyof typeof PRESETS;

export function presetNames(): PresetName[] {
  return Object.keys(PRESETS) as PresetName[];
}

export function isPresetName(name: string): name is PresetName {
  return Object.hasOwn(PRESETS, name);
}

function presetOrThrow(name: string): Preset {
  const p = isPresetName(name) ? PRESETS[name] : undefined;
  if (!p) throw new Error(`unknown preset "${name}"; available presets: ${presetNames().join(', ')}`);
  return p;
}

function formatDefault(p: PresetParameter): string {
  if (p.default === null) return 'auto';
  if (typeof p.default === 'string') return p.default;
  return p.unitShown ? formatQuantity(p.default, p.unitShown) : String(p.default);
}

/** Help text: the preset's description and one line per parameter with its unit, default and meaning. */
export function presetHelp(name: string): string {
  const preset = presetOrThrow(name);
  const rows = preset.parameters.map((p) => {
    const accepted =
      p.kind === 'choice'
        ? `one of ${p.choices!.join(', ')}`
        : p.kind === 'count'
          ? 'whole number'
          : p.kind === 'dimensionless'
            ? 'number'
            : `${p.kind}: ${unitsOf(p.kind).join(', ')}`;
    return { head: `${p.name}=${formatDefault(p)}`, tail: `${p.description} [${accepted}]` };
  });
  const width = Math.max(...rows.map((r) => r.head.length));
  return [
    `${preset.name}: ${preset.description}`,
    '',
    'Parameters (name=default; a number without a unit is SI):',
    ...rows.map((r) => `  ${r.head.padEnd(width)}  ${r.tail}`),
  ].join('\n');
}

function parseParameter(preset: Preset, p: PresetParameter, text: string): number | string {
  const where = `preset ${preset.name}, parameter ${p.name}`;
  if (p.kind === 'choice') {
    const choice =
      p.choices!.find((c) => c === text.trim()) ??
      p.choices!.find((c) => c.toLowerCase() === text.trim().toLowerCase());
    if (choice === undefined)
      throw new Error(`${where}: "${text}" is not allowed; choose one of ${p.choices!.join(', ')}`);
    return choice;
  }
  let value: number;
  try {
    value = parseQuantity(text, p.kind === 'count' ? 'dimensionless' : p.kind);
  } catch (e) {
    throw new Error(`${where}: ${(e as Error).message}`);
  }
  if (p.kind === 'count' && !Number.isInteger(value)) throw new Error(`${where}: "${text}" must be a whole number`);
  if (p.min !== undefined && (p.exclusiveMin ? !(value > p.min) : !(value >= p.min))) {
    const shown = p.unitShown ? formatQuantity(p.min, p.unitShown) : String(p.min);
    throw new Error(`${where}: "${text}" must be ${p.exclusiveMin ? 'greater than' : 'at least'} ${shown}`);
  }
  return value;
}

/**
 * Builds a preset's case from text overrides such as { gap: '2mm', temperature: '25C', knudsen: '0.5' }.
 * Throws an Error naming the valid presets, parameters, units or choices when something is not understood.
 */
export function buildPreset(name: string, overrides: Readonly<Record<string, string>> = {}): CaseInput {
  const preset = presetOrThrow(name);
  const values: Record<string, number | string | undefined> = {};
  for (const p of preset.parameters) values[p.name] = p.default ?? undefined;
  for (const [key, text] of Object.entries(overrides)) {
    const p = preset.parameters.find((q) => q.name === key);
    if (!p)
      throw new Error(
        `preset ${preset.name} has no parameter "${key}"; its parameters are ${preset.parameters.map((q) => q.name).join(', ')}`,
      );
    values[key] = parseParameter(preset, p, text);
  }
  try {
    return preset.build(values);
  } catch (e) {
    throw new Error(`preset ${preset.name}: ${(e as Error).message}`);
  }
}
