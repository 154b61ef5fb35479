/**
 * The geometry the channel, tube, slit and orifice presets share: a duct (or a plate's opening) between two vessel
 * regions whose far ends are reservoirs at the upstream and downstream pressures, with the flow sections and the
 * flow report that the duct's results are read from (names in ductPresets.ts).
 */
import type { CaseInput } from './schema';
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, type CollisionModelKind } from '../gas/molecularModel';
import { formatQuantity } from '../units/engineeringUnits';
import { type PresetValues, pressureForKnudsenPa } from './presetParameters';
import { ductCommon, wallOf } from './ductPresetParts';

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
  const c = ductCommon(v, p.mean, lx, ly);
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
