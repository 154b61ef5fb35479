/**
 * The engine's continuum comparison (engine/continuum/comparison.ts) as what the results view draws: overlay curves
 * for the profile plot and verdict rows in plain words. Types only from the engine; model labels come with the run API.
 */
import type { ContinuumComparisonResult } from '../../engine/report/comparison';

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

export interface VerdictRow {
  readonly quantity: string;
  readonly unit: string;
  readonly category: string;
  readonly text: string;
  /** DSMC and each model's value, for integral quantities. */
  readonly values: readonly { readonly label: string; readonly value: number }[];
}

export interface ComparisonView {
  readonly recognised: boolean;
  /** What was compared, or why nothing was. */
  readonly description: string;
  readonly curves: readonly ContinuumCurve[];
  readonly verdicts: readonly VerdictRow[];
}

export function comparisonView(
  c: ContinuumComparisonResult | undefined,
  labels: Readonly<Record<string, string>>,
): ComparisonView | null {
  if (!c) return null;
  if (!c.recognised) return { recognised: false, description: c.reason, curves: [], verdicts: [] };
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
  const verdicts: VerdictRow[] = Object.values(c.verdict).map((v) => {
    const values: { label: string; value: number }[] = [];
    if (v.kind === 'integral') {
      for (const [model, perModel] of Object.entries(c.continuum)) {
        const x = perModel?.[v.quantity];
        if (typeof x === 'number') values.push({ label: label(model), value: x });
      }
    }
    return { quantity: v.quantity, unit: v.unit, category: v.category, text: v.text, values };
  });
  return { recognised: true, description: c.predictions.description, curves, verdicts };
}
