/**
 * Presets: named, parameterised cases. Each preset lists its parameters (name, unit kind, the unit shown to people,
 * default, description) and builds a complete case file from SI values. buildPreset() is the edge where text such as
 * `gap=2mm` or `temperature=25C` is parsed (engine/units/engineeringUnits.ts); build() itself sees SI only.
 *
 * One module per preset (couettePreset.ts, fourierPreset.ts, ductPresets.ts, cavityPreset.ts); this one holds the
 * table of them and the text edge: help, parameter parsing and building.
 */
import type { CaseInput } from './schema';
import { parseQuantity, formatQuantity, unitsOf } from '../units/engineeringUnits';
import type { Preset, PresetParameter } from './presetParameters';
import { couette } from './couettePreset';
import { fourier } from './fourierPreset';
import { DUCT_PRESETS } from './ductPresets';
import { cavity } from './cavityPreset';
import { gasStateOfPresetCase, gasStateWays } from './pressurePresetParameters';
import { SPECIES_CHOICES, speciesIdOf } from './gasSchema';

export type { ParameterKind, Preset, PresetParameter, PresetValues } from './presetParameters';
export { pressureForKnudsenPa, defaultGapNumerics as defaultNumerics } from './presetParameters';
export { gasStateOfPresetCase, gasStateWays, type GasState } from './pressurePresetParameters';

/**
 * The verdict's tolerance, a parameter of every preset: the relative deviation a continuum model may have and still
 * be adequate (the case's comparison.tolerance); left out of the case when unset, and the verdict then uses 2 %.
 */
const verdictToleranceParameter: PresetParameter = {
  name: 'verdictTolerance',
  label: 'Verdict tolerance (fraction, 0.02 = 2 %)',
  kind: 'dimensionless',
  unitShown: '',
  default: null,
  min: 0,
  exclusiveMin: true,
  description: 'relative deviation a continuum model may have and still be adequate in the verdict; default 0.02 (2 %)',
};

function withVerdictTolerance<P extends Preset>(p: P): P {
  return {
    ...p,
    parameters: [...p.parameters, verdictToleranceParameter],
    build(v, given) {
      const c = p.build(v, given);
      const tolerance = v.verdictTolerance as number | null | undefined;
      return tolerance === null || tolerance === undefined ? c : { ...c, comparison: { tolerance } };
    },
  };
}

/** All presets by name. */
export const PRESETS = Object.freeze({
  couette: withVerdictTolerance(couette),
  fourier: withVerdictTolerance(fourier),
  ...(Object.fromEntries(
    Object.entries(DUCT_PRESETS).map(([name, p]) => [name, withVerdictTolerance(p)]),
  ) as typeof DUCT_PRESETS),
  cavity: withVerdictTolerance(cavity),
} as const satisfies Record<string, Preset>);
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
    ...gasStateHelp(preset),
  ].join('\n');
}

const shownPa = (pa: number) => formatQuantity(Number(pa.toPrecision(4)), 'Pa');

/** The ways the gas state may be given, and what the default Knudsen number gives in pressures. */
function gasStateHelp(preset: Preset): string[] {
  const ways = gasStateWays(preset.parameters);
  if (!ways) return [];
  const state = gasStateOfPresetCase(preset.build(defaultValues(preset)));
  const kn = preset.parameters.find((p) => p.name === 'knudsen')?.default;
  const lines =
    ways === 'gap'
      ? ['  knudsen           the Knudsen number (the default), or', '  pressure          the gas pressure']
      : [
          '  knudsen (with pressureRatio)             the Knudsen number at the mean pressure (the default), or',
          '  meanPressure (with pressureRatio)        the mean of the two vessel pressures, or',
          '  upstreamPressure and downstreamPressure  the two vessel pressures (then no pressureRatio)',
        ];
  const derived = !state
    ? []
    : ways === 'gap'
      ? [`At the defaults, knudsen=${kn} gives pressure=${shownPa(state.pressurePa)}.`]
      : [
          `At the defaults, knudsen=${kn} gives upstreamPressure=${shownPa(state.upstreamPressurePa!)}, downstreamPressure=${shownPa(state.downstreamPressurePa!)} (meanPressure=${shownPa(state.pressurePa)}).`,
        ];
  return [
    '',
    'The gas state is given one way only (giving two is refused); pressures take Pa, kPa, mbar, Torr, mTorr, …:',
    ...lines,
    ...derived,
    `The built case's description names the other one (the pressures or the Knudsen number).`,
  ];
}

function defaultValues(preset: Preset): Record<string, number | string | undefined> {
  const values: Record<string, number | string | undefined> = {};
  for (const p of preset.parameters) values[p.name] = p.default ?? undefined;
  return values;
}

function parseParameter(preset: Preset, p: PresetParameter, text: string): number | string {
  const where = `preset ${preset.name}, parameter ${p.name}`;
  if (p.kind === 'choice') {
    const choice =
      p.choices!.find((c) => c === text.trim()) ??
      p.choices!.find((c) => c.toLowerCase() === text.trim().toLowerCase()) ??
      (p.name === 'gas' ? speciesIdOf(text) : undefined);
    if (choice === undefined)
      throw new Error(
        `${where}: "${text}" is not allowed; choose one of ${p.name === 'gas' ? SPECIES_CHOICES : p.choices!.join(', ')}`,
      );
    return choice;
  }
  let value: number;
  try {
    value = parseQuantity(text, p.kind === 'count' ? 'dimensionless' : p.kind);
  } catch (e) {
    throw new Error(`${where}: ${(e as Error).message}`, { cause: e });
  }
  if (p.kind === 'count' && !Number.isInteger(value)) throw new Error(`${where}: "${text}" must be a whole number`);
  if (p.min !== undefined && (p.exclusiveMin ? !(value > p.min) : !(value >= p.min))) {
    const shown = p.unitShown ? formatQuantity(p.min, p.unitShown) : String(p.min);
    throw new Error(`${where}: "${text}" must be ${p.exclusiveMin ? 'greater than' : 'at least'} ${shown}`);
  }
  return value;
}

/**
 * Parses one parameter's text as buildPreset does, without building: the message of a value that is wrong by itself
 * (unknown unit, below its minimum …), apart from the messages about parameters given together.
 */
export function checkPresetParameter(name: string, key: string, text: string): void {
  const preset = presetOrThrow(name);
  const p = preset.parameters.find((q) => q.name === key);
  if (!p) throw new Error(`preset ${preset.name} has no parameter "${key}"`);
  parseParameter(preset, p, text);
}

/**
 * Builds a preset's case from text overrides such as { gap: '2mm', temperature: '25C', knudsen: '0.5' }.
 * Throws an Error naming the valid presets, parameters, units or choices when something is not understood.
 */
export function buildPreset(name: string, overrides: Readonly<Record<string, string>> = {}): CaseInput {
  const preset = presetOrThrow(name);
  const values = defaultValues(preset);
  const given = new Set<string>();
  for (const [key, text] of Object.entries(overrides)) {
    const p = preset.parameters.find((q) => q.name === key);
    if (!p)
      throw new Error(
        `preset ${preset.name} has no parameter "${key}"; its parameters are ${preset.parameters.map((q) => q.name).join(', ')}`,
      );
    values[key] = parseParameter(preset, p, text);
    given.add(key);
  }
  try {
    return preset.build(values, given);
  } catch (e) {
    throw new Error(`preset ${preset.name}: ${(e as Error).message}`, { cause: e });
  }
}
