/** A closed, homogeneous gas: periodic on all four sides (no walls), square cells. Test scenario of our own. */
import { parseCase, type Case } from '../../engine/case/schema';
import type { Plan } from '../../engine/plan/plan';
import { planOrThrow } from '../support/planOrThrow';
import type { SpeciesId } from '../../engine/gas/species';

export interface BoxOptions {
  species: SpeciesId;
  model: 'HS' | 'VHS' | 'VSS';
  cellsPerSide: number;
  particlesPerCell: number;
  temperatureK?: number;
  pressurePa?: number;
  rotationalCollisionNumber?: number;
  seed?: number;
}

export function boxCase(o: BoxOptions): Case {
  const side = 1e-3;
  const r = parseCase({
    schemaVersion: 1,
    name: `box of ${o.species}`,
    gas: { species: o.species, model: o.model, rotationalCollisionNumber: o.rotationalCollisionNumber ?? 5 },
    initial: { pressurePa: o.pressurePa ?? 20, temperatureK: o.temperatureK ?? 273 },
    domain: { lengthXM: side, lengthYM: side },
    boundaries: {
      left: { type: 'periodic' },
      right: { type: 'periodic' },
      bottom: { type: 'periodic' },
      top: { type: 'periodic' },
    },
    numerics: { cellsX: o.cellsPerSide, cellsY: o.cellsPerSide, particlesPerCell: o.particlesPerCell },
    sampling: { transientSteps: 0, sampleSteps: 1 },
    seed: o.seed ?? 7,
  });
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.value;
}

export function boxPlan(o: BoxOptions): Plan {
  return planOrThrow(boxCase(o));
}
