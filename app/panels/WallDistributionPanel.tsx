/** Distributions along each wall (per wall bin) of one wall quantity, with 95 % error bars. */
import { useMemo } from 'react';
import type { SimulationResult } from '../../engine/results/summarize';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import { lengthUnitFor } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';

export function WallDistributionPanel({ result }: { result: SimulationResult }) {
  const chosen = useApp((s) => s.wallQuantity);
  const walls = Object.entries(result.wallBins).filter((w): w is [string, NonNullable<(typeof w)[1]>] => w[1] !== undefined);
  const first = walls[0]?.[1].table;
  const f = first ? Math.max(0, first.names.indexOf(chosen)) : 0;
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const data = useMemo((): Data[] => walls.map(([side, bins]) => {
    const t = bins.table;
    const w = t.names.length;
    return {
      type: 'scatter', mode: 'markers', name: `${side} wall`,
      x: Array.from(bins.position, (p) => p / len.factor),
      y: Array.from({ length: t.rows }, (_, b) => t.mean[b * w + f]),
      error_y: { type: 'data', visible: true, array: Array.from({ length: t.rows }, (_, b) => (Number.isFinite(t.ci95[b * w + f]) ? t.ci95[b * w + f] : 0)) },
    };
  }), [walls, f, len.factor]);
  const layout = useMemo((): Partial<Layout> => ({
    xaxis: { title: { text: `position along the wall [${len.unit}]` } },
    yaxis: { title: { text: first ? `${first.names[f]} [${first.units[f]}]` : '' } },
    height: 320,
    legend: { orientation: 'h', y: -0.25 },
  }), [first, f, len.unit]);
  if (!first) return null;
  return (
    <section className="panel" aria-labelledby="wall-dist-title">
      <h2 id="wall-dist-title">Along the walls</h2>
      <QuantitySelect id="wall-quantity" label="quantity" names={first.names} units={first.units} value={first.names[f]} onChange={(q) => appStore.getState().select({ wallQuantity: q })} />
      <Plot data={data} layout={layout} filename={`walls-${first.names[f]}`} label={`wall distribution of ${first.names[f]}`} testId="wall-plot" />
    </section>
  );
}
