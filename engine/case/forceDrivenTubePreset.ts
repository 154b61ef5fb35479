/**
 * Preset `forceDrivenTube`: the force-driven round tube, periodic along its axis x, the radius along y with the axis
 * at the bottom and the wall at the top (axisymmetric), driven by a uniform body acceleration — the stand-in for a long
 * pressure-driven tube in the linear regime, as `poiseuille` is for the channel. Its flow section `middle` gives the
 * tube's reduced flow rate G_P (and G_T from the heat flow) for a coefficient table (`tenuis coefficients`).
 */
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, mostProbableSpeedMPerS, type CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import { type Preset, gasParameter, modelParameter, knudsenParameter, defaultGapNumerics } from './presetParameters';
import { gapValues } from './gapCase';
import { knudsenText, pressureParameter } from './pressurePresetParameters';
import { accommodationParameter, ductCommon, ductNumerics, temperatureParameter, wallOf } from './ductPresetParts';

export const forceDrivenTube: Preset = {
  name: 'forceDrivenTube',
  description:
    'force-driven round tube: gas in a tube of radius R, periodic along its axis, driven by a uniform body acceleration (the stand-in for a long pressure-driven tube in the linear regime; axisymmetric)',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, description: 'Knudsen number λ/R on the tube radius' },
    pressureParameter,
    {
      name: 'radius',
      label: 'Tube radius',
      kind: 'length',
      unitShown: 'mm',
      default: 1e-3,
      min: 0,
      exclusiveMin: true,
      description: 'tube radius R',
    },
    {
      name: 'acceleration',
      label: 'Body acceleration',
      kind: 'acceleration',
      unitShown: 'm/s²',
      default: null,
      min: 0,
      exclusiveMin: true,
      description:
        'body acceleration along the axis; default: a mean speed of about 5 % of v0 = sqrt(2kT/m) (linear regime)',
    },
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(input, given) {
    const r = input.radius as number;
    const model = modelFromSpecies(input.gas as SpeciesId, input.model as CollisionModelKind);
    const { values: v, pressureNote } = gapValues(input, given, input.temperature as number, r);
    const p = v.pressure as number;
    const v0 = mostProbableSpeedMPerS(model.massKg, v.temperature as number);
    const delta = Math.sqrt(Math.PI) / (2 * (v.knudsen as number));
    // Mean speed ≈ R a G_P / v0 with G_P ≈ δ/4 + 1.5 across the range (Sharipov & Seleznev 1998): aim at 0.05 v0.
    const a = (v.acceleration as number | undefined) ?? (0.05 * v0 * v0) / (r * (delta / 4 + 1.5));
    const auto = defaultGapNumerics(v.knudsen as number);
    const cellsY = (v.cellsY as number | undefined) ?? auto.cellsY;
    const lx = r / cellsY;
    const c = ductCommon({ ...v, cellsY }, p, lx, r);
    return {
      ...c,
      name: `forceDrivenTube ${v.gas} Kn ${knudsenText(v)}`,
      description: `Force-driven round tube of ${v.gas} (${v.model}), Kn = ${knudsenText(v)}${pressureNote}, radius ${formatQuantity(r, 'mm')}, acceleration ${a.toPrecision(3)} m/s²`,
      domain: { lengthXM: lx, lengthYM: r, geometry: 'axisymmetric', characteristicLengthM: r },
      boundaries: { left: { type: 'periodic' }, right: { type: 'periodic' }, bottom: { type: 'axis' }, top: wallOf(v) },
      bodyAccelerationXMPerS2: a,
      flowSections: [{ name: 'middle', xM: lx / 2 }],
      flowReport: { duct: 'tube', sizeM: r },
      numerics: {
        ...c.numerics,
        cellsX: 1,
        cellsY,
        particlesPerCell: (v.particlesPerCell as number | undefined) ?? auto.particlesPerCell,
      },
    };
  },
};
