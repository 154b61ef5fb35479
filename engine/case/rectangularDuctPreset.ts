/**
 * Preset `rectangularDuct`: the cross-section of a long rectangular duct (a MEMS microchannel, a rectangular vacuum
 * slot), height H (the smaller side, along y) and width W = H / aspectRatio (along x), walls on all four sides, the
 * gas driven along the duct (z, out of the plane) by a uniform body acceleration — the linear stand-in for an axial
 * pressure gradient, as `poiseuille` is for the planar channel. The run reports the flow along the duct and its
 * reduced flow rate G_P with ṁ = (H² W / v0)(−dp/dx) G_P and δ = pH/(μ v0), so that W → ∞ gives the planar channel's.
 * Supported cross-sections: rectangles (this preset) and, in a case file, any union of rectangles left after solid
 * blocks are cut out of the domain (an L or a T), every wall with its own model and accommodation.
 */
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, mostProbableSpeedMPerS, type CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import { type Preset, gasParameter, modelParameter, knudsenParameter } from './presetParameters';
import { gapValues } from './gapCase';
import { knudsenText, pressureParameter } from './pressurePresetParameters';
import { accommodationParameter, ductCommon, ductNumerics, temperatureParameter, wallOf } from './ductPresetParts';

export const rectangularDuct: Preset = {
  name: 'rectangularDuct',
  description:
    'cross-section of a long rectangular duct (height H, width W), walls on all four sides, gas driven along the duct by a uniform body acceleration (the stand-in for an axial pressure gradient)',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, description: 'Knudsen number λ/H on the height H (the smaller side)' },
    pressureParameter,
    {
      name: 'height',
      label: 'Height H',
      kind: 'length',
      unitShown: 'µm',
      default: 1e-6,
      min: 0,
      exclusiveMin: true,
      description: 'height H of the cross-section, its smaller side',
    },
    {
      name: 'aspectRatio',
      label: 'Aspect ratio H/W',
      kind: 'dimensionless',
      unitShown: '',
      default: 1,
      min: 0,
      exclusiveMin: true,
      description: 'height over width, in (0, 1]: 1 a square duct, small a wide slot',
    },
    {
      name: 'acceleration',
      label: 'Body acceleration',
      kind: 'acceleration',
      unitShown: 'm/s²',
      default: null,
      min: 0,
      exclusiveMin: true,
      description: 'body acceleration along the duct; default: a mean speed of about 5 % of v0 = sqrt(2kT/m)',
    },
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(input, given) {
    const h = input.height as number;
    const aspect = input.aspectRatio as number;
    if (!(aspect > 0 && aspect <= 1)) throw new Error(`aspectRatio ${aspect} must be above 0 and at most 1`);
    const w = h / aspect;
    const model = modelFromSpecies(input.gas as SpeciesId, input.model as CollisionModelKind);
    const { values: v, pressureNote } = gapValues(input, given, input.temperature as number, h);
    const p = v.pressure as number;
    const v0 = mostProbableSpeedMPerS(model.massKg, v.temperature as number);
    const kn = v.knudsen as number;
    const delta = Math.sqrt(Math.PI) / (2 * kn);
    // Mean speed ≈ H a G_P / v0; G_P ≈ δ/6·(1 − 0.63 H/W) + 1.3 across the range (the no-slip series and a slip
    // term; Sharipov 1999): aim at 0.05 v0.
    const a =
      (v.acceleration as number | undefined) ?? (0.05 * v0 * v0) / (h * ((delta / 6) * (1 - 0.63 * aspect) + 1.3));
    // Cells of λ/3 across the height (at least 12) and square along the width; 30 particles a cell (a 2D case).
    const cellsY = (v.cellsY as number | undefined) ?? Math.max(12, Math.ceil(3 / kn - 1e-9));
    const c = ductCommon({ ...v, cellsY }, p, w, h);
    const wall = wallOf(v);
    return {
      ...c,
      name: `rectangularDuct ${v.gas} Kn ${knudsenText(v)} H/W ${aspect}`,
      description: `Cross-section of a rectangular duct of ${v.gas} (${v.model}), Kn = ${knudsenText(v)}${pressureNote}, ${formatQuantity(h, 'µm')} × ${formatQuantity(w, 'µm')}, acceleration ${a.toPrecision(3)} m/s² along the duct`,
      domain: { lengthXM: w, lengthYM: h, characteristicLengthM: h },
      boundaries: { left: wall, right: wall, bottom: wall, top: wall },
      bodyAccelerationZMPerS2: a,
      numerics: {
        ...c.numerics,
        particlesPerCell: (v.particlesPerCell as number | undefined) ?? 30,
      },
    };
  },
};
