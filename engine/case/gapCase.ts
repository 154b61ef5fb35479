/**
 * The case the gap presets (couette, fourier) share: a planar 1D problem across a gap H between two diffuse walls
 * (bottom y = 0, top y = H), one cell wide in x with periodic left/right sides. The gas state is set from the Knudsen
 * number Kn = λ/H with the viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m)) (engine/gas/molecularModel.ts),
 * i.e. p = μ(T)·sqrt(πkT/(2m)) / (Kn·H), or the other way round when the pressure is given (gapValues).
 */
import type { CaseInput } from './schema';
import { CASE_SCHEMA_VERSION } from './caseConstants';
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, type CollisionModelKind } from '../gas/molecularModel';
import { type PresetValues, pressureForKnudsenPa, defaultGapNumerics } from './presetParameters';
import { resolveGapPressure } from './pressurePresetParameters';
import { formatQuantity } from '../units/engineeringUnits';

/**
 * A gap preset's values with the Knudsen number and the pressure both resolved, at the gas temperature on the gap,
 * and the words its description ends with when the Knudsen number came from a given pressure ('' otherwise, so the
 * default cases' descriptions stay as they were).
 */
export function gapValues(
  v: PresetValues,
  given: ReadonlySet<string> | undefined,
  temperatureK: number,
  lengthM: number,
): { values: PresetValues; pressureNote: string } {
  const model = modelFromSpecies(v.gas as SpeciesId, v.model as CollisionModelKind);
  const values = resolveGapPressure(v, given, { model, temperatureK, lengthM });
  const pressureNote = values.knudsenDerived ? `, from the pressure ${formatQuantity(values.pressure, 'Pa')}` : '';
  return { values, pressureNote };
}

export interface GapSetup {
  name: string;
  description: string;
  values: PresetValues;
  gasTemperatureK: number;
  bottom: { temperatureK: number; velocityXMPerS: number };
  top: { temperatureK: number; velocityXMPerS: number };
}

/** The shared 1D gap case: periodic in x with square cells, diffuse walls at y = 0 ('bottom') and y = H ('top'). */
export function gapCase(s: GapSetup): CaseInput {
  const v = s.values;
  const species = v.gas as SpeciesId;
  const kind = v.model as CollisionModelKind;
  const knudsen = v.knudsen as number;
  const gapM = v.gap as number;
  const model = modelFromSpecies(species, kind);
  // Resolved by gapValues (given or from the Knudsen number); recomputed only when build() was called without it.
  const pressurePa =
    (v.pressure as number | undefined) ?? pressureForKnudsenPa(model, s.gasTemperatureK, knudsen, gapM);
  const auto = defaultGapNumerics(knudsen);
  const cellsY = (v.cellsY as number | undefined) ?? auto.cellsY;
  const wall = (w: GapSetup['bottom']) => ({
    type: 'wall' as const,
    model: 'diffuse' as const,
    temperatureK: w.temperatureK,
    velocityMPerS: [w.velocityXMPerS, 0, 0] as [number, number, number],
  });
  const sampling: NonNullable<CaseInput['sampling']> = {};
  if (v.sampleSteps !== undefined) sampling.sampleSteps = v.sampleSteps as number;
  if (v.transientSteps !== undefined) sampling.transientSteps = v.transientSteps as number;
  return {
    schemaVersion: CASE_SCHEMA_VERSION,
    name: s.name,
    description: s.description,
    gas: { species, model: kind },
    initial: {
      pressurePa,
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
