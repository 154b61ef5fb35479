/**
 * The planner's guards against numbers no simulation can use: every derived number finite and positive, the cell
 * count and the memory within their limits, the time step within a stated multiple of the advisor's bound. A fuzz of
 * 10,000 mutated case files (issue 12) found each of these reached: an infinite box volume, molecules per particle
 * of ∞, a time step of 5e-324 s, a 10⁷-cell grid checked for 19 s and found "valid" at 102 GB. Each message names
 * the field to change and the limit, so the user can act on it; none of this runs per step.
 */

/** Most cells a grid may have (common practice, no source): the presets use at most some ten thousand. */
export const MAX_CELLS = 2_000_000;
/** A time step above this many mean collision times or cell transit times is refused (the advisor wants ≤ 1/4). */
export const MAX_STEP_RATIO = 100;
/** A time step below this fraction of both is refused: molecules would barely move, or x + v·Δt would round to x. */
export const MIN_STEP_RATIO = 1e-6;

/** One derived number, the field whose value causes it when it is not usable, and the number's name for the message. */
export interface DerivedNumber {
  readonly value: number;
  readonly what: string;
  readonly field: string;
}

/** A message per derived number that is not a finite number greater than zero. */
export function nonFiniteErrors(numbers: readonly DerivedNumber[]): string[] {
  return numbers
    .filter((d) => !(Number.isFinite(d.value) && d.value > 0))
    .map(
      (d) =>
        `${d.field}: the ${d.what} comes out as ${d.value}, not a finite number greater than zero; bring ${d.field} nearer to the scale of a gas flow`,
    );
}

/** Human-readable bytes, for the memory messages. */
export function gigabytes(bytes: number): string {
  return `${(bytes / 1e9).toPrecision(3)} GB`;
}
