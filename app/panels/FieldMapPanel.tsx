/** A map of one cell field over the domain (heatmap of cell centres), walls named on the axes. */
import { useMemo } from 'react';
import type { SimulationResult } from '../../engine/results/summarize';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import { lengthUnitFor } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';

export function FieldMapPanel({ result }: { result: SimulationResult }) {
  const chosen = useApp((s) => s.fieldQuantity);
  const t = result.cells;
  const f = Math.max(0, t.names.indexOf(chosen));
  const name = t.names[f];
  const { cellsX, cellsY } = result.numerics;
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const data = useMemo((): Data[] => {
    const z: (number | null)[][] = [];
    for (let iy = 0; iy < cellsY; iy++) {
      const row: (number | null)[] = [];
      for (let ix = 0; ix < cellsX; ix++) {
        const v = t.mean[(ix + cellsX * iy) * t.names.length + f];
        row.push(Number.isFinite(v) ? v : null);
      }
      z.push(row);
    }
    // Cell edges (one more than cells): plotly then draws each cell over its true extent.
    const dx = cellsX > 1 ? result.cellX[1] - result.cellX[0] : 2 * result.cellX[0];
    const dy = cellsY > 1 ? result.cellY[cellsX] - result.cellY[0] : 2 * result.cellY[0];
    const x = Array.from({ length: cellsX + 1 }, (_, ix) => (ix * dx) / len.factor);
    const y = Array.from({ length: cellsY + 1 }, (_, iy) => (iy * dy) / len.factor);
    return [{ type: 'heatmap', x, y, z, colorscale: 'Viridis', colorbar: { title: { text: `${name} [${t.units[f]}]`, side: 'right' } } }];
  }, [result, t, f, name, cellsX, cellsY, len.factor]);
  const layout = useMemo((): Partial<Layout> => ({
    xaxis: { title: { text: `x [${len.unit}]` }, constrain: 'domain' },
    yaxis: { title: { text: `y [${len.unit}]` } },
    height: 380,
  }), [len.unit]);
  return (
    <section className="panel" aria-labelledby="field-map-title">
      <h2 id="field-map-title">Field map of the domain</h2>
      <QuantitySelect id="field-quantity" label="quantity" names={t.names} units={t.units} value={name} onChange={(q) => appStore.getState().select({ fieldQuantity: q })} />
      <Plot data={data} layout={layout} filename={`field-${name}`} label={`field map of ${name}`} testId="field-map" />
    </section>
  );
}
