/**
 * When is the transient over? A detector fed with monitored series (particle count, total energy, wall shear, heat
 * flux … one value per series every K steps) that declares steady state once none of them drifts any more.
 *
 * Method (common practice, no single source: batch means and an ordinary least-squares trend test, as in textbook
 * output analysis of simulations, e.g. Law & Kelton, "Simulation Modeling and Analysis", batch means; from memory):
 * at every sample, for every series, the last W samples are cut into B batches of W/B; a straight line is fitted to
 * the B batch means by least squares, and its change over the window, drift = slope × W, is compared with
 *   bound = t_{(1+confidence)/2, B−2} × SE(slope) × W,
 * SE(slope) from the scatter of the batch means about the line (B − 2 degrees of freedom). Batch means longer than
 * the series' correlation time are nearly independent, which is what makes SE honest for correlated series (with
 * shorter batches SE comes out too small, and steady state is declared later, not sooner). A series is steady at a
 * check when |drift| ≤ bound (or when the drift is below relativeDriftFloor × |mean|: round-off in a conserved
 * quantity); a check passes when every series is steady. Steady state is declared at the first sample n ≥ the
 * minimum transient at which the checks at n, n − s, …, n − (c−1)s all passed (c consecutive checks s samples apart,
 * so they do not all look at the same data). At the maximum transient it is declared anyway, marked `forced`.
 *
 * What it can and cannot see: a drift smaller than the bound over one window is invisible, so a transient slower
 * than the window (time constant ≫ W) with a small remaining amplitude may pass; choose W longer than the slowest
 * relaxation expected. With S series, a stationary gas passes a check with probability about confidence^S, so
 * declaration may come a check or two after the minimum. Pure: no clock, no randomness; O(S·W) per push.
 */
import { tQuantile } from './studentT';
import { describeDrift, windowDrift, type SeriesDrift } from './windowDrift';

export interface SteadyStateOptions {
  /** W: samples in the window examined at each check (a multiple of batches). */
  readonly windowSamples: number;
  /** B: batches the window is cut into, at least 4; 10 by default. */
  readonly batches?: number;
  /** c: checks in a row that must pass; 2 by default. */
  readonly consecutiveChecks?: number;
  /** s: samples between those checks; W/2 (rounded up) by default, so consecutive windows share half their data. */
  readonly checkSpacing?: number;
  /** Minimum transient in samples; the earliest possible declaration, W + (c−1)·s, by default (and at least). */
  readonly minSamples?: number;
  /** Maximum transient in samples: declared steady (forced) here at the latest. No maximum by default. */
  readonly maxSamples?: number;
  /** Two-sided confidence of the drift bound; 0.95 by default. */
  readonly confidence?: number;
  /** Drift below this fraction of |window mean| always counts as none (round-off); 1e-9 by default. */
  readonly relativeDriftFloor?: number;
}

export interface SteadyStateReport {
  readonly steady: boolean;
  /** Samples pushed when steady state was declared (the end of the transient), or null. */
  readonly atSample: number | null;
  readonly reason: string;
  /** True when declared only because the maximum transient was reached. */
  readonly forced: boolean;
  /** Per series, at the latest check (empty before the first full window). */
  readonly drifts: readonly SeriesDrift[];
}

export interface SteadyStateDetector {
  /** One sample of every series (same names every time; finite values). */
  push(values: Readonly<Record<string, number>>): void;
  state(): SteadyStateReport;
}

function requireInteger(value: number, min: number, what: string): void {
  if (!(Number.isInteger(value) && value >= min)) {
    throw new Error(`steady-state detector: ${what} = ${value}: must be an integer ≥ ${min}`);
  }
}

interface Settings {
  readonly window: number;
  readonly batches: number;
  readonly consecutive: number;
  readonly spacing: number;
  readonly minSamples: number;
  readonly maxSamples: number;
  readonly confidence: number;
  readonly floor: number;
  /** t_{(1+confidence)/2, B−2}. */
  readonly tFactor: number;
}

/** Defaults and range checks of the options (messages name the option, its value and what is allowed). */
function settingsOf(options: SteadyStateOptions): Settings {
  const window = options.windowSamples;
  const batches = options.batches ?? 10;
  requireInteger(batches, 4, 'batches');
  requireInteger(window, 2 * batches, 'windowSamples');
  if (window % batches !== 0) {
    throw new Error(`steady-state detector: windowSamples = ${window} must be a multiple of batches (${batches})`);
  }
  const consecutive = options.consecutiveChecks ?? 2;
  requireInteger(consecutive, 1, 'consecutiveChecks');
  const spacing = options.checkSpacing ?? Math.ceil(window / 2);
  requireInteger(spacing, 1, 'checkSpacing');
  const earliest = window + (consecutive - 1) * spacing;
  if (options.minSamples !== undefined) requireInteger(options.minSamples, 0, 'minSamples');
  const minSamples = Math.max(earliest, options.minSamples ?? earliest);
  const maxSamples = options.maxSamples ?? Infinity;
  if (maxSamples !== Infinity) requireInteger(maxSamples, minSamples, 'maxSamples (at least the minimum transient)');
  const confidence = options.confidence ?? 0.95;
  if (!(confidence > 0 && confidence < 1)) {
    throw new Error(`steady-state detector: confidence = ${confidence}: must lie strictly between 0 and 1`);
  }
  const floor = options.relativeDriftFloor ?? 1e-9;
  if (!(Number.isFinite(floor) && floor >= 0)) {
    throw new Error(`steady-state detector: relativeDriftFloor = ${floor}: must be a finite number ≥ 0`);
  }
  const tFactor = tQuantile((1 + confidence) / 2, batches - 2);
  return { window, batches, consecutive, spacing, minSamples, maxSamples, confidence, floor, tFactor };
}

/** The report after the check at sample n, given how many of the required checks in a row passed. */
function reportAfterCheck(set: Settings, n: number, drifts: readonly SeriesDrift[], inARow: number): SteadyStateReport {
  const moving = drifts.filter((d) => !d.steady);
  const drifting = moving.map((d) => describeDrift(d, set.window)).join('; ');
  if (inARow === set.consecutive && n >= set.minSamples) {
    return {
      steady: true,
      atSample: n,
      forced: false,
      drifts,
      reason:
        `steady at sample ${n}: every series' drift over the last ${set.window} samples within its ` +
        `${100 * set.confidence} % bound in ${set.consecutive} checks ${set.spacing} samples apart`,
    };
  }
  if (n >= set.maxSamples) {
    return forcedReport(
      set,
      n,
      moving.length ? `still drifting: ${drifting}` : 'not enough consecutive passing checks',
      drifts,
    );
  }
  const waiting = (reason: string): SteadyStateReport => ({
    steady: false,
    atSample: null,
    forced: false,
    drifts,
    reason,
  });
  if (moving.length) return waiting(`not steady: ${drifting}`);
  if (inARow < set.consecutive) {
    return waiting(`drift within bounds; ${inARow} of ${set.consecutive} checks ${set.spacing} samples apart passed`);
  }
  return waiting(`drift within bounds; waiting for the minimum transient (${n} of ${set.minSamples} samples)`);
}

function forcedReport(
  set: Settings,
  n: number,
  detail: string,
  drifts: readonly SeriesDrift[] = [],
): SteadyStateReport {
  const reason = `maximum transient of ${set.maxSamples} samples reached; ${detail}`;
  return { steady: true, atSample: n, forced: true, drifts, reason };
}

/** Creates a steady-state detector; throws for options out of range, naming the option. */
export function createSteadyStateDetector(options: SteadyStateOptions): SteadyStateDetector {
  const set = settingsOf(options);
  const w = set.window;
  let names: string[] | null = null;
  // The last W values of each series; sample i at index i mod W.
  let rings: Float64Array[] = [];
  // Outcome of the check after sample n at index n mod its length: 1 passed, 0 failed or no check.
  const passed = new Uint8Array((set.consecutive - 1) * set.spacing + 1);
  let samples = 0;
  let report: SteadyStateReport = {
    steady: false,
    atSample: null,
    reason: `collecting: 0 of ${w} samples for the first window`,
    forced: false,
    drifts: [],
  };

  function readSample(values: Readonly<Record<string, number>>): void {
    const sampleIndex = samples;
    if (names === null) {
      const first = Object.keys(values);
      if (first.length === 0) throw new Error('steady-state detector: the first sample has no series');
      names = first;
      rings = first.map(() => new Float64Array(w));
    }
    for (const key of Object.keys(values)) {
      if (!names.includes(key)) {
        throw new Error(
          `steady-state detector: unknown series "${key}" at sample ${sampleIndex} (the first sample had ${names.join(', ')})`,
        );
      }
    }
    for (const name of names) {
      const v = values[name];
      if (v === undefined) throw new Error(`steady-state detector: series "${name}" missing at sample ${sampleIndex}`);
      if (!Number.isFinite(v)) {
        throw new Error(
          `steady-state detector: series "${name}" is ${v} at sample ${sampleIndex}; values must be finite`,
        );
      }
    }
    names.forEach((name, k) => {
      rings[k][sampleIndex % w] = values[name];
    });
  }

  function push(values: Readonly<Record<string, number>>): void {
    if (report.steady) return; // latched: the transient ended once
    readSample(values);
    const n = ++samples;
    if (n < w) {
      // No check yet (and maxSamples ≥ minSamples ≥ W, so no forced end either).
      passed[n % passed.length] = 0;
      report = { ...report, reason: `collecting: ${n} of ${w} samples for the first window` };
      return;
    }
    const start = n % w; // the oldest sample of the window
    const drifts: SeriesDrift[] = names!.map((name, k) => ({
      name,
      ...windowDrift(rings[k], start, set.batches, set.tFactor, set.floor),
    }));
    passed[n % passed.length] = drifts.every((d) => d.steady) ? 1 : 0;
    let inARow = 0;
    while (
      inARow < set.consecutive &&
      n - inARow * set.spacing >= w &&
      passed[(n - inARow * set.spacing) % passed.length] === 1
    )
      inARow++;
    report = reportAfterCheck(set, n, drifts, inARow);
  }

  return { push, state: () => report };
}
