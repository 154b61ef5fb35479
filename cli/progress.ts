/**
 * The progress line of `tenuis run` on stderr: phase, step/total, percent, elapsed and estimated remaining time.
 * On a terminal one line is redrawn in place (\r) a few times a second; otherwise (a log file, CI) a full line is
 * written every few seconds so logs stay short.
 */
import { duration } from './format';

export interface ProgressOptions {
  readonly stream: { write(text: string): unknown; isTTY?: boolean };
  readonly totalSteps: number;
  readonly transientSteps: number;
  /** Time source in ms. */
  readonly now?: () => number;
  /** Minimum ms between redraws on a terminal (default 200) and between lines otherwise (default 5000). */
  readonly ttyIntervalMs?: number;
  readonly lineIntervalMs?: number;
}

export interface Progress {
  /** Reports that `stepsDone` of totalSteps are done; draws when due. */
  update(stepsDone: number): void;
  /** Draws the final state and ends the line. */
  finish(stepsDone: number): void;
  /** Ends an in-place line without drawing again (before printing something else). */
  clear(): void;
  /** Text appended to the line from now on (e.g. the precision reached and the time to the target). */
  setNote(text: string): void;
  /** New totals, when the end of an automatic transient (and so the run's length) becomes known or is re-estimated. */
  setTotals(totalSteps: number, transientSteps: number): void;
}

export function progressText(
  stepsDone: number,
  o: { totalSteps: number; transientSteps: number },
  elapsedS: number,
): string {
  const phase = stepsDone < o.transientSteps ? 'transient' : 'sampling';
  const pct = o.totalSteps > 0 ? (100 * stepsDone) / o.totalSteps : 100;
  // Extrapolated from the mean rate so far; shown as "?" until there is a fraction of a second to go by.
  const remaining = stepsDone > 0 && elapsedS >= 0.3 ? (elapsedS * (o.totalSteps - stepsDone)) / stepsDone : NaN;
  const width = String(o.totalSteps).length;
  return `${phase.padEnd(9)} step ${String(stepsDone).padStart(width)}/${o.totalSteps}  ${pct.toFixed(0).padStart(3)}%  elapsed ${duration(elapsedS)}  remaining ~${duration(remaining)}`;
}

export function createProgress(options: ProgressOptions): Progress {
  const o = { ...options };
  const now = o.now ?? (() => performance.now());
  const tty = o.stream.isTTY === true;
  const interval = tty ? (o.ttyIntervalMs ?? 200) : (o.lineIntervalMs ?? 5000);
  const start = now();
  let last = tty ? start : start - interval; // a log gets its first line at once
  let open = false;
  let note = '';
  const draw = (stepsDone: number) => {
    const text = progressText(stepsDone, o, (now() - start) / 1000) + (note ? `  ${note}` : '');
    if (tty) {
      o.stream.write(`\r${text}\x1b[K`);
      open = true;
    } else o.stream.write(`${text}\n`);
  };
  return {
    update(stepsDone) {
      const t = now();
      if (t - last < interval) return;
      last = t;
      draw(stepsDone);
    },
    finish(stepsDone) {
      if (tty) {
        draw(stepsDone);
        this.clear();
      }
    },
    clear() {
      if (open) o.stream.write('\n');
      open = false;
    },
    setNote(text) {
      note = text;
    },
    setTotals(totalSteps, transientSteps) {
      o.totalSteps = totalSteps;
      o.transientSteps = transientSteps;
    },
  };
}
