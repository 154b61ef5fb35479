/**
 * A map of one cell field over the domain (heatmap of the cells), with the case's walls and blocks drawn on top.
 * Speed and Mach number are derived from the cell means (results/derivedFields.ts); cells with no gas are blank.
 */
import { cellSizeOf } from './profileCut';
import { useMemo } from 'react';
import type { SimulationResult } from '../../engine/results/summarize';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import { lengthUnitFor } from '../format';
import { withDerivedFields } from './derivedFields';
import { geometryOverlay } from './geometryOverlay';
import { solidCellsFor, type ResultGeometry } from './resultGeometry';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';

export function FieldMapPanel({
  result,
  geometry = null,
}: {
  result: SimulationResult;
  geometry?: ResultGeometry | null;
}) {
  const chosen = useApp((s) => s.fieldQuantity);
  const t = useMemo(() => withDerivedFields(result.cells, geometry?.gas ?? null), [result, geometry]);
  const f = Math.max(0, t.names.indexOf(chosen));
  const name = t.names[f];
  const { cellsX, cellsY } = result.numerics;
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const radial = result.axisymmetric ? 'r' : 'y';
  const overlay = useMemo(() => geometryOverlay(geometry, len.factor), [geometry, len.factor]);
  const data = useMemo((): Data[] => {
    const w = t.names.length;
    const solid = solidCellsFor(geometry, result.numerics);
    const z: (number | null)[][] = [];
    const ci: (number | null)[][] = [];
    for (let iy = 0; iy < cellsY; iy++) {
      const row: (number | null)[] = [];
      const ciRow: (number | null)[] = [];
      for (let ix = 0; ix < cellsX; ix++) {
        const c = ix + cellsX * iy;
        const v = t.mean[c * w + f];
        const e = t.ci95[c * w + f];
        const gas = !solid || solid[c] !== 1;
        row.push(gas && Number.isFinite(v) ? v : null);
        ciRow.push(gas && Number.isFinite(e) ? e : null);
      }
      z.push(row);
      ci.push(ciRow);
    }
    // Cell edges (one more than cells): plotly then draws each cell over its true extent.
    const { x: dx, y: dy } = cellSizeOf(result);
    const x = Array.from({ length: cellsX + 1 }, (_, ix) => (ix * dx) / len.factor);
    const y = Array.from({ length: cellsY + 1 }, (_, iy) => (iy * dy) / len.factor);
    return [
      {
        type: 'heatmap',
        x,
        y,
        z,
        customdata: ci as unknown as number[][],
        colorscale: 'Viridis',
        colorbar: { title: { text: `${name} [${t.units[f]}]`, side: 'right' } },
        hovertemplate: `x %{x} ${len.unit}, ${radial} %{y} ${len.unit}<br>${name} %{z:.4g} ± %{customdata:.2g} [${t.units[f]}]<extra></extra>`,
      },
    ];
  }, [result, t, f, name, cellsX, cellsY, len, radial, geometry]);
  const layout = useMemo(
    (): Partial<Layout> => ({
      xaxis: { title: { text: `x [${len.unit}]` }, constrain: 'domain' },
      yaxis: { title: { text: `${radial} [${len.unit}]` } },
      shapes: overlay.shapes,
      annotations: overlay.annotations,
      height: 380,
    }),
    [len.unit, radial, overlay],
  );
  return (
    <section className="panel" aria-labelledby="field-map-title">
      <h2 id="field-map-title">Field map of the domain</h2>
      <QuantitySelect
        id="field-quantity"
        label="quantity"
        names={t.names}
        units={t.units}
        value={name}
        onChange={(q) => appStore.getState().select({ fieldQuantity: q })}
      />
      <div data-testid="field-map-geometry" data-wall-shapes={overlay.wallCount} data-block-shapes={overlay.blockCount}>
        <Plot
          data={data}
          layout={layout}
          filename={`field-${name}`}
          label={`field map of ${name}`}
          testId="field-map"
        />
      </div>
      <p className="hint">
        {overlay.wallCount > 0 ? 'Walls: thick black lines, named. ' : ''}
        {overlay.blockCount > 0 ? 'Blocks: grey, named; cells wholly inside them hold no gas and are left blank. ' : ''}
        {result.axisymmetric ? 'Axisymmetric: x is the axis, r the radius. ' : ''}
        Hover a cell for its value with the 95 % half-width; speed and Mach number are formed from the cell means
        (first-order error propagation).
      </p>
    </section>
  );
}
