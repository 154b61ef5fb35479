/**
 * What a saved sweep holds, decided in one typed table: everything the Sweep view needs to show it again with the
 * same numbers (the base case, the request and form texts, each finished point's row — its summary.json object —,
 * failures, the continuum curves) and what the list shows. Plain data (structured-clone safe, no typed arrays).
 * A sweep is saved when it starts and again as each point ends, so a record still marked `running` that no page is
 * running was interrupted (by a reload or a closed tab) after its `pointsDone` points.
 */
import type { SweepParameter } from '../../engine/case/sweep';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SweepContinuumCurves } from '../../engine/report/sweepCurves';
import type { SweepQuantity, SweepRequest } from '../bridge/types';
import type { SweepFormState } from './sweepForm';

export type SavedSweepStatus = 'running' | 'finished' | 'stopped';

export interface SavedSweepMeta {
  readonly id: string;
  readonly name: string;
  /** ISO 8601 times the sweep started and its record last changed. */
  readonly startedAt: string;
  readonly updatedAt: string;
  readonly caseName: string;
  readonly parameter: SweepParameter;
  readonly status: SavedSweepStatus;
  /** Points that ended (complete, interrupted or failed), and how many the sweep has. */
  readonly pointsDone: number;
  readonly pointCount: number;
  readonly failedPoints: number;
  /** Replicas each point ran with. */
  readonly replicas: number;
}

/** The parts of the plan the view shows (the per-point cases are not kept: baseCase and request plan them again). */
export interface SweepPlanOutline {
  readonly caseName: string;
  readonly planar: boolean;
  readonly hasFlow: boolean;
  readonly quantities: readonly SweepQuantity[];
  readonly pointCount: number;
}

export interface SavedSweepRecord extends SavedSweepMeta {
  readonly baseCase: unknown;
  readonly request: SweepRequest;
  /** The form's texts as they were when the sweep started. */
  readonly form: SweepFormState;
  readonly plan: SweepPlanOutline;
  readonly rows: readonly SweepRow[];
  readonly failures: Readonly<Record<number, string>>;
  readonly curves: SweepContinuumCurves | { readonly reason: string } | null;
  readonly notices: readonly string[];
}

/** Keys of the record that the list shows; typed over SavedSweepMeta so a new field must be placed here. */
const META_KEYS: { readonly [K in keyof SavedSweepMeta]: true } = {
  id: true,
  name: true,
  startedAt: true,
  updatedAt: true,
  caseName: true,
  parameter: true,
  status: true,
  pointsDone: true,
  pointCount: true,
  failedPoints: true,
  replicas: true,
};

export function sweepMetaOf(r: SavedSweepRecord): SavedSweepMeta {
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(META_KEYS)) out[k] = (r as unknown as Record<string, unknown>)[k];
  return out as unknown as SavedSweepMeta;
}

/** The counts of the meta from the rows, so they cannot disagree with what is kept. */
export function sweepCounts(rows: readonly SweepRow[]): Pick<SavedSweepMeta, 'pointsDone' | 'failedPoints'> {
  return { pointsDone: rows.length, failedPoints: rows.filter((r) => r.status === 'failed').length };
}

/**
 * How a saved sweep stands, seen from a page whose own running sweep (if any) is `activeId`: a `running` record of
 * another page or of an earlier page load is interrupted at the point after its last finished one.
 */
export type SweepStanding =
  { readonly kind: 'running' | 'finished' | 'stopped' } | { readonly kind: 'interrupted'; readonly atPoint: number };

export function sweepStanding(
  m: Pick<SavedSweepMeta, 'id' | 'status' | 'pointsDone' | 'pointCount'>,
  activeId: string | null,
): SweepStanding {
  if (m.status !== 'running') return { kind: m.status };
  if (m.id === activeId) return { kind: 'running' };
  // Every point ended but the end of the sweep was not written: nothing is missing.
  if (m.pointsDone >= m.pointCount) return { kind: 'finished' };
  return { kind: 'interrupted', atPoint: m.pointsDone + 1 };
}

/** The list's status cell: "finished, 3 of 3 points", "interrupted at point 2 of 3 (1 finished point kept)" … */
export function sweepStandingText(m: SavedSweepMeta, activeId: string | null): string {
  const s = sweepStanding(m, activeId);
  const failed = m.failedPoints ? `, ${m.failedPoints} failed` : '';
  const kept = `${m.pointsDone} finished point${m.pointsDone === 1 ? '' : 's'} kept`;
  switch (s.kind) {
    case 'running':
      return `running, ${m.pointsDone} of ${m.pointCount} points done${failed}`;
    case 'finished':
      return `finished, ${m.pointsDone} of ${m.pointCount} points${failed}`;
    case 'stopped':
      return `stopped after ${m.pointsDone} of ${m.pointCount} points${failed}`;
    case 'interrupted':
      return `interrupted at point ${s.atPoint} of ${m.pointCount} (${kept}${failed})`;
  }
}

/** Whether a value read from the database has the shape of a saved sweep (anything else is left out of the list). */
export function isSavedSweepRecord(x: unknown): x is SavedSweepRecord {
  if (typeof x !== 'object' || x === null) return false;
  const r = x as Record<string, unknown>;
  return (
    typeof r.id === 'string' &&
    typeof r.name === 'string' &&
    typeof r.startedAt === 'string' &&
    ['running', 'finished', 'stopped'].includes(r.status as string) &&
    Array.isArray(r.rows) &&
    typeof r.request === 'object' &&
    r.request !== null &&
    typeof r.plan === 'object' &&
    r.plan !== null &&
    Array.isArray((r.plan as { quantities?: unknown }).quantities) &&
    typeof r.form === 'object' &&
    r.form !== null
  );
}
