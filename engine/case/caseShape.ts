/**
 * The case file's fields and their defaults, before the checks that span several fields (schema.ts, checkGeometry.ts):
 * a module of its own so that those checks can name the parsed shape (CaseDraft) without importing schema.ts.
 */
import { z } from 'zod';
import { CASE_SCHEMA_VERSION } from './caseConstants';
import { gasSchema } from './gasSchema';
import { boundarySchema } from './boundarySchema';
import { blockSchema, flowReportSchema, flowSectionSchema } from './blockSchema';
import { integer, positive, velocity } from './schemaFields';

export const caseShape = z.strictObject({
  schemaVersion: z.literal(CASE_SCHEMA_VERSION, { error: `schemaVersion must be ${CASE_SCHEMA_VERSION}` }),
  name: z.string().min(1, { error: 'give the case a name' }),
  description: z.string().optional(),
  gas: gasSchema,
  initial: z.strictObject({
    pressurePa: positive('initial pressure (Pa)'),
    temperatureK: positive('initial temperature (K)'),
    velocityMPerS: velocity,
  }),
  domain: z.strictObject({
    lengthXM: positive('domain length in x (m)'),
    lengthYM: positive('domain length in y (m)'),
    /** Length the Knudsen number and rarefaction parameter are based on; defaults to lengthYM (the gap). */
    characteristicLengthM: positive('characteristic length (m)').optional(),
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
  bodyAccelerationXMPerS2: z.number({ error: 'bodyAccelerationXMPerS2 must be a number (m/s²)' }).finite().default(0),
  flowReport: flowReportSchema.optional(),
  numerics: z
    .strictObject({
      cellsX: integer('numerics.cellsX', 1).optional(),
      cellsY: integer('numerics.cellsY', 1).optional(),
      particlesPerCell: z
        .number()
        .min(1, { error: 'particlesPerCell must be at least 1 (20 or more is advised)' })
        .optional(),
      timeStepS: positive('time step (s)').optional(),
      subcellsPerCellSide: integer('numerics.subcellsPerCellSide', 1)
        .max(8, { error: 'subcellsPerCellSide must be at most 8' })
        .default(2),
      maxParticles: integer('numerics.maxParticles', 1).default(20_000_000),
    })
    .default({ subcellsPerCellSide: 2, maxParticles: 20_000_000 }),
  sampling: z
    .strictObject({
      transientSteps: integer('sampling.transientSteps', 0).optional(),
      sampleSteps: integer('sampling.sampleSteps', 1).optional(),
      wallBins: integer('sampling.wallBins', 1).optional(),
    })
    .default({}),
  seed: integer('seed', 0)
    .max(2 ** 32 - 1, { error: 'seed must be below 2^32' })
    .default(1),
});

/** A case as parsed field by field, before the cross-field checks. */
export type CaseDraft = z.output<typeof caseShape>;
