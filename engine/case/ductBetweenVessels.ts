/**
 * The geometry the channel, tube, slit and orifice presets share: a duct (or a plate's opening) between two vessel
 * regions whose far ends are reservoirs at the upstream and downstream pressures, with the flow sections and the
 * flow report that the duct's results are read from (names in ductPresets.ts). The vessel pressures come from the
 * Knudsen number or are given (pressurePresetParameters.ts).
 */
import type { CaseInput } from './schema';
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, type CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import type { PresetValues } from './presetParameters';
import { type KnudsenScale, resolveVesselPressures } from './pressurePresetParameters';
import { ductCommon, wallOf } from './ductPresetParts';

/** The scale the Knudsen number is formed on: the preset's gas and temperature, and the duct's size. */
function scaleOf(v: PresetValues, sizeM: number): KnudsenScale {
  const model = modelFromSpecies(v.gas as SpeciesId, v.model as CollisionModelKind);
  return { model, temperatureK: v.temperature as number, lengthM: sizeM };
}

function reservoirs(v: PresetValues, p: { up: number; down: number }) {
  const t = v.temperature as number;
  return {
    left: { type: 'reservoir' as const, pressurePa: p.up, temperatureK: t },
    right: { type: 'reservoir' as const, pressurePa: p.down, temperatureK: t },
  };
}

/**
 * A duct of size `size` (gap or radius) and length `length` between two vessel regions of length `vessel` and
 * height (planar) or radius (axisymmetric) `vesselSize`, the vessels' far ends held at the vessel pressures.
 */
export function ductBetweenVessels(
  v: PresetValues,
  o: {
    planar: boolean;
    size: number;
    length: number;
    vessel: number;
    vesselSize: number;
    blocks: 'channel' | 'tube' | 'slit' | 'orifice';
  },
  given?: ReadonlySet<string>,
): CaseInput {
  const state = resolveVesselPressures(v, given, scaleOf(v, o.size));
  const p = { up: state.upPa, down: state.downPa, mean: state.meanPa };
  // Derived numbers are rounded for reading; given ones are shown as given (the default names stay as they were).
  const kn = state.knudsenDerived ? Number(state.knudsen.toPrecision(4)) : state.knudsen;
  const ratio = given?.has('upstreamPressure') ? Number(state.ratio.toPrecision(4)) : state.ratio;
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
  const c = ductCommon(v, p.mean, lx, ly);
  return {
    ...c,
    name: `${o.blocks} ${v.gas} Kn ${kn} ratio ${ratio}`,
    description: `${o.blocks} of ${v.gas} (${v.model}) between vessels at ${formatQuantity(p.up, 'Pa')} and ${formatQuantity(p.down, 'Pa')}, Kn = ${kn} at the mean pressure`,
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
