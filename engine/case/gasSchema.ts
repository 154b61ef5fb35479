/**
 * The case's gas: a species from the table (gas/species.ts) or custom molecular data, with its collision model.
 * A table gas may be named by its formula (N2) or its name (nitrogen), in any case; the parsed case always holds the
 * formula, so results and saved cases read the same whichever was typed. The custom gas's numbers are bounded so
 * that no derived speed or viscosity can underflow or overflow (issue 12: a reference temperature of 1e-300 K gave a
 * viscosity of 0, found only when the results were exported).
 */
import { z } from 'zod';
import { SPECIES, SPECIES_IDS, type SpeciesId } from '../gas/species';
import { COLLISION_MODELS } from './caseConstants';
import { bounded } from './schemaFields';

const squeezed = (text: string) => text.toLowerCase().replace(/[\s_-]+/g, '');

/** The table gas a formula or name stands for (Ar, ar, argon, Argon, carbon dioxide …), or undefined. */
export function speciesIdOf(text: string): SpeciesId | undefined {
  const key = squeezed(text);
  return SPECIES_IDS.find((id) => squeezed(id) === key || squeezed(SPECIES[id].name) === key);
}

/** Both forms of every table gas, for messages: "H2, He, … (or by name: hydrogen, helium, …)". */
export const SPECIES_CHOICES = `${SPECIES_IDS.join(', ')} (or by name, in any case: ${SPECIES_IDS.map((id) => SPECIES[id].name).join(', ')})`;

const speciesMessage = `gas.species must be one of ${SPECIES_CHOICES}, or give gas.custom instead`;
const species = z.string({ error: speciesMessage }).transform((text, ctx): SpeciesId => {
  const id = speciesIdOf(text);
  if (id === undefined) {
    ctx.issues.push({ code: 'custom', input: text, message: speciesMessage });
    return z.NEVER;
  }
  return id;
});

const customGas = z.strictObject({
  name: z.string().min(1, { error: 'give the custom gas a name' }),
  massKg: bounded('molecular mass (kg per molecule, e.g. 6.63e-26 for argon)', { min: 1e-28, max: 1e-22, unit: 'kg' }),
  referenceDiameterM: bounded('reference diameter (m, e.g. 4.17e-10)', { min: 1e-11, max: 1e-8, unit: 'm' }),
  referenceTemperatureK: bounded('reference temperature (K)', { min: 1, max: 1e5, unit: 'K' }).default(273),
  viscosityIndex: bounded('viscosity index ω', {
    min: 0.5,
    max: 1,
    message: 'viscosity index ω must be between 0.5 (hard sphere) and 1 (Maxwell molecules)',
  }),
  scatteringExponent: bounded('VSS scattering exponent α', {
    min: 1,
    max: 2,
    message: 'VSS scattering exponent α must be between 1 (isotropic) and 2',
  }).default(1),
  rotationalDof: z.union([z.literal(0), z.literal(2), z.literal(3)], {
    error: 'rotational degrees of freedom must be 0 (monatomic), 2 (linear) or 3 (non-linear)',
  }),
});

export const gasSchema = z
  .strictObject({
    species: species.optional(),
    custom: customGas.optional(),
    model: z.enum(COLLISION_MODELS, { error: 'gas.model must be HS, VHS or VSS' }).default('VHS'),
    rotationalCollisionNumber: bounded('rotational collision number', { min: 1, max: 1000 }).default(5),
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
