/**
 * The case's gas: a species from the table (gas/species.ts) or custom molecular data, with its collision model.
 */
import { z } from 'zod';
import { SPECIES_IDS } from '../gas/species';
import { COLLISION_MODELS } from './caseConstants';
import { positive } from './schemaFields';

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

export const gasSchema = z
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
