/**
 * The gas state of a preset given either way an engineer knows it: as a Knudsen number (the physicist's) or as
 * pressures (the vacuum engineer's). Gap presets (couette, fourier, poiseuille, cavity) take `knudsen` or `pressure`;
 * presets between two vessels (channel, tube, slit, orifice) take `knudsen` with `pressureRatio`, `meanPressure` with
 * `pressureRatio`, or `upstreamPressure` with `downstreamPressure`. Exactly one way: giving two is refused with a
 * message naming the parameters given, so nobody is left guessing which one won.
 *
 * Both ways are resolved here into the full set (Knudsen number and every pressure), which the presets then build
 * from; the Knudsen number given stays the very number used before pressures were accepted (p = pressureForKnudsenPa,
 * the same arithmetic), so the default cases do not change by one bit.
 */
import { modelFromSpecies, type MolecularModel } from '../gas/molecularModel';
import type { CaseInput } from './schema';
import { type PresetParameter, type PresetValues, pressureForKnudsenPa } from './presetParameters';
import { speciesIdOf } from './gasSchema';

const pressure = (name: string, label: string, description: string): PresetParameter => ({
  name,
  label,
  kind: 'pressure',
  unitShown: 'Pa',
  default: null,
  min: 0,
  exclusiveMin: true,
  description,
});

/** The gap presets' alternative to `knudsen`. */
export const pressureParameter = pressure(
  'pressure',
  'Gas pressure',
  'gas pressure, instead of knudsen (give one of the two); default: the pressure the Knudsen number gives',
);
/** The presets between vessels: their alternatives to `knudsen`. */
export const vesselPressureParameters: readonly PresetParameter[] = [
  pressure(
    'upstreamPressure',
    'Upstream pressure',
    'upstream vessel pressure, with downstreamPressure, instead of knudsen and pressureRatio; default: from knudsen',
  ),
  pressure(
    'downstreamPressure',
    'Downstream pressure',
    'downstream vessel pressure, with upstreamPressure, instead of knudsen and pressureRatio; default: from knudsen',
  ),
  pressure(
    'meanPressure',
    'Mean pressure',
    'mean of the two vessel pressures, with pressureRatio, instead of knudsen; default: from knudsen',
  ),
];

/** What a pressure and a Knudsen number are converted with: gas, temperature and the length Kn is formed on. */
export interface KnudsenScale {
  readonly model: MolecularModel;
  readonly temperatureK: number;
  readonly lengthM: number;
}

/** Kn = λ/L at pressure p: the inverse of pressureForKnudsenPa. */
export function knudsenForPressure(s: KnudsenScale, pressurePa: number): number {
  return pressureForKnudsenPa(s.model, s.temperatureK, 1, s.lengthM) / pressurePa;
}

/** Kn rounded to four significant digits for names and descriptions when it was derived, as given otherwise. */
export function knudsenText(v: PresetValues): string {
  const kn = v.knudsen as number;
  return v.knudsenDerived ? String(Number(kn.toPrecision(4))) : String(kn);
}

function refuseTwo(names: readonly string[]): never {
  throw new Error(
    `give the gas state one way only: ${names.join(' and ')} were both given (choose the Knudsen number or the pressures)`,
  );
}

/**
 * A gap preset's values with `knudsen` and `pressure` both set, from whichever was given (`knudsenDerived` true when
 * the Knudsen number came from the pressure). Without `given`, the Knudsen number.
 */
export function resolveGapPressure(
  v: PresetValues,
  given: ReadonlySet<string> | undefined,
  s: KnudsenScale,
): PresetValues & { readonly knudsen: number; readonly pressure: number } {
  const byPressure = given?.has('pressure') ?? false;
  if (byPressure && given?.has('knudsen')) refuseTwo(['knudsen', 'pressure']);
  if (byPressure) {
    const p = v.pressure as number;
    return { ...v, pressure: p, knudsen: knudsenForPressure(s, p), knudsenDerived: 1 };
  }
  const kn = v.knudsen as number;
  return { ...v, knudsen: kn, pressure: pressureForKnudsenPa(s.model, s.temperatureK, kn, s.lengthM) };
}

/** The vessel pressures of a preset between vessels, and the Knudsen number at their mean. */
export interface VesselState {
  readonly knudsen: number;
  readonly knudsenDerived: boolean;
  readonly upPa: number;
  readonly downPa: number;
  readonly meanPa: number;
  readonly ratio: number;
}

/**
 * A vessel preset's gas state from the one way given: `knudsen` (default) or `meanPressure`, each with
 * `pressureRatio` (default 2), or `upstreamPressure` with `downstreamPressure` (then without `pressureRatio`).
 */
export function resolveVesselPressures(
  v: PresetValues,
  given: ReadonlySet<string> | undefined,
  s: KnudsenScale,
): VesselState {
  const has = (n: string) => given?.has(n) ?? false;
  const ways = [
    has('knudsen') ? ['knudsen'] : [],
    has('meanPressure') ? ['meanPressure'] : [],
    ['upstreamPressure', 'downstreamPressure'].filter(has),
  ].filter((w) => w.length > 0);
  if (ways.length > 1) refuseTwo(ways.flat());
  const pair = ways[0]?.[0] === 'upstreamPressure' || ways[0]?.[0] === 'downstreamPressure';
  if (pair) {
    const missing = ways[0].length === 1 ? (ways[0][0] === 'upstreamPressure' ? 'downstream' : 'upstream') : null;
    if (missing)
      throw new Error(
        `${ways[0][0]} needs ${missing}Pressure as well (or give meanPressure with pressureRatio, or knudsen)`,
      );
    if (has('pressureRatio'))
      throw new Error(
        'pressureRatio and upstreamPressure and downstreamPressure were all given: the two pressures set the ratio, leave pressureRatio out',
      );
    const up = v.upstreamPressure as number;
    const down = v.downstreamPressure as number;
    if (!(up > down))
      throw new Error(
        `upstreamPressure (${up} Pa) must be above downstreamPressure (${down} Pa): the gas flows from the upstream vessel (left) to the downstream one`,
      );
    const mean = (up + down) / 2;
    return {
      knudsen: knudsenForPressure(s, mean),
      knudsenDerived: true,
      upPa: up,
      downPa: down,
      meanPa: mean,
      ratio: up / down,
    };
  }
  const ratio = v.pressureRatio as number;
  const byMean = has('meanPressure');
  const knudsen = byMean ? knudsenForPressure(s, v.meanPressure as number) : (v.knudsen as number);
  const mean = byMean ? (v.meanPressure as number) : pressureForKnudsenPa(s.model, s.temperatureK, knudsen, s.lengthM);
  const down = (2 * mean) / (1 + ratio);
  return { knudsen, knudsenDerived: byMean, upPa: ratio * down, downPa: down, meanPa: mean, ratio };
}

/** Which ways a preset takes its gas state: 'gap' (knudsen or pressure), 'vessels' (the three above), or none. */
export function gasStateWays(parameters: readonly PresetParameter[]): 'gap' | 'vessels' | null {
  if (parameters.some((p) => p.name === 'upstreamPressure')) return 'vessels';
  if (parameters.some((p) => p.name === 'pressure')) return 'gap';
  return null;
}

/** A built preset case's gas state both ways: Kn on the case's length, and its pressures, Pa. */
export interface GasState {
  readonly knudsen: number;
  /** The initial pressure: the gap's, or the mean of the two vessels'. */
  readonly pressurePa: number;
  readonly upstreamPressurePa?: number;
  readonly downstreamPressurePa?: number;
}

/**
 * The gas state of a case a preset built: the pressure of the initial state (the mean of the vessels' for a case
 * between vessels) at its temperature and the case's characteristic length give Kn, as the presets set it; the
 * vessels' pressures are the left and right reservoirs'. Null for a custom gas or a case without a length scale.
 */
export function gasStateOfPresetCase(c: CaseInput): GasState | null {
  const species = c.gas.species === undefined ? undefined : speciesIdOf(c.gas.species);
  const lengthM = c.domain.characteristicLengthM;
  if (!species || lengthM === undefined) return null;
  const model = modelFromSpecies(species, c.gas.model ?? 'VHS');
  const pressurePa = c.initial.pressurePa;
  const knudsen = knudsenForPressure({ model, temperatureK: c.initial.temperatureK, lengthM }, pressurePa);
  const { left, right } = c.boundaries;
  if (left.type === 'reservoir' && right.type === 'reservoir')
    return { knudsen, pressurePa, upstreamPressurePa: left.pressurePa, downstreamPressurePa: right.pressurePa };
  return { knudsen, pressurePa };
}
