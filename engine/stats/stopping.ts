/**
 * Stopping rules for a run, as pure functions: a precision target on one reported quantity
 * (`walls.top.shearStress=0.01`: stop when its 95 % half-width is within 1 % of its mean), a step budget and a
 * wall-clock budget; and how much longer a run needs to reach its target.
 */

export interface PrecisionTarget {
  /** Dotted path of the quantity in the result, e.g. `walls.top.shearStress`. */
  readonly path: string;
  /** Target ci95/|mean|, above 0 and at most 1. */
  readonly relativeHalfWidth: number;
}

/** One dotted segment: a letter or underscore, then letters, digits or underscores. */
const SEGMENT = /^[A-Za-z_][A-Za-z0-9_]*$/;

/**
 * Parses `PATH=VALUE`, e.g. `walls.top.shearStress=0.01` or `walls.top.shearStress=1%`. PATH is dot-separated names;
 * VALUE the relative 95 % half-width, a number or a percentage, above 0 and at most 1 (100 %). When knownPaths is
 * given, PATH must be one of them. Throws with a message that names the part that is wrong.
 */
export function parseTarget(text: string, knownPaths?: readonly string[]): PrecisionTarget {
  const where = `target "${text}"`;
  const eq = text.indexOf('=');
  if (eq < 0) throw new Error(`${where}: expected QUANTITY=RELATIVE_HALF_WIDTH, e.g. walls.top.shearStress=0.01`);
  const path = text.slice(0, eq).trim();
  const valueText = text.slice(eq + 1).trim();
  if (path === '') throw new Error(`${where}: the quantity before "=" is empty (e.g. walls.top.shearStress)`);
  const bad = path.split('.').find((s) => !SEGMENT.test(s));
  if (bad !== undefined) {
    throw new Error(
      `${where}: "${path}" is not a dotted name; "${bad}" must start with a letter and hold only letters, digits or _`,
    );
  }
  if (knownPaths !== undefined && !knownPaths.includes(path)) {
    const hint = knownPaths.filter((k) => k.toLowerCase().endsWith(path.split('.').pop()!.toLowerCase()));
    const list = (hint.length ? hint : knownPaths).slice(0, 12).join(', ');
    throw new Error(
      `${where}: unknown quantity "${path}"; ${hint.length ? 'did you mean' : 'known quantities'}: ${list}`,
    );
  }
  const percent = valueText.endsWith('%');
  const numberText = (percent ? valueText.slice(0, -1) : valueText).trim();
  const parsed = numberText === '' ? Number.NaN : Number(numberText);
  if (!Number.isFinite(parsed)) {
    throw new Error(`${where}: "${valueText}" is not a number; give the relative half-width as 0.01 or 1%`);
  }
  const value = percent ? parsed / 100 : parsed;
  if (!(value > 0 && value <= 1)) {
    throw new Error(
      `${where}: relative half-width ${valueText} must be above 0 and at most 1 (100 %), e.g. 0.01 for 1 %`,
    );
  }
  return { path, relativeHalfWidth: value };
}

export type StopRule = 'target' | 'maxSteps' | 'maxSeconds';

export interface StopInput {
  readonly stepsDone: number;
  /** No step budget when undefined. */
  readonly maxSteps?: number;
  readonly elapsedSeconds: number;
  /** No time budget when undefined. */
  readonly maxSeconds?: number;
  /** No precision target when undefined. */
  readonly target?: PrecisionTarget;
  /** The target quantity's current estimate; undefined while it has none (e.g. during the transient). */
  readonly estimate?: { readonly mean: number; readonly ci95: number };
}

export interface StopDecision {
  readonly stop: boolean;
  /** Which rule stopped the run; null while it continues. */
  readonly rule: StopRule | null;
  readonly reason: string;
}

/** Current ci95/|mean|; Infinity when the mean is zero or either number is not finite (the target cannot be met). */
export function relativeHalfWidthOf(estimate: { readonly mean: number; readonly ci95: number }): number {
  const { mean, ci95 } = estimate;
  if (!Number.isFinite(mean) || !Number.isFinite(ci95) || mean === 0) return Infinity;
  return Math.abs(ci95) / Math.abs(mean);
}

/**
 * Should the run stop now? Rules in order — the first that holds gives the reason: the precision target is met
 * (ci95/|mean| ≤ target), the step budget is spent (stepsDone ≥ maxSteps), the time budget is spent
 * (elapsedSeconds ≥ maxSeconds). The target is only as good as the interval: the caller passes an estimate only once
 * it has enough batches to be trusted. Seconds and steps are the caller's (no clock here).
 */
export function evaluateStop(input: StopInput): StopDecision {
  const { stepsDone, maxSteps, elapsedSeconds, maxSeconds, target, estimate } = input;
  let progress = '';
  if (target !== undefined) {
    if (estimate === undefined) {
      progress = `${target.path} has no estimate yet`;
    } else {
      const current = relativeHalfWidthOf(estimate);
      if (current <= target.relativeHalfWidth) {
        const reached = `±${formatPercent(current)} ≤ ±${formatPercent(target.relativeHalfWidth)} (95 %)`;
        return { stop: true, rule: 'target', reason: `${target.path} reached its target: ${reached}` };
      }
      progress = Number.isFinite(current)
        ? `${target.path} at ±${formatPercent(current)}, target ±${formatPercent(target.relativeHalfWidth)}`
        : `${target.path} has mean ${estimate.mean} ± ${estimate.ci95}: no finite relative half-width yet`;
    }
  }
  if (maxSteps !== undefined && stepsDone >= maxSteps) {
    const detail = progress ? `; ${progress}` : '';
    return { stop: true, rule: 'maxSteps', reason: `step budget spent: ${stepsDone} of ${maxSteps} steps${detail}` };
  }
  if (maxSeconds !== undefined && elapsedSeconds >= maxSeconds) {
    return {
      stop: true,
      rule: 'maxSeconds',
      reason: `time budget spent: ${elapsedSeconds.toFixed(1)} of ${maxSeconds} s${progress ? `; ${progress}` : ''}`,
    };
  }
  const budgets = [
    maxSteps !== undefined ? `${stepsDone} of ${maxSteps} steps` : null,
    maxSeconds !== undefined ? `${elapsedSeconds.toFixed(1)} of ${maxSeconds} s` : null,
  ].filter((s) => s !== null);
  const parts = [progress, ...budgets].filter((s) => s !== '');
  const reason = parts.length ? `continuing: ${parts.join('; ')}` : 'continuing: no stopping rule set';
  return { stop: false, rule: null, reason };
}

function formatPercent(fraction: number): string {
  return `${(100 * fraction).toPrecision(3)} %`;
}

export interface RemainingEstimate {
  /** Samples (steps or batches, the caller's unit) needed in total: samplesSoFar × (current/target)², rounded up. */
  readonly totalSamples: number;
  /** totalSamples − samplesSoFar, at least 0. */
  readonly additionalSamples: number;
  /** additionalSamples / samplesSoFar: the remaining work as a fraction of the work done. */
  readonly additionalFraction: number;
  /** additionalFraction × secondsSoFar, when secondsSoFar is given (time proportional to samples). */
  readonly additionalSeconds: number | undefined;
}

/**
 * How many more samples (and seconds) until the relative half-width falls from `currentRelativeHalfWidth` to
 * `targetRelativeHalfWidth`, assuming half-width ∝ 1/sqrt(samples) — the standard error of a mean of a stationary
 * series with a fixed correlation time (common practice). It ignores the slow fall of the t quantile as the
 * degrees of freedom grow, so it is slightly pessimistic early in a run, and it is only as good as the current
 * half-width. samplesSoFar > 0 in any unit (steps, batches); secondsSoFar ≥ 0, the time those samples took.
 */
export function estimateRemaining(
  currentRelativeHalfWidth: number,
  targetRelativeHalfWidth: number,
  samplesSoFar: number,
  secondsSoFar?: number,
): RemainingEstimate {
  if (!(Number.isFinite(currentRelativeHalfWidth) && currentRelativeHalfWidth > 0)) {
    throw new Error(
      `estimate remaining: current relative half-width = ${currentRelativeHalfWidth}: must be a finite number above 0`,
    );
  }
  if (!(Number.isFinite(targetRelativeHalfWidth) && targetRelativeHalfWidth > 0)) {
    throw new Error(
      `estimate remaining: target relative half-width = ${targetRelativeHalfWidth}: must be a finite number above 0`,
    );
  }
  if (!(Number.isFinite(samplesSoFar) && samplesSoFar > 0)) {
    throw new Error(`estimate remaining: samples so far = ${samplesSoFar}: must be a finite number above 0`);
  }
  if (secondsSoFar !== undefined && !(Number.isFinite(secondsSoFar) && secondsSoFar >= 0)) {
    throw new Error(`estimate remaining: seconds so far = ${secondsSoFar}: must be a finite number ≥ 0`);
  }
  const ratio = currentRelativeHalfWidth / targetRelativeHalfWidth;
  // Round-off guard so that an exact square (ratio 2 → 4 × samples) does not round up one sample too many.
  const totalSamples = Math.max(samplesSoFar, Math.ceil(samplesSoFar * ratio * ratio * (1 - 1e-12)));
  const additionalSamples = totalSamples - samplesSoFar;
  const additionalFraction = additionalSamples / samplesSoFar;
  return {
    totalSamples,
    additionalSamples,
    additionalFraction,
    additionalSeconds: secondsSoFar === undefined ? undefined : additionalFraction * secondsSoFar,
  };
}
