/**
 * The zod field builders the case schema's parts share (positive numbers, fractions, velocities, names results use
 * as keys, coordinates, whole numbers), each with the message that names the field when it is wrong.
 */
import { z } from 'zod';

export const positive = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .finite()
    .positive({ error: `${what} must be greater than zero` });
export const fraction = (what: string) =>
  z
    .number({ error: `${what} must be a number between 0 and 1` })
    .min(0, { error: `${what} must be between 0 and 1` })
    .max(1, { error: `${what} must be between 0 and 1` });
export const velocity = z
  .tuple([z.number().finite(), z.number().finite(), z.number().finite()], {
    error: 'velocity must be three numbers [x, y, z] in m/s',
  })
  .default([0, 0, 0]);

/** Names that results use as keys (walls.NAME, flow.sections.NAME): letters first, then letters, digits, _ and -. */
export const RESULT_NAME = /^[A-Za-z][A-Za-z0-9_-]*$/;

export const identifier = (what: string) =>
  z
    .string({ error: `${what} must be a name` })
    .regex(RESULT_NAME, { error: `${what} must start with a letter and hold only letters, digits, _ and -` });
export const coordinate = (what: string) =>
  z
    .number({ error: `${what} must be a number (m)` })
    .finite()
    .min(0, { error: `${what} must be 0 or more (m, measured from the domain's lower left corner)` });

export const integer = (what: string, min: number) =>
  z
    .number({ error: `${what} must be a whole number` })
    .int({ error: `${what} must be a whole number` })
    .min(min, { error: `${what} must be at least ${min}` });
