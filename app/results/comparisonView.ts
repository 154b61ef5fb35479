/**
 * The engine's continuum comparison (engine/continuum/comparison.ts) as what the results view draws: overlay curves
 * for the profile plot and verdict rows in plain words. Types only from the engine; model labels come with the run API.
 */
import type { ContinuumComparison, ContinuumComparisonResult } from '../../engine/report/comparison';
import type { Headline } from '../../engine/report/headline';

/** One model's prediction of one profile quantity, as the profile plot overlays it. */
export interface ContinuumCurve {
  readonly model: string;
  readonly quantity: string;
  readonly values: readonly number[];
  /** Positions (m); absent = the profile's own rows. */
  readonly y?: readonly number[];
  /**
   * Where the prediction holds: across the gap for every column (absent, the 1D flows), or along one column or row
   * of the domain at a position (m), e.g. the cavity's centrelines.
   */
  readonly line?: { readonly kind: 'column' | 'row'; readonly atM: number };
}

/** adequate | notAdequate | undecided | notApplicable | noData, as in summary.json (engine/report/verdict.ts). */
export type VerdictStatus = string;

/** The words the card shows for a status: never "pass" for an undecided verdict. */
export const STATUS_WORDS: Readonly<Record<string, string>> = {
  adequate: 'adequate',
  notAdequate: 'not adequate',
  undecided: 'undecided',
  notApplicable: 'not applicable here',
  noData: 'no data',
};

export interface VerdictRow {
  readonly quantity: string;
  readonly unit: string;
  readonly status: VerdictStatus;
  readonly text: string;
  /** Each model's status, simplest first. */
  readonly models: readonly { readonly label: string; readonly status: VerdictStatus }[];
  /** DSMC and each model's value, for integral quantities. */
  readonly values: readonly { readonly label: string; readonly value: number }[];
}

export interface ComparisonView {
  readonly recognised: boolean;
  /** What was compared, or why nothing was. */
  readonly description: string;
  readonly curves: readonly ContinuumCurve[];
  /** The headline quantity's row first, then the others in the comparison's order. */
  readonly verdicts: readonly VerdictRow[];
  /** One answer first (engine/report/headline.ts), with the time to decide when the run's wall time is known. */
  readonly headline: { readonly text: string; readonly status: VerdictStatus; readonly time: string } | null;
}

/** What the view needs from the lazily loaded run API: labels and the headline functions. */
export interface ComparisonApi {
  readonly MODEL_LABELS: Readonly<Record<string, string>>;
  verdictHeadline(c: ContinuumComparison): Headline;
  extraTimeText(h: Headline, sampledSeconds: number): string;
}

/**
 * The view of a comparison; `api` null while the run API is not loaded (no labels, no headline), `sampledSeconds`
 * the sampled part of the run's wall time (NaN unknown).
 */
export function comparisonView(
  c: ContinuumComparisonResult | undefined,
  api: ComparisonApi | null,
  sampledSeconds = NaN,
): ComparisonView | null {
  if (!c) return null;
  if (!c.recognised) return { recognised: false, description: c.reason, curves: [], verdicts: [], headline: null };
  const labels = api?.MODEL_LABELS ?? {};
  const label = (m: string) => labels[m] ?? m;
  const curves: ContinuumCurve[] = [];
  for (const p of c.predictions.profiles) {
    const line = p.line.kind === 'rows' ? undefined : { kind: p.line.kind, atM: p.line.atM };
    for (const [model, values] of Object.entries(p.values)) {
      if (values)
        curves.push({
          model: label(model),
          quantity: p.field,
          values: Array.from(values),
          y: Array.from(p.positionsM),
          ...(line ? { line } : {}),
        });
    }
  }
  const first = c.predictions.headline;
  const ordered = [...Object.values(c.verdict)].sort(
    (a, b) => Number(b.quantity === first) - Number(a.quantity === first),
  );
  const verdicts: VerdictRow[] = ordered.map((v) => {
    const values: { label: string; value: number }[] = [];
    if (v.kind === 'integral') {
      for (const [model, perModel] of Object.entries(c.continuum)) {
        const x = perModel?.[v.quantity];
        if (typeof x === 'number') values.push({ label: label(model), value: x });
      }
    }
    const models = v.models.map((d) => ({ label: label(d.model), status: d.status }));
    return { quantity: v.quantity, unit: v.unit, status: v.status, text: v.text, values, models };
  });
  let headline: ComparisonView['headline'] = null;
  if (api) {
    const h = api.verdictHeadline(c);
    const status = c.verdict[h.quantity]?.status ?? 'noData';
    headline = { text: h.text, status, time: api.extraTimeText(h, sampledSeconds) };
  }
  return { recognised: true, description: c.predictions.description, curves, verdicts, headline };
}
