/**
 * The case file's fields and their defaults, before the checks that span several fields (schema.ts, checkGeometry.ts):
 * a module of its own so that those checks can name the parsed shape (CaseDraft) without importing schema.ts.
 */
import { z } from 'zod';
import { CASE_SCHEMA_VERSION } from './caseConstants';
import { gasSchema } from './gasSchema';
import { boundarySchema } from './boundarySchema';
import { blockSchema, flowReportSchema, flowSectionSchema } from './blockSchema';
import { bounded, integer, length, pressure, temperature, velocity } from './schemaFields';

/**
 * Upper bounds of the whole numbers that size an allocation or a loop (common practice, no source): each is far above
 * what a case needs (the presets use at most a few hundred cells a side and a few hundred wall bins) and far below
 * what would exhaust memory on its own. The planner bounds the products (cells, particles, memory) besides.
 */
export const MAX_CELLS_PER_SIDE = 100_000;
export const MAX_WALL_BINS = 10_000;
export const MAX_PARTICLES = 500_000_000;
export const MAX_STEPS = 1_000_000_000;

export const caseShape = z.strictObject({
  schemaVersion: z.literal(CASE_SCHEMA_VERSION, { error: `schemaVersion must be ${CASE_SCHEMA_VERSION}` }),
  name: z.string().min(1, { error: 'give the case a name' }),
  description: z.string().optional(),
  gas: gasSchema,
  initial: z.strictObject({
    pressurePa: pressure('initial pressure (Pa)'),
    temperatureK: temperature('initial temperature (K)'),
    velocityMPerS: velocity,
  }),
  domain: z.strictObject({
    lengthXM: length('domain length in x (m)'),
    lengthYM: length('domain length in y (m)'),
    /** Length the Knudsen number and rarefaction parameter are based on; defaults to lengthYM (the gap). */
    characteristicLengthM: length('characteristic length (m)').optional(),
    /** planar: unit depth in z. axisymmetric: x is the axis, y the radius, the bottom side the axis. */
    geometry: z
      .enum(['planar', 'axisymmetric'], { error: 'domain.geometry must be planar or axisymmetric' })
      .default('planar'),
  }),
  boundaries: z.strictObject({
    left: boundarySchema,
    right: boundarySchema,
    bottom: boundarySchema,
    top: boundarySchema,
  }),
  blocks: z.array(blockSchema).max(64, { error: 'at most 64 blocks' }).default([]),
  flowSections: z.array(flowSectionSchema).max(16, { error: 'at most 16 flow sections' }).default([]),
  /** Uniform body acceleration along x (m/s²): drives a periodic channel as a stand-in for a pressure gradient. */
  bodyAccelerationXMPerS2: bounded('bodyAccelerationXMPerS2 (m/s²)', { min: -1e15, max: 1e15, unit: 'm/s²' }).default(
    0,
  ),
  /**
   * Uniform body acceleration along z (m/s²), out of the plane of a planar domain: the domain is then a duct's
   * cross-section and the gas is driven along the duct (the cross-section mode). Left out: 0.
   */
  bodyAccelerationZMPerS2: bounded('bodyAccelerationZMPerS2 (m/s²)', {
    min: -1e15,
    max: 1e15,
    unit: 'm/s²',
  }).optional(),
  flowReport: flowReportSchema.optional(),
  /** How DSMC is compared with the continuum models: the relative deviation a model may have and be adequate. */
  comparison: z
    .strictObject({
      tolerance: bounded('the verdict tolerance (relative deviation a model may have, e.g. 0.02 for 2 %)', {
        max: 1,
      }).optional(),
    })
    .optional(),
  numerics: z
    .strictObject({
      cellsX: integer('numerics.cellsX', 1, MAX_CELLS_PER_SIDE).optional(),
      cellsY: integer('numerics.cellsY', 1, MAX_CELLS_PER_SIDE).optional(),
      particlesPerCell: bounded('particlesPerCell (20 or more is advised)', { min: 1, max: 10_000 }).optional(),
      timeStepS: bounded('time step (s)', { max: 1e3, unit: 's' }).optional(),
      subcellsPerCellSide: integer('numerics.subcellsPerCellSide', 1, 8).default(2),
      maxParticles: integer('numerics.maxParticles', 1, MAX_PARTICLES).default(20_000_000),
    })
    .default({ subcellsPerCellSide: 2, maxParticles: 20_000_000 }),
  sampling: z
    .strictObject({
      transientSteps: integer('sampling.transientSteps', 0, MAX_STEPS).optional(),
      sampleSteps: integer('sampling.sampleSteps', 1, MAX_STEPS).optional(),
      wallBins: integer('sampling.wallBins', 1, MAX_WALL_BINS).optional(),
    })
    .default({}),
  seed: integer('seed', 0, 2 ** 32 - 1).default(1),
});

/** A case as parsed field by field, before the cross-field checks. */
export type CaseDraft = z.output<typeof caseShape>;
