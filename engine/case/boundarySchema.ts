/**
 * What a side of the domain is: a wall (with its gas–surface model), periodic, a symmetry plane, a reservoir, the
 * axis, or a pressure outlet. A block's faces are walls of the same schema.
 */
import { z } from 'zod';
import { WALL_MODELS } from './caseConstants';
import { LIMITS, RESULT_NAME, fraction, pressure, temperature, velocity } from './schemaFields';

export const wallSchema = z
  .strictObject({
    type: z.literal('wall'),
    /** The name results report this wall under (e.g. `lid`); a side's own name (top …) when left out. */
    name: z
      .string()
      .regex(RESULT_NAME, { error: 'a wall name must start with a letter and hold only letters, digits, _ and -' })
      .optional(),
    model: z.enum(WALL_MODELS, { error: `wall model must be one of ${WALL_MODELS.join(', ')}` }).default('diffuse'),
    temperatureK: temperature('wall temperature (K)'),
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

const reservoirPressureMessage = `reservoir pressure must be 0 (vacuum) or more, at most ${LIMITS.pressurePa.max} Pa`;

/**
 * A side open to a large vessel held at a given state: molecules leave freely and enter with the exact Maxwellian
 * influx of that state (drift velocity optional, e.g. a measured approach flow).
 */
const reservoir = z.strictObject({
  type: z.literal('reservoir'),
  /** 0 is a vacuum: molecules leave, none enter. */
  pressurePa: z
    .number({ error: reservoirPressureMessage })
    .finite({ error: reservoirPressureMessage })
    .min(0, { error: reservoirPressureMessage })
    .max(LIMITS.pressurePa.max, { error: reservoirPressureMessage }),
  temperatureK: temperature('reservoir temperature (K)'),
  velocityMPerS: velocity,
});

export const boundarySchema = z.discriminatedUnion(
  'type',
  [
    wallSchema,
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
    z.strictObject({ type: z.literal('pressureOutlet'), pressurePa: pressure('outlet pressure (Pa)') }),
  ],
  { error: 'boundary type must be wall, periodic, symmetry, reservoir, axis or pressureOutlet' },
);
