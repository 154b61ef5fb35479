/**
 * Presets for sizing flows through ducts: a force-driven periodic channel, a planar channel and a round tube between
 * two vessels, a thin plate with a slit (planar) and with a circular orifice (axisymmetric).
 *
 * Names that results use, stable from one version to the next:
 * - sides `left` (upstream vessel, a reservoir at the upstream pressure) and `right` (downstream vessel);
 * - solid walls as blocks: `lowerWall` / `upperWall` (channel), `wall` (tube), `lowerPlate` / `upperPlate` (slit),
 *   `plate` (orifice); their faces report as BLOCK.left, BLOCK.right, BLOCK.bottom, BLOCK.top (e.g. the channel's
 *   wetted surfaces are `lowerWall.top` and `upperWall.bottom`, the tube's `wall.bottom`);
 * - flow sections `inlet` (duct entrance), `middle` and `outlet` (duct exit); the orifice and slit have `upstream`,
 *   `opening` (in the plate) and `downstream`; the force-driven channel has `middle`.
 * Knudsen numbers use the viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m)) at the mean of the two vessel
 * pressures and the duct's gap H or radius R (the force-driven channel: at its pressure and gap).
 */
import type { CaseInput } from './schema';
import { CASE_SCHEMA_VERSION } from './schema';
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, mostProbableSpeedMPerS, type CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import {
  type Preset,
  type PresetParameter,
  type PresetValues,
  gasParameter,
  modelParameter,
  knudsenParameter,
  pressureForKnudsenPa,
  defaultGapNumerics,
  presetSampling,
} from './presetParameters';

const temperatureParameter: PresetParameter = {
  name: 'temperature',
  kind: 'temperature',
  unitShown: 'K',
  default: 300,
  min: 0,
  exclusiveMin: true,
  description: 'gas, wall and vessel temperature',
};
const accommodationParameter: PresetParameter = {
  name: 'accommodation',
  kind: 'dimensionless',
  unitShown: '',
  default: 1,
  min: 0,
  description: 'tangential momentum accommodation of the walls (Maxwell model; 1 = diffuse)',
};
const pressureRatioParameter: PresetParameter = {
  name: 'pressureRatio',
  kind: 'dimensionless',
  unitShown: '',
  default: 2,
  min: 1,
  exclusiveMin: true,
  description: 'upstream over downstream vessel pressure',
};
const ductNumerics: readonly PresetParameter[] = [
  {
    name: 'cellsY',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'cells across the domain; default: cells of at most λ/3 at the densest state, at least 20 across',
  },
  {
    name: 'particlesPerCell',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'simulated particles per cell at the start; default 30',
  },
  {
    name: 'transientSteps',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 0,
    description: 'steps before sampling starts; default: ended automatically at steady state',
  },
  {
    name: 'sampleSteps',
    kind: 'count',
    unitShown: '',
    default: null,
    min: 1,
    description: 'sampled steps; default chosen by the planner',
  },
  { name: 'seed', kind: 'count', unitShown: '', default: 1, min: 0, description: 'random seed' },
];

type Wall = NonNullable<CaseInput['blocks']>[number]['wall'];

function wallOf(v: PresetValues): Wall {
  const t = v.temperature as number;
  const a = v.accommodation as number;
  if (a > 1) throw new Error(`accommodation ${a} must be between 0 and 1`);
  return a === 1
    ? { type: 'wall', model: 'diffuse', temperatureK: t }
    : { type: 'wall', model: 'maxwell', accommodation: a, temperatureK: t };
}

/** Gas, numerics and sampling shared by the duct presets; `cellsAcross` cells in y, square cells along x. */
function common(
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

/** Upstream and downstream pressures whose mean gives the Knudsen number asked for on `sizeM`. */
function vesselPressures(v: PresetValues, sizeM: number): { up: number; down: number; mean: number } {
  const model = modelFromSpecies(v.gas as SpeciesId, v.model as CollisionModelKind);
  const mean = pressureForKnudsenPa(model, v.temperature as number, v.knudsen as number, sizeM);
  const ratio = v.pressureRatio as number;
  const down = (2 * mean) / (1 + ratio);
  return { up: ratio * down, down, mean };
}

function reservoirs(v: PresetValues, p: { up: number; down: number }) {
  const t = v.temperature as number;
  return {
    left: { type: 'reservoir' as const, pressurePa: p.up, temperatureK: t },
    right: { type: 'reservoir' as const, pressurePa: p.down, temperatureK: t },
  };
}

const poiseuille: Preset = {
  name: 'poiseuille',
  description:
    'force-driven planar channel: gas between two parallel walls, periodic along x, driven by a uniform body acceleration (the stand-in for a long pressure-driven channel in the linear regime)',
  parameters: [
    gasParameter,
    modelParameter,
    knudsenParameter,
    {
      name: 'gap',
      kind: 'length',
      unitShown: 'µm',
      default: 1e-6,
      min: 0,
      exclusiveMin: true,
      description: 'distance H between the walls',
    },
    {
      name: 'acceleration',
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
  build(v) {
    const h = v.gap as number;
    const model = modelFromSpecies(v.gas as SpeciesId, v.model as CollisionModelKind);
    const p = pressureForKnudsenPa(model, v.temperature as number, v.knudsen as number, h);
    const v0 = mostProbableSpeedMPerS(model.massKg, v.temperature as number);
    const delta = Math.sqrt(Math.PI) / (2 * (v.knudsen as number));
    // Mean speed ≈ H a G_P / v0 with G_P ≈ δ/6 + 1.5 across the range (Sharipov & Seleznev 1998): aim at 0.05 v0.
    const a = (v.acceleration as number | undefined) ?? (0.05 * v0 * v0) / (h * (delta / 6 + 1.5));
    const auto = defaultGapNumerics(v.knudsen as number);
    const cellsY = (v.cellsY as number | undefined) ?? auto.cellsY;
    const lx = h / cellsY;
    const c = common({ ...v, cellsY, sampleSteps: v.sampleSteps ?? auto.sampleSteps }, p, lx, h);
    return {
      ...c,
      name: `poiseuille ${v.gas} Kn ${v.knudsen}`,
      description: `Force-driven planar channel of ${v.gas} (${v.model}), Kn = ${v.knudsen}, gap ${formatQuantity(h, 'µm')}, acceleration ${a.toPrecision(3)} m/s²`,
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

const lengthParameter = (name: string, of: string, def: number, description: string): PresetParameter => ({
  name,
  kind: 'dimensionless',
  unitShown: '',
  default: def,
  min: 0,
  description: `${description} (in units of the ${of})`,
});

/**
 * A duct of size `size` (gap or radius) and length `length` between two vessel regions of length `vessel` and
 * height (planar) or radius (axisymmetric) `vesselSize`, the vessels' far ends held at the vessel pressures.
 */
function ductBetweenVessels(
  v: PresetValues,
  o: {
    planar: boolean;
    size: number;
    length: number;
    vessel: number;
    vesselSize: number;
    blocks: 'channel' | 'tube' | 'slit' | 'orifice';
  },
): CaseInput {
  const p = vesselPressures(v, o.size);
  const lx = 2 * o.vessel + o.length;
  const ly = o.planar ? o.vesselSize : o.vesselSize;
  const x0 = o.vessel;
  const x1 = o.vessel + o.length;
  const wall = wallOf(v);
  // Planar ducts are centred in y; axisymmetric ones run along the axis.
  const blocks = o.planar
    ? [
        {
          name: o.blocks === 'slit' ? 'lowerPlate' : 'lowerWall',
          xMinM: x0,
          xMaxM: x1,
          yMinM: 0,
          yMaxM: (ly - o.size) / 2,
          wall,
        },
        {
          name: o.blocks === 'slit' ? 'upperPlate' : 'upperWall',
          xMinM: x0,
          xMaxM: x1,
          yMinM: (ly + o.size) / 2,
          yMaxM: ly,
          wall,
        },
      ]
    : [{ name: o.blocks === 'orifice' ? 'plate' : 'wall', xMinM: x0, xMaxM: x1, yMinM: o.size, yMaxM: ly, wall }];
  const opening = o.blocks === 'slit' || o.blocks === 'orifice';
  const flowSections = opening
    ? [
        ...(o.vessel > 0 ? [{ name: 'upstream', xM: x0 / 2 }] : []),
        { name: 'opening', xM: (x0 + x1) / 2 },
        ...(o.vessel > 0 ? [{ name: 'downstream', xM: x1 + o.vessel / 2 }] : []),
      ]
    : [
        // At the duct's ends (inside it when there are no vessel regions).
        { name: 'inlet', xM: o.vessel > 0 ? x0 : o.length * 0.02 },
        { name: 'middle', xM: (x0 + x1) / 2 },
        { name: 'outlet', xM: o.vessel > 0 ? x1 : o.length * 0.98 },
      ];
  const vesselSide = o.vessel > 0 ? ({ type: 'symmetry' } as const) : wall;
  const c = common(v, p.mean, lx, ly);
  return {
    ...c,
    name: `${o.blocks} ${v.gas} Kn ${v.knudsen} ratio ${v.pressureRatio}`,
    description: `${o.blocks} of ${v.gas} (${v.model}) between vessels at ${formatQuantity(p.up, 'Pa')} and ${formatQuantity(p.down, 'Pa')}, Kn = ${v.knudsen} at the mean pressure`,
    domain: {
      lengthXM: lx,
      lengthYM: ly,
      characteristicLengthM: o.size,
      geometry: o.planar ? 'planar' : 'axisymmetric',
    },
    boundaries: {
      ...reservoirs(v, p),
      // Without vessel regions the duct's own walls are the domain's sides.
      bottom: o.planar ? (o.vessel > 0 ? { type: 'symmetry' } : wall) : { type: 'axis' },
      top: vesselSide,
    },
    blocks: o.vessel > 0 || opening ? blocks : [],
    flowSections,
    flowReport: { duct: o.blocks, sizeM: o.size, ...(opening ? {} : { lengthM: o.length }) },
  };
}

const channel: Preset = {
  name: 'channel',
  description:
    'planar channel of gap H and length L between two vessels held at different pressures (e.g. a MEMS microchannel)',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, default: 0.5, description: 'Knudsen number λ/H at the mean of the two vessel pressures' },
    {
      name: 'gap',
      kind: 'length',
      unitShown: 'µm',
      default: 1e-6,
      min: 0,
      exclusiveMin: true,
      description: 'channel gap H',
    },
    pressureRatioParameter,
    lengthParameter('lengthToGap', 'gap', 5, 'channel length L'),
    lengthParameter(
      'vesselLengthToGap',
      'gap',
      2,
      'length of each vessel region; 0 puts the vessels right at the channel ends',
    ),
    lengthParameter('vesselHeightToGap', 'gap', 3, 'height of the vessel regions'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v) {
    const h = v.gap as number;
    const vessel = (v.vesselLengthToGap as number) * h;
    return ductBetweenVessels(v, {
      planar: true,
      size: h,
      length: (v.lengthToGap as number) * h,
      vessel,
      vesselSize: vessel > 0 ? Math.max(1, v.vesselHeightToGap as number) * h : h,
      blocks: 'channel',
    });
  },
};

const tube: Preset = {
  name: 'tube',
  description:
    'round tube of radius R and length L between two vessels held at different pressures (axisymmetric; e.g. a pumping line)',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      default: 0.5,
      description: 'Knudsen number λ/R on the radius, at the mean of the two vessel pressures',
    },
    {
      name: 'radius',
      kind: 'length',
      unitShown: 'mm',
      default: 1e-3,
      min: 0,
      exclusiveMin: true,
      description: 'tube radius R',
    },
    pressureRatioParameter,
    lengthParameter('lengthToRadius', 'radius', 5, 'tube length L'),
    lengthParameter(
      'vesselLengthToRadius',
      'radius',
      2,
      'length of each vessel region; 0 puts the vessels right at the tube ends',
    ),
    lengthParameter('vesselRadiusToRadius', 'radius', 3, 'radius of the vessel regions'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v) {
    const r = v.radius as number;
    const vessel = (v.vesselLengthToRadius as number) * r;
    return ductBetweenVessels(v, {
      planar: false,
      size: r,
      length: (v.lengthToRadius as number) * r,
      vessel,
      vesselSize: vessel > 0 ? Math.max(1, v.vesselRadiusToRadius as number) * r : r,
      blocks: 'tube',
    });
  },
};

const slit: Preset = {
  name: 'slit',
  description: 'thin plate with a slit of width H between two vessels (planar)',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      default: 0.5,
      description: 'Knudsen number λ/H on the slit width, at the mean of the two vessel pressures',
    },
    {
      name: 'gap',
      kind: 'length',
      unitShown: 'µm',
      default: 10e-6,
      min: 0,
      exclusiveMin: true,
      description: 'slit width H',
    },
    pressureRatioParameter,
    lengthParameter('thicknessToGap', 'slit width', 0.1, 'plate thickness'),
    lengthParameter('vesselLengthToGap', 'slit width', 3, 'length of each vessel region'),
    lengthParameter('vesselHeightToGap', 'slit width', 4, 'height of the vessel regions'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v) {
    const h = v.gap as number;
    return ductBetweenVessels(v, {
      planar: true,
      size: h,
      length: Math.max(1e-3, v.thicknessToGap as number) * h,
      vessel: Math.max(0.5, v.vesselLengthToGap as number) * h,
      vesselSize: Math.max(1.5, v.vesselHeightToGap as number) * h,
      blocks: 'slit',
    });
  },
};

const orifice: Preset = {
  name: 'orifice',
  description: 'thin plate with a circular orifice of radius R between two vessels (axisymmetric)',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      default: 0.5,
      description: 'Knudsen number λ/R on the orifice radius, at the mean of the two vessel pressures',
    },
    {
      name: 'radius',
      kind: 'length',
      unitShown: 'mm',
      default: 0.5e-3,
      min: 0,
      exclusiveMin: true,
      description: 'orifice radius R',
    },
    pressureRatioParameter,
    lengthParameter('thicknessToRadius', 'radius', 0.1, 'plate thickness'),
    lengthParameter('vesselLengthToRadius', 'radius', 3, 'length of each vessel region'),
    lengthParameter('vesselRadiusToRadius', 'radius', 4, 'radius of the vessel regions'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v) {
    const r = v.radius as number;
    return ductBetweenVessels(v, {
      planar: false,
      size: r,
      length: Math.max(1e-3, v.thicknessToRadius as number) * r,
      vessel: Math.max(0.5, v.vesselLengthToRadius as number) * r,
      vesselSize: Math.max(1.5, v.vesselRadiusToRadius as number) * r,
      blocks: 'orifice',
    });
  },
};

export const DUCT_PRESETS = { poiseuille, channel, tube, slit, orifice } as const;
