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
  z
    .number({ error: `${what} must be a number` })
    .finite()
    .positive({ error: `${what} must be greater than zero` });
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
  massKg: positive('molecular mass (kg)').max(1e-22, {
    error: 'molecular mass looks wrong: expected kg per molecule, e.g. 6.63e-26 for argon',
  }),
  referenceDiameterM: positive('reference diameter (m)').max(1e-8, {
    error: 'reference diameter looks wrong: expected metres, e.g. 4.17e-10',
  }),
  referenceTemperatureK: positive('reference temperature (K)').default(273),
  viscosityIndex: z
    .number()
    .min(0.5, { error: 'viscosity index ω must be between 0.5 (hard sphere) and 1 (Maxwell molecules)' })
    .max(1, { error: 'viscosity index ω must be between 0.5 (hard sphere) and 1 (Maxwell molecules)' }),
  scatteringExponent: z
    .number()
    .min(1, { error: 'VSS scattering exponent α must be between 1 (isotropic) and 2' })
    .max(2, { error: 'VSS scattering exponent α must be between 1 (isotropic) and 2' })
    .default(1),
  rotationalDof: z.union([z.literal(0), z.literal(2), z.literal(3)], {
    error: 'rotational degrees of freedom must be 0 (monatomic), 2 (linear) or 3 (non-linear)',
  }),
});

const gas = z
  .strictObject({
    species: z
      .enum(SPECIES_IDS, { error: `gas.species must be one of ${SPECIES_IDS.join(', ')}, or give gas.custom instead` })
      .optional(),
    custom: customGas.optional(),
    model: z.enum(COLLISION_MODELS, { error: 'gas.model must be HS, VHS or VSS' }).default('VHS'),
    rotationalCollisionNumber: z
      .number()
      .min(1, { error: 'rotational collision number must be at least 1' })
      .default(5),
  })
  .check((ctx) => {
    const g = ctx.value;
    if ((g.species === undefined) === (g.custom === undefined)) {
      ctx.issues.push({
        code: 'custom',
        input: g,
        message: 'give exactly one of gas.species (a table gas) or gas.custom (your own molecular data)',
        path: ['species'],
      });
    }
    if (g.species === 'air' && g.model === 'VSS') {
      ctx.issues.push({
        code: 'custom',
        input: g,
        message: 'no VSS data for air in the species table: use model VHS or HS, or a custom gas',
        path: ['model'],
      });
    }
  });

/** Names that results use as keys (walls.NAME, flow.sections.NAME): letters first, then letters, digits, _ and -. */
const RESULT_NAME = /^[A-Za-z][A-Za-z0-9_-]*$/;

const wall = z
  .strictObject({
    type: z.literal('wall'),
    /** The name results report this wall under (e.g. `lid`); a side's own name (top …) when left out. */
    name: z
      .string()
      .regex(RESULT_NAME, { error: 'a wall name must start with a letter and hold only letters, digits, _ and -' })
      .optional(),
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
      ctx.issues.push({
        code: 'custom',
        input: w,
        message: 'a Maxwell wall needs accommodation (0 = specular, 1 = diffuse)',
        path: ['accommodation'],
      });
    }
    if (
      w.model === 'cercignaniLampis' &&
      (w.normalAccommodation === undefined || w.tangentialAccommodation === undefined)
    ) {
      ctx.issues.push({
        code: 'custom',
        input: w,
        message: 'a Cercignani–Lampis wall needs normalAccommodation and tangentialAccommodation, each between 0 and 1',
        path: ['normalAccommodation'],
      });
    }
  });

/**
 * A side open to a large vessel held at a given state: molecules leave freely and enter with the exact Maxwellian
 * influx of that state (drift velocity optional, e.g. a measured approach flow).
 */
const reservoir = z.strictObject({
  type: z.literal('reservoir'),
  /** 0 is a vacuum: molecules leave, none enter. */
  pressurePa: z
    .number({ error: 'reservoir pressure must be a number (Pa)' })
    .finite()
    .min(0, { error: 'reservoir pressure must be 0 (vacuum) or more (Pa)' }),
  temperatureK: positive('reservoir temperature (K)'),
  velocityMPerS: velocity,
});

const boundary = z.discriminatedUnion(
  'type',
  [
    wall,
    z.strictObject({ type: z.literal('periodic') }),
    z.strictObject({ type: z.literal('symmetry') }),
    reservoir,
    /** The axis of symmetry (bottom side of an axisymmetric domain): molecules pass it in 3D, nothing to do. */
    z.strictObject({ type: z.literal('axis') }),
    /**
     * The end of a long duct held at a pressure (subsonic outflow): molecules leave freely and enter from a
     * Maxwellian whose density, speed and temperature follow from the gas next to the end by the characteristic
     * relations of Wang & Li 2004 (kernel/pressureOutlet.ts).
     */
    z.strictObject({ type: z.literal('pressureOutlet'), pressurePa: positive('outlet pressure (Pa)') }),
  ],
  { error: 'boundary type must be wall, periodic, symmetry, reservoir, axis or pressureOutlet' },
);

const identifier = (what: string) =>
  z
    .string({ error: `${what} must be a name` })
    .regex(RESULT_NAME, { error: `${what} must start with a letter and hold only letters, digits, _ and -` });
const coordinate = (what: string) =>
  z
    .number({ error: `${what} must be a number (m)` })
    .finite()
    .min(0, { error: `${what} must be 0 or more (m, measured from the domain's lower left corner)` });

export const BLOCK_FACES = ['left', 'right', 'bottom', 'top'] as const;
export type BlockFace = (typeof BLOCK_FACES)[number];

/**
 * A solid block: an axis-aligned rectangle inside the domain (in an axisymmetric domain, a ring or a disc around the
 * axis). Each face is a wall: `wall` for all of them, `faces.NAME` to give one face its own temperature, speed or
 * model. Its faces report as walls named BLOCK.left, BLOCK.right, BLOCK.bottom, BLOCK.top.
 */
const block = z.strictObject({
  name: identifier('block name'),
  xMinM: coordinate('block xMinM'),
  xMaxM: coordinate('block xMaxM'),
  yMinM: coordinate('block yMinM'),
  yMaxM: coordinate('block yMaxM'),
  wall,
  faces: z
    .strictObject({ left: wall.optional(), right: wall.optional(), bottom: wall.optional(), top: wall.optional() })
    .optional(),
});

/** A cross-section x = xM (from yMinM to yMaxM, by default the whole height) through which the mass flow is counted. */
const flowSection = z.strictObject({
  name: identifier('flow section name'),
  xM: coordinate('flow section xM'),
  yMinM: coordinate('flow section yMinM').optional(),
  yMaxM: coordinate('flow section yMaxM').optional(),
});

export const DUCT_KINDS = ['channel', 'tube', 'slit', 'orifice'] as const;
export type DuctKind = (typeof DUCT_KINDS)[number];

/**
 * What the flow numbers refer to: the duct's kind and size (gap H of a channel or slit, radius R of a tube or
 * orifice), its length for the reduced flow rate of long ducts, and the pressures the conductance and the
 * transmission probability are based on (by default those of the reservoirs on the left and right sides).
 */
const flowReport = z.strictObject({
  duct: z.enum(DUCT_KINDS, { error: `flowReport.duct must be one of ${DUCT_KINDS.join(', ')}` }),
  sizeM: positive('duct size (m: gap of a channel or slit, radius of a tube or orifice)'),
  lengthM: positive('duct length (m)').optional(),
  upstreamPressurePa: positive('upstream pressure (Pa)').optional(),
  downstreamPressurePa: z.number().finite().min(0, { error: 'downstream pressure must be 0 or more (Pa)' }).optional(),
  section: identifier('flowReport.section').optional(),
});

const integer = (what: string, min: number) =>
  z
    .number({ error: `${what} must be a whole number` })
    .int({ error: `${what} must be a whole number` })
    .min(min, { error: `${what} must be at least ${min}` });

const caseShape = z.strictObject({
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
    /** planar: unit depth in z. axisymmetric: x is the axis, y the radius, the bottom side the axis. */
    geometry: z
      .enum(['planar', 'axisymmetric'], { error: 'domain.geometry must be planar or axisymmetric' })
      .default('planar'),
  }),
  boundaries: z.strictObject({ left: boundary, right: boundary, bottom: boundary, top: boundary }),
  blocks: z.array(block).max(64, { error: 'at most 64 blocks' }).default([]),
  flowSections: z.array(flowSection).max(16, { error: 'at most 16 flow sections' }).default([]),
  /** Uniform body acceleration along x (m/s²): drives a periodic channel as a stand-in for a pressure gradient. */
  bodyAccelerationXMPerS2: z.number({ error: 'bodyAccelerationXMPerS2 must be a number (m/s²)' }).finite().default(0),
  flowReport: flowReport.optional(),
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

export const caseSchema = caseShape.check((ctx) => {
  const b = ctx.value.boundaries;
  const pairs: [SideName, SideName][] = [
    ['left', 'right'],
    ['bottom', 'top'],
  ];
  for (const [a, c] of pairs) {
    if ((b[a].type === 'periodic') !== (b[c].type === 'periodic')) {
      ctx.issues.push({
        code: 'custom',
        input: b,
        message: `periodic boundaries come in pairs: set both ${a} and ${c} to periodic, or neither`,
        path: ['boundaries', b[a].type === 'periodic' ? c : a],
      });
    }
  }
  for (const side of SIDE_NAMES) {
    const s = b[side];
    if (s.type !== 'wall') continue;
    const normalIndex = side === 'left' || side === 'right' ? 0 : 1;
    if (s.velocityMPerS[normalIndex] !== 0) {
      ctx.issues.push({
        code: 'custom',
        input: s,
        message: `the ${side} wall may only move along itself: its ${normalIndex === 0 ? 'x' : 'y'} velocity must be 0`,
        path: ['boundaries', side, 'velocityMPerS'],
      });
    }
  }
  checkGeometry(ctx.value, (message, path) => ctx.issues.push({ code: 'custom', input: ctx.value, message, path }));
});

type CaseDraft = z.output<typeof caseShape>;
type Report = (message: string, path: (string | number)[]) => void;

/** Blocks inside the domain, names unique, sections inside it, and the axisymmetric rules. */
function checkGeometry(c: CaseDraft, report: Report): void {
  const { lengthXM: lx, lengthYM: ly } = c.domain;
  const axisymmetric = c.domain.geometry === 'axisymmetric';
  const b = c.boundaries;
  const names = new Set<string>(SIDE_NAMES);
  for (const side of SIDE_NAMES) {
    const s = b[side];
    if (s.type !== 'wall' || s.name === undefined || s.name === side) continue;
    if (names.has(s.name) || (SIDE_NAMES as readonly string[]).includes(s.name))
      report(`wall name "${s.name}" is already used; give each wall its own name`, ['boundaries', side, 'name']);
    names.add(s.name);
  }
  c.blocks.forEach((k, i) => {
    const at = ['blocks', i];
    if (names.has(k.name))
      report(`block name "${k.name}" is used twice (or is a side's name); give each block its own name`, [
        ...at,
        'name',
      ]);
    names.add(k.name);
    if (!(k.xMaxM > k.xMinM))
      report(`block ${k.name}: xMaxM (${k.xMaxM}) must be greater than xMinM (${k.xMinM})`, [...at, 'xMaxM']);
    if (!(k.yMaxM > k.yMinM))
      report(`block ${k.name}: yMaxM (${k.yMaxM}) must be greater than yMinM (${k.yMinM})`, [...at, 'yMaxM']);
    if (k.xMaxM > lx)
      report(`block ${k.name}: xMaxM (${k.xMaxM} m) lies outside the domain (lengthXM = ${lx} m)`, [...at, 'xMaxM']);
    if (k.yMaxM > ly)
      report(`block ${k.name}: yMaxM (${k.yMaxM} m) lies outside the domain (lengthYM = ${ly} m)`, [...at, 'yMaxM']);
    if (k.wall.velocityMPerS.some((v) => v !== 0))
      report(
        `block ${k.name}: give a moving face its speed in faces.NAME, not in wall (the faces of a block point in different directions)`,
        [...at, 'wall', 'velocityMPerS'],
      );
    BLOCK_FACES.forEach((face, f) => {
      const w = k.faces?.[face];
      const normalIndex = f < 2 ? 0 : 1;
      if (w && w.velocityMPerS[normalIndex] !== 0)
        report(
          `block ${k.name}: face ${face} may only move along itself: its ${normalIndex === 0 ? 'x' : 'y'} velocity must be 0`,
          [...at, 'faces', face, 'velocityMPerS'],
        );
    });
  });
  c.flowSections.forEach((s, i) => {
    const at = ['flowSections', i];
    if (names.has(s.name))
      report(`flow section name "${s.name}" is already used by a side, block or section; give it its own name`, [
        ...at,
        'name',
      ]);
    names.add(s.name);
    if (!(s.xM > 0 && s.xM < lx))
      report(`flow section ${s.name}: xM (${s.xM} m) must lie inside the domain, between 0 and lengthXM = ${lx} m`, [
        ...at,
        'xM',
      ]);
    if ((s.yMaxM ?? ly) <= (s.yMinM ?? 0) || (s.yMaxM ?? 0) > ly)
      report(`flow section ${s.name}: need 0 ≤ yMinM < yMaxM ≤ lengthYM (${ly} m)`, [...at, 'yMaxM']);
  });
  if (c.flowReport?.section !== undefined && !c.flowSections.some((s) => s.name === c.flowReport!.section)) {
    report(
      `flowReport.section "${c.flowReport.section}" is not one of the flowSections (${c.flowSections.map((s) => s.name).join(', ') || 'none defined'})`,
      ['flowReport', 'section'],
    );
  }
  if (c.flowReport && c.flowSections.length === 0)
    report('flowReport needs at least one entry in flowSections to count the flow through', ['flowReport']);
  for (const side of SIDE_NAMES) {
    if (b[side].type === 'axis' && (!axisymmetric || side !== 'bottom'))
      report('only the bottom side of an axisymmetric domain can be the axis', ['boundaries', side, 'type']);
    if (b[side].type === 'pressureOutlet' && side !== 'left' && side !== 'right')
      report('a pressureOutlet ends a duct along x: use it on the left or right side', ['boundaries', side, 'type']);
  }
  if (axisymmetric) {
    if (b.bottom.type !== 'axis')
      report(
        'in an axisymmetric domain the bottom side (y = 0) is the axis: set boundaries.bottom to {"type": "axis"}',
        ['boundaries', 'bottom', 'type'],
      );
    if (b.top.type === 'periodic')
      report('the outer side of an axisymmetric domain cannot be periodic', ['boundaries', 'top', 'type']);
    for (const side of SIDE_NAMES) {
      const s = b[side];
      if ((s.type === 'wall' || s.type === 'reservoir') && s.velocityMPerS[2] !== 0)
        report(`${side}: swirl (z velocity) is not modelled in axisymmetric domains; set it to 0`, [
          'boundaries',
          side,
          'velocityMPerS',
        ]);
    }
  }
}

export type CaseInput = z.input<typeof caseSchema>;
export type Case = z.output<typeof caseSchema>;
export type BoundarySpec = Case['boundaries'][SideName];
export type WallSpec = Extract<BoundarySpec, { type: 'wall' }>;
export type ReservoirSpec = Extract<BoundarySpec, { type: 'reservoir' }>;
export type BlockSpec = Case['blocks'][number];
export type FlowSectionSpec = Case['flowSections'][number];
export type FlowReportSpec = NonNullable<Case['flowReport']>;

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
