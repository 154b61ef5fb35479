/**
 * The zod field builders the case schema's parts share (positive numbers, fractions, velocities, names results use
 * as keys, coordinates, whole numbers), each with the message that names the field when it is wrong. Every number
 * that sizes a computation has an upper bound as well as a lower one (issue 12: a fuzz of mutated case files found
 * lengths of 1e300 m and 1e9 wall bins accepted, and then crashing or hanging the engine); each builder gives one
 * message for every way the value can be wrong, so a field never says two different things about itself.
 */
import { z } from 'zod';

/** A finite number in (0, max] (or [min, max] when min is given), with one message naming the range and unit. */
export const bounded = (what: string, range: { min?: number; max: number; unit?: string; message?: string }) => {
  const unit = range.unit ? ` ${range.unit}` : '';
  const message =
    range.message ??
    (range.min === undefined
      ? `${what} must be greater than zero and at most ${range.max}${unit}`
      : `${what} must be a number between ${range.min} and ${range.max}${unit}`);
  const n = z.number({ error: message }).finite({ error: message });
  return (range.min === undefined ? n.positive({ error: message }) : n.min(range.min, { error: message })).max(
    range.max,
    { error: message },
  );
};

export const positive = (what: string) =>
  z
    .number({ error: `${what} must be a number greater than zero` })
    .finite({ error: `${what} must be a number greater than zero` })
    .positive({ error: `${what} must be a number greater than zero` });
export const fraction = (what: string) =>
  z
    .number({ error: `${what} must be a number between 0 and 1` })
    .min(0, { error: `${what} must be a number between 0 and 1` })
    .max(1, { error: `${what} must be a number between 0 and 1` });

/** Any speed above this is refused (m/s): far beyond every gas flow, and it keeps x + v·Δt finite. */
export const MAX_SPEED_M_PER_S = 1e5;
const speedMessage = `velocity must be three numbers [x, y, z] in m/s, each between -${MAX_SPEED_M_PER_S} and ${MAX_SPEED_M_PER_S}`;
const component = z
  .number({ error: speedMessage })
  .finite({ error: speedMessage })
  .min(-MAX_SPEED_M_PER_S, { error: speedMessage })
  .max(MAX_SPEED_M_PER_S, { error: speedMessage });
export const velocity = z.tuple([component, component, component], { error: speedMessage }).default([0, 0, 0]);

/** Names that results use as keys (walls.NAME, flow.sections.NAME): letters first, then letters, digits, _ and -. */
export const RESULT_NAME = /^[A-Za-z][A-Za-z0-9_-]*$/;

export const identifier = (what: string) =>
  z
    .string({ error: `${what} must be a name` })
    .regex(RESULT_NAME, { error: `${what} must start with a letter and hold only letters, digits, _ and -` });
export const coordinate = (what: string) =>
  z
    .number({ error: `${what} must be a number of 0 or more (m, measured from the domain's lower left corner)` })
    .finite({ error: `${what} must be a number of 0 or more (m, measured from the domain's lower left corner)` })
    .min(0, { error: `${what} must be a number of 0 or more (m, measured from the domain's lower left corner)` });

/** A whole number of at least min (and at most max when given), with one message naming the range. */
export const integer = (what: string, min: number, max?: number) => {
  const message =
    max === undefined
      ? `${what} must be a whole number of at least ${min}`
      : `${what} must be a whole number from ${min} to ${max}`;
  const n = z.number({ error: message }).int({ error: message }).min(min, { error: message });
  return max === undefined ? n : n.max(max, { error: message });
};

/** The ranges of the physical inputs (common practice, no source): far outside every gas flow DSMC is used for. */
export const LIMITS = {
  pressurePa: { max: 1e8, unit: 'Pa' },
  temperatureK: { min: 1, max: 1e5, unit: 'K' },
  lengthM: { min: 1e-9, max: 1e3, unit: 'm' },
} as const;
export const pressure = (what: string) => bounded(what, LIMITS.pressurePa);
export const temperature = (what: string) =>
  bounded(what, {
    ...LIMITS.temperatureK,
    message: `${what} must be greater than zero: an absolute temperature from ${LIMITS.temperatureK.min} to ${LIMITS.temperatureK.max} K`,
  });
export const length = (what: string) => bounded(what, LIMITS.lengthM);
