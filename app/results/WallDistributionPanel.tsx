/**
 * Distributions along the walls (per wall bin) of one wall quantity — pressure on the wall (normal stress), shear
 * stress, heat flux, number flux — with 95 % error bars, for every wall or one chosen wall.
 */
import { useMemo, useState } from 'react';
import type { SimulationResult, FieldTable } from '../../engine/results/summarize';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import type { ResultGeometry } from './resultGeometry';
import { lengthUnitFor } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';

type WallBins = { position: Float64Array; table: FieldTable };

/** The coordinate a wall's bins run along: y (r) for walls normal to x (left and right sides and faces), else x. */
export function wallRunsAlong(name: string, geometry: ResultGeometry | null): 'x' | 'y' | null {
  const side = geometry?.walls.find((w) => w.name === name);
  if (side) return side.normalIsX ? 'y' : 'x';
  const face = name.split('.').at(-1);
  if (face === 'left' || face === 'right') return 'y';
  if (face === 'bottom' || face === 'top') return 'x';
  return null;
}

const ALL = '';

export function WallDistributionPanel({
  result,
  geometry = null,
}: {
  result: SimulationResult;
  geometry?: ResultGeometry | null;
}) {
  const chosen = useApp((s) => s.wallQuantity);
  const [wall, setWall] = useState(ALL);
  const walls = useMemo(
    () => Object.entries(result.wallBins).filter((w): w is [string, WallBins] => w[1] !== undefined),
    [result],
  );
  const shown = useMemo(() => (wall === ALL ? walls : walls.filter(([n]) => n === wall)), [walls, wall]);
  const first = walls[0]?.[1].table;
  const f = first ? Math.max(0, first.names.indexOf(chosen)) : 0;
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const radial = result.axisymmetric ? 'r' : 'y';
  const axisName = (a: 'x' | 'y' | null) => (a === 'y' ? radial : (a ?? 'position'));
  const data = useMemo(
    (): Data[] =>
      shown.map(([name, bins]) => {
        const t = bins.table;
        const w = t.names.length;
        return {
          type: 'scatter',
          mode: 'lines+markers',
          name: `${name} (along ${axisName(wallRunsAlong(name, geometry))})`,
          x: Array.from(bins.position, (p) => p / len.factor),
          y: Array.from({ length: t.rows }, (_, b) => (Number.isFinite(t.mean[b * w + f]) ? t.mean[b * w + f] : null)),
          error_y: {
            type: 'data',
            visible: true,
            array: Array.from({ length: t.rows }, (_, b) =>
              Number.isFinite(t.ci95[b * w + f]) ? t.ci95[b * w + f] : 0,
            ),
          },
        };
      }),
    [shown, f, len.factor, geometry, radial],
  );
  const directions = new Set(shown.map(([n]) => axisName(wallRunsAlong(n, geometry))));
  const xTitle =
    directions.size === 1
      ? `${[...directions][0]} along the wall [${len.unit}]`
      : `position along each wall (${[...directions].join(' or ')}) [${len.unit}]`;
  const layout = useMemo(
    (): Partial<Layout> => ({
      xaxis: { title: { text: xTitle } },
      yaxis: { title: { text: first ? `${first.names[f]} [${first.units[f]}]` : '' } },
      height: 320,
      showlegend: true,
      legend: { orientation: 'h', y: -0.25 },
    }),
    [first, f, xTitle],
  );
  if (!first) return null;
  return (
    <section className="panel" aria-labelledby="wall-dist-title">
      <h2 id="wall-dist-title">Along the walls</h2>
      <QuantitySelect
        id="wall-quantity"
        label="quantity"
        names={first.names}
        units={first.units}
        value={first.names[f]}
        onChange={(q) => appStore.getState().select({ wallQuantity: q })}
      />
      <span className="field-inline">
        <label htmlFor="wall-choice">wall</label>
        <select id="wall-choice" value={wall} onChange={(e) => setWall(e.target.value)}>
          <option value={ALL}>every wall ({walls.length})</option>
          {walls.map(([n]) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </span>
      <Plot
        data={data}
        layout={layout}
        filename={`walls-${first.names[f]}${wall ? `-${wall}` : ''}`}
        label={`wall distribution of ${first.names[f]}`}
        testId="wall-plot"
      />
      <p className="hint">
        normalStress is the pressure the gas exerts on the wall; shearStress the tangential force per area on the wall
        along +x (walls along x) or +{radial} (walls along {radial}); heatFlux the energy per area and time from the gas
        into the wall, in the wall's frame. One point per wall bin.
      </p>
    </section>
  );
}
