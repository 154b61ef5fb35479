/**
 * Preset `poiseuille`: the force-driven planar channel, periodic along x between two walls and driven by a uniform
 * body acceleration — the stand-in for a long pressure-driven channel in the linear regime, with its one flow
 * section `middle`.
 */
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, mostProbableSpeedMPerS, type CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import { type Preset, gasParameter, modelParameter, knudsenParameter, defaultGapNumerics } from './presetParameters';
import { gapValues } from './gapCase';
import { knudsenText, pressureParameter } from './pressurePresetParameters';
import { accommodationParameter, ductCommon, ductNumerics, temperatureParameter, wallOf } from './ductPresetParts';

export const poiseuille: Preset = {
  name: 'poiseuille',
  description:
    'force-driven planar channel: gas between two parallel walls, periodic along x, driven by a uniform body acceleration (the stand-in for a long pressure-driven channel in the linear regime)',
  parameters: [
    gasParameter,
    modelParameter,
    knudsenParameter,
    pressureParameter,
    {
      name: 'gap',
      label: 'Gap',
      kind: 'length',
      unitShown: 'µm',
      default: 1e-6,
      min: 0,
      exclusiveMin: true,
      description: 'distance H between the walls',
    },
    {
      name: 'acceleration',
      label: 'Body acceleration',
      kind: 'acceleration',
      unitShown: 'm/s²',
      default: null,
      min: 0,
      exclusiveMin: true,
      description: 'body acceleration along x; default: a mean speed of about 5 % of v0 = sqrt(2kT/m) (linear regime)',
    },
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(input, given) {
    const h = input.gap as number;
    const model = modelFromSpecies(input.gas as SpeciesId, input.model as CollisionModelKind);
    const { values: v, pressureNote } = gapValues(input, given, input.temperature as number, h);
    const p = v.pressure as number;
    const v0 = mostProbableSpeedMPerS(model.massKg, v.temperature as number);
    const delta = Math.sqrt(Math.PI) / (2 * (v.knudsen as number));
    // Mean speed ≈ H a G_P / v0 with G_P ≈ δ/6 + 1.5 across the range (Sharipov & Seleznev 1998): aim at 0.05 v0.
    const a = (v.acceleration as number | undefined) ?? (0.05 * v0 * v0) / (h * (delta / 6 + 1.5));
    const auto = defaultGapNumerics(v.knudsen as number);
    const cellsY = (v.cellsY as number | undefined) ?? auto.cellsY;
    const lx = h / cellsY;
    const c = ductCommon({ ...v, cellsY }, p, lx, h);
    return {
      ...c,
      name: `poiseuille ${v.gas} Kn ${knudsenText(v)}`,
      description: `Force-driven planar channel of ${v.gas} (${v.model}), Kn = ${knudsenText(v)}${pressureNote}, gap ${formatQuantity(h, 'µm')}, acceleration ${a.toPrecision(3)} m/s²`,
      domain: { lengthXM: lx, lengthYM: h, characteristicLengthM: h },
      boundaries: { left: { type: 'periodic' }, right: { type: 'periodic' }, bottom: wallOf(v), top: wallOf(v) },
      bodyAccelerationXMPerS2: a,
      flowSections: [{ name: 'middle', xM: lx / 2 }],
      flowReport: { duct: 'channel', sizeM: h },
      numerics: {
        ...c.numerics,
        cellsX: 1,
        cellsY,
        particlesPerCell: (v.particlesPerCell as number | undefined) ?? auto.particlesPerCell,
      },
    };
  },
};
