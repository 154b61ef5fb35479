/**
 * The Sweep view's state as a saved record and back (pure): the record a sweep starts with, the fields that change
 * as its points end, and what the view shows when a saved sweep is reopened — the same rows, curves and form, and
 * `interrupted` for a sweep that a reload ended.
 */
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SweepRequest } from '../bridge/types';
import { sweepCounts, sweepStanding, type SavedSweepRecord, type SweepPlanOutline } from './savedSweep';
import type { SweepRunState } from '../store/types';
import type { SweepFormState } from './sweepForm';

/** "tube: Kn 1–10, 3 points (log)", "channel: pressure 20–80 mbar, 4 points (linear)". */
export function defaultSweepName(caseName: string, f: SweepFormState): string {
  const range = `${f.fromText.trim()}–${f.toText.trim()}`;
  const what = f.parameter === 'knudsen' ? `Kn ${range}` : `pressure ${range} ${f.pressureUnit}`;
  const n = f.pointsText.trim();
  return `${caseName}: ${what}, ${n} point${n === '1' ? '' : 's'} (${f.spacing})`;
}

export interface NewSweep {
  readonly id: string;
  /** ISO 8601 time the sweep starts. */
  readonly now: string;
  readonly form: SweepFormState;
  readonly baseCase: unknown;
  readonly request: SweepRequest;
  readonly plan: SweepPlanOutline;
  readonly replicas: number;
}

/** The record saved as the sweep starts: no point ended yet, marked running. */
export function newSweepRecord(s: NewSweep): SavedSweepRecord {
  const { parameter, fromText, toText, pressureUnit, pointsText, spacing, quantity } = s.form;
  return {
    id: s.id,
    name: defaultSweepName(s.plan.caseName, s.form),
    startedAt: s.now,
    updatedAt: s.now,
    caseName: s.plan.caseName,
    parameter: s.request.parameter,
    status: 'running',
    pointCount: s.plan.pointCount,
    replicas: s.replicas,
    ...sweepCounts([]),
    baseCase: s.baseCase,
    request: s.request,
    // Only the form's own fields: the store's state object carries the run state and functions too.
    form: { parameter, fromText, toText, pressureUnit, pointsText, spacing, quantity },
    plan: s.plan,
    rows: [],
    failures: {},
    curves: null,
    notices: [],
  };
}

/** The fields that change when a point ends. */
export function pointEndedPatch(
  rows: readonly SweepRow[],
  failures: Readonly<Record<number, string>>,
  now: string,
): Partial<SavedSweepRecord> {
  return { rows, failures, ...sweepCounts(rows), updatedAt: now };
}

/** What the view shows of a saved sweep reopened in a page that is not running it. */
export function shownSweepOf(r: SavedSweepRecord): { readonly form: SweepFormState; readonly run: SweepRunState } {
  const standing = sweepStanding(r, null);
  const quantity = r.plan.quantities.some((q) => q.key === r.form.quantity)
    ? r.form.quantity
    : (r.plan.quantities[0]?.key ?? '');
  return {
    form: { ...r.form, quantity },
    run: {
      // No page runs it (`running` cannot come back without an active id): a running record was interrupted.
      status: standing.kind === 'running' ? 'interrupted' : standing.kind,
      planned: r.plan,
      savedId: r.id,
      request: r.request,
      baseCase: r.baseCase,
      rows: r.rows,
      failures: r.failures,
      current: null,
      curves: r.curves,
      error: null,
      notices: r.notices,
    },
  };
}
