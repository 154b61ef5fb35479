/** The profile across the gap (row averages) of one quantity, with 95 % error bars, comparison and overlays. */
import { useMemo } from 'react';
import type { SimulationResult, FieldTable } from '../../engine/results/summarize';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import type { ContinuumCurve } from '../results/extensions';
import { estimateText, lengthUnitFor, sig } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';

function column(t: FieldTable, f: number, of: Float64Array): number[] {
  const out: number[] = [];
  for (let r = 0; r < t.rows; r++) out.push(of[r * t.names.length + f]);
  return out;
}

export interface ProfilePanelProps {
  readonly result: SimulationResult;
  readonly live: boolean;
  readonly compare?: { result: SimulationResult; name: string };
  readonly continuum?: readonly ContinuumCurve[];
}

export function ProfilePanel({ result, live, compare, continuum = [] }: ProfilePanelProps) {
  const chosen = useApp((s) => s.profileQuantity);
  const t = result.profile;
  const f = Math.max(0, t.names.indexOf(chosen));
  const name = t.names[f];
  const unit = t.units[f];
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const y = useMemo(() => Array.from(result.profileY, (v) => v / len.factor), [result, len.factor]);
  const data = useMemo((): Data[] => {
    const traces: Data[] = [{
      type: 'scatter', mode: 'lines+markers', name: live ? 'this run (live)' : 'this run', x: y, y: column(t, f, t.mean),
      error_y: { type: 'data', array: column(t, f, t.ci95).map((v) => (Number.isFinite(v) ? v : 0)), visible: true },
    }];
    if (compare) {
      const c = compare.result.profile;
      const k = c.names.indexOf(name);
      if (k >= 0) {
        traces.push({
          type: 'scatter', mode: 'lines+markers', name: `saved: ${compare.name}`, x: Array.from(compare.result.profileY, (v) => v / len.factor), y: column(c, k, c.mean),
          error_y: { type: 'data', array: column(c, k, c.ci95).map((v) => (Number.isFinite(v) ? v : 0)), visible: true }, marker: { symbol: 'square' },
        });
      }
    }
    for (const curve of continuum.filter((c) => c.quantity === name)) {
      traces.push({ type: 'scatter', mode: 'lines', name: curve.model, x: (curve.y ?? Array.from(result.profileY)).map((v) => v / len.factor), y: [...curve.values], line: { dash: 'dash' } });
    }
    return traces;
  }, [result, compare, continuum, t, f, name, y, live, len.factor]);
  const layout = useMemo((): Partial<Layout> => ({
    xaxis: { title: { text: `y [${len.unit}]` }, zeroline: false },
    yaxis: { title: { text: `${name} [${unit}]` } },
    legend: { orientation: 'h', y: -0.2 },
    height: 380,
  }), [name, unit, len.unit]);
  return (
    <section className="panel" aria-labelledby="profile-title">
      <h2 id="profile-title">Profile along y (averages over each row of cells)</h2>
      <QuantitySelect id="profile-quantity" label="quantity" names={t.names} units={t.units} value={name} onChange={(q) => appStore.getState().select({ profileQuantity: q })} />
      <Plot data={data} layout={layout} filename={`profile-${name}`} label={`profile of ${name}`} testId="profile-plot" />
      <details>
        <summary>Profile values ({t.rows} rows, {t.batches} batches of {t.batchLengthSteps} steps)</summary>
        <table className="grid" data-testid="profile-values">
          <thead><tr><th>y [{len.unit}]</th><th>{name} [{unit}] ± 95 %</th></tr></thead>
          <tbody>
            {y.map((v, r) => (
              <tr key={r}><td>{sig(v, 4)}</td><td data-mean={String(t.mean[r * t.names.length + f])} data-ci95={String(t.ci95[r * t.names.length + f])}>{estimateText(t.mean[r * t.names.length + f], t.ci95[r * t.names.length + f])}</td></tr>
            ))}
          </tbody>
        </table>
      </details>
    </section>
  );
}
