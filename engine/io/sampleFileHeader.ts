/**
 * The JSON header of a sample file (format in DEVELOPERS.md, "Sample files"): its type and its validation, so a
 * file from disk or another machine is checked once, here, with messages that name the field.
 */
import { z } from 'zod';
import { CONTAINER_DTYPE } from './binaryContainer';

export const SAMPLE_FILE_FORMAT = 'tenuis-samples';
/** The one array element type of the binary container: IEEE 754 double, little-endian. */
export const SAMPLE_FILE_DTYPE = CONTAINER_DTYPE;

const count = z.number().int().min(0);
const positive = z.number().finite().positive();

const batchStoreHeader = z.object({
  /** Numbers per batch. */
  width: count,
  /** Steps per base unit (the plan's batchSteps). */
  unitSteps: z.number().int().min(1),
  /** Base units per complete batch. */
  batchLength: z.number().int().min(1),
  batches: count,
  /** Base units in the pending sums. */
  pendingLength: count,
  /** Complete batches of each replica, in order; they add up to batches. */
  segments: z.array(count),
});

export const sampleFileHeaderSchema = z.object({
  format: z.literal(SAMPLE_FILE_FORMAT),
  /** The case as parsed (SI units, defaults filled in), with the first replica's seed. */
  case: z.unknown(),
  /** For people and other tools reading the file; the reader re-plans the case and does not use it. */
  plan: z.object({
    cellsX: count,
    cellsY: count,
    timeStepS: positive,
    batchSteps: count,
    transientSteps: count,
    sampleSteps: count,
    particlesPerCell: positive,
    moleculesPerParticle: positive,
  }),
  geometry: z.object({
    cells: count,
    cellsX: count,
    cellsY: count,
    lengthX: positive,
    lengthY: positive,
    cellVolume: positive,
    timeStep: positive,
    massKg: positive,
    moleculesPerParticle: positive,
    rotationalDof: count,
    axisymmetric: z.boolean().default(false),
  }),
  wallNames: z.array(z.string()),
  replicas: z.number().int().min(1),
  /** The case seed of each replica. */
  seeds: z.array(z.number().int().min(0)),
  counters: z.object({
    steps: count,
    sampledSteps: count,
    particles: count,
    particleSteps: count,
    collisionCount: count,
    separationSum: z.number().finite().min(0),
  }),
  pendingSteps: count,
  cellStore: batchStoreHeader,
  wallStore: batchStoreHeader,
  arrays: z.array(
    z.object({
      name: z.string().min(1),
      dtype: z.literal(SAMPLE_FILE_DTYPE, { error: `array dtype must be ${SAMPLE_FILE_DTYPE}` }),
      /** Bytes from the start of the data block; a multiple of 8. */
      offset: count.multipleOf(8, { error: 'array offsets must be multiples of 8 bytes' }),
      /** Number of values. */
      length: count,
    }),
  ),
});

export type SampleFileHeader = z.infer<typeof sampleFileHeaderSchema>;
export type BatchStoreHeader = z.infer<typeof batchStoreHeader>;

/** Validates a parsed header: the header itself, or messages "header.field: problem". */
export function parseSampleFileHeader(
  input: unknown,
): { ok: true; value: SampleFileHeader } | { ok: false; errors: string[] } {
  const r = sampleFileHeaderSchema.safeParse(input);
  if (r.success) return { ok: true, value: r.data };
  return {
    ok: false,
    errors: r.error.issues.map((i) => `header${i.path.length ? `.${i.path.join('.')}` : ''}: ${i.message}`),
  };
}
