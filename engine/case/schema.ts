/**
 * The case file: what a user (form, file or preset) asks Tenuis to simulate.
 *
 * All quantities are SI and their names carry the unit (`pressurePa`, `lengthYM`), so a file read without the
 * documentation cannot be misunderstood. Engineering units (mbar, Torr, µm, °C …) are converted at the edges (UI,
 * command line), never here. Validation happens once, here; everything downstream trusts a parsed `Case`.
 */
import { z } from 'zod';
import { SPECIES_IDS } from '../gas/species';

export const CASE_SCHEMA_VERSION = 1;

export const COLLISION_MODELS = ['HS', 'VHS', 'VSS'] as const;
export const WALL_MODELS = ['diffuse', 'specular', 'maxwell', 'cercignaniLampis'] as const;
export const SIDE_NAMES = ['left', 'right', 'bottom', 'top'] as const;
export type SideName = (typeof SIDE_NAMES)[number];

const positive = (what: string) =>
  z.number({ error: `${what} must be a number` }).finite().positive({ error: `${what} must be greater than zero` });
const fraction = (what: string) =>
  z
    .number({ error: `${what} must be a number between 0 and 1` })
    .min(0, { error: `${what} must be between 0 and 1` })
    .max(1, { error: `${what} must be between 0 and 1` });
const velocity = z
  .tuple([z.number().finite(), z.number().finite(), z.number().finite()], {
    error: 'velocity must be three numbers [x, y, z] in m/s',
  })
  .default([0, 0, 0]);

const customGas = z.strictObject({
  name: z.string().min(1, { error: 'give the custom gas a name' }),
  massKg: positive('molecular mass (kg)').max(1e-22, { error: 'molecular mass looks wrong: expected kg per molecule, e.g. 6.63e-26 for argon' }),
  referenceDiameterM: positive('reference diameter (m)').max(1e-8, { error: 'reference diameter looks wrong: expected metres, e.g. 4.17e-10' }),
  referenceTemperatureK: positive('reference temperature (K)').default(273),
  viscosityIndex: z.number().min(0.5, { error: 'viscosity index ω must be between 0.5 (hard sphere) and 1 (Maxwell molecules)' }).max(1, { error: 'viscosity index ω must be between 0.5 (hard sphere) and 1 (Maxwell molecules)' }),
  scatteringExponent: z.number().min(1, { error: 'VSS scattering exponent α must be between 1 (isotropic) and 2' }).max(2, { error: 'VSS scattering exponent α must be between 1 (isotropic) and 2' }).default(1),
  rotationalDof: z.union([z.literal(0), z.literal(2), z.literal(3)], { error: 'rotational degrees of freedom must be 0 (monatomic), 2 (linear) or 3 (non-linear)' }),
});

const gas = z
  .strictObject({
    species: z.enum(SPECIES_IDS, { error: `gas.species must be one of ${SPECIES_IDS.join(', ')}, or give gas.custom instead` }).optional(),
    custom: customGas.optional(),
    model: z.enum(COLLISION_MODELS, { error: 'gas.model must be HS, VHS or VSS' }).default('VHS'),
    rotationalCollisionNumber: z.number().min(1, { error: 'rotational collision number must be at least 1' }).default(5),
  })
  .check((ctx) => {
    const g = ctx.value;
    if ((g.species === undefined) === (g.custom === undefined)) {
      ctx.issues.push({ code: 'custom', input: g, message: 'give exactly one of gas.species (a table gas) or gas.custom (your own molecular data)', path: ['species'] });
    }
    if (g.species === 'air' && g.model === 'VSS') {
      ctx.issues.push({ code: 'custom', input: g, message: 'no VSS data for air in the species table: use model VHS or HS, or a custom gas', path: ['model'] });
    }
  });

const wall = z
  .strictObject({
    type: z.literal('wall'),
    model: z.enum(WALL_MODELS, { error: `wall model must be one of ${WALL_MODELS.join(', ')}` }).default('diffuse'),
    temperatureK: positive('wall temperature (K)'),
    velocityMPerS: velocity,
    accommodation: fraction('accommodation coefficient').optional(),
    normalAccommodation: fraction('normal energy accommodation').optional(),
    tangentialAccommodation: fraction('tangential momentum accommodation').optional(),
  })
  .check((ctx) => {
    const w = ctx.value;
    if (w.model === 'maxwell' && w.accommodation === undefined) {
      ctx.issues.push({ code: 'custom', input: w, message: 'a Maxwell wall needs accommodation (0 = specular, 1 = diffuse)', path: ['accommodation'] });
    }
    if (w.model === 'cercignaniLampis' && (w.normalAccommodation === undefined || w.tangentialAccommodation === undefined)) {
      ctx.issues.push({ code: 'custom', input: w, message: 'a Cercignani–Lampis wall needs normalAccommodation and tangentialAccommodation, each between 0 and 1', path: ['normalAccommodation'] });
    }
  });

const boundary = z.discriminatedUnion(
  'type',
  [wall, z.strictObject({ type: z.literal('periodic') }), z.strictObject({ type: z.literal('symmetry') })],
  { error: 'boundary type must be wall, periodic or symmetry' },
);

const integer = (what: string, min: number) =>
  z.number({ error: `${what} must be a whole number` }).int({ error: `${what} must be a whole number` }).min(min, { error: `${what} must be at least ${min}` });

export const caseSchema = z
  .strictObject({
    schemaVersion: z.literal(CASE_SCHEMA_VERSION, { error: `schemaVersion must be ${CASE_SCHEMA_VERSION}` }),
    name: z.string().min(1, { error: 'give the case a name' }),
    description: z.string().optional(),
    gas,
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
    }),
    boundaries: z.strictObject({ left: boundary, right: boundary, bottom: boundary, top: boundary }),
    numerics: z
      .strictObject({
        cellsX: integer('numerics.cellsX', 1).optional(),
        cellsY: integer('numerics.cellsY', 1).optional(),
        particlesPerCell: z.number().min(1, { error: 'particlesPerCell must be at least 1 (20 or more is advised)' }).optional(),
        timeStepS: positive('time step (s)').optional(),
        subcellsPerCellSide: integer('numerics.subcellsPerCellSide', 1).max(8, { error: 'subcellsPerCellSide must be at most 8' }).default(2),
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
    seed: integer('seed', 0).max(2 ** 32 - 1, { error: 'seed must be below 2^32' }).default(1),
  })
  .check((ctx) => {
    const b = ctx.value.boundaries;
    const pairs: [SideName, SideName][] = [['left', 'right'], ['bottom', 'top']];
    for (const [a, c] of pairs) {
      if ((b[a].type === 'periodic') !== (b[c].type === 'periodic')) {
        ctx.issues.push({ code: 'custom', input: b, message: `periodic boundaries come in pairs: set both ${a} and ${c} to periodic, or neither`, path: ['boundaries', b[a].type === 'periodic' ? c : a] });
      }
    }
    for (const side of SIDE_NAMES) {
      const s = b[side];
      if (s.type !== 'wall') continue;
      const normalIndex = side === 'left' || side === 'right' ? 0 : 1;
      if (s.velocityMPerS[normalIndex] !== 0) {
        ctx.issues.push({ code: 'custom', input: s, message: `the ${side} wall may only move along itself: its ${normalIndex === 0 ? 'x' : 'y'} velocity must be 0`, path: ['boundaries', side, 'velocityMPerS'] });
      }
    }
  });

export type CaseInput = z.input<typeof caseSchema>;
export type Case = z.output<typeof caseSchema>;
export type BoundarySpec = Case['boundaries'][SideName];
export type WallSpec = Extract<BoundarySpec, { type: 'wall' }>;

export type CaseParseResult = { ok: true; value: Case } | { ok: false; errors: string[] };

/** Validates untrusted JSON (already parsed, never evaluated) and returns messages that name the field. */
export function parseCase(input: unknown): CaseParseResult {
  const r = caseSchema.safeParse(input);
  if (r.success) return { ok: true, value: r.data };
  return {
    ok: false,
    errors: r.error.issues.map((i) => `${i.path.length ? i.path.join('.') : '(case)'}: ${i.message}`),
  };
}

/** JSON Schema of the case file (draft 2020-12), for editors and for `tenuis schema`. */
export function caseJsonSchema(): unknown {
  return z.toJSONSchema(caseSchema, { io: 'input', unrepresentable: 'any' });
}
