/**
 * The swept quantity against Kn or pressure on log axes: DSMC points with 95 % error bars, each continuum model and
 * the free-molecular limit as lines (the engine's case models over the range, or each point's own predictions).
 */
import { useMemo } from 'react';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import { runApiIfLoaded } from '../bridge/loadEngine';
import { allPositive, modelLines, type SweepPointValue } from './sweepSeries';
import type { SweepContinuumCurves } from '../../engine/report/sweepCurves';

export interface SweepPlotProps {
  readonly points: readonly SweepPointValue[];
  readonly curves: SweepContinuumCurves | { reason: string } | null;
  readonly quantityKey: string;
  readonly quantityLabel: string;
  readonly unit: string;
  /** Axis title of the swept parameter (with its unit) and the SI value → shown value conversion. */
  readonly xTitle: string;
  readonly xOf: (valueSI: number) => number;
}

const DASHES = ['dash', 'dot', 'dashdot', 'longdash', 'solid'] as const;

/**
 * A log axis people read: 1, 2, 5 × each decade while the range spans few decades (plotly's 'D2'), decades alone
 * beyond; numbers as powers of ten, never SI prefixes ("100n"), since the axis title carries the unit already.
 */
export function logAxisTicks(values: readonly number[]): { dtick?: string; exponentformat: 'power' } {
  const v = values.filter((x) => Number.isFinite(x) && x > 0);
  const decades = v.length ? Math.log10(Math.max(...v) / Math.min(...v)) : 0;
  return decades <= 4 ? { dtick: 'D2', exponentformat: 'power' } : { exponentformat: 'power' };
}

export function SweepPlot({ points, curves, quantityKey, quantityLabel, unit, xTitle, xOf }: SweepPlotProps) {
  const lines = useMemo(() => modelLines(points, curves, quantityKey), [points, curves, quantityKey]);
  const data = useMemo((): Data[] => {
    const dsmc = points.filter((p) => Number.isFinite(p.mean));
    const labels = runApiIfLoaded()?.MODEL_LABELS as Readonly<Record<string, string>> | undefined;
    return [
      {
        type: 'scatter',
        mode: 'markers',
        name: 'DSMC (95 % error bars)',
        x: dsmc.map((p) => xOf(p.value)),
        y: dsmc.map((p) => p.mean),
        error_y: { type: 'data', array: dsmc.map((p) => (Number.isFinite(p.ci95) ? p.ci95 : 0)), visible: true },
        marker: { size: 8 },
      },
      ...lines.map((l, k): Data => ({
        type: 'scatter',
        mode: 'lines',
        name: labels?.[l.model] ?? l.model,
        x: l.x.map(xOf),
        y: l.y,
        line: { dash: DASHES[k % DASHES.length] },
      })),
    ];
  }, [points, lines, xOf]);
  const logY = allPositive([...points.map((p) => p.mean), ...lines.flatMap((l) => l.y)]);
  const layout = useMemo(
    (): Partial<Layout> => ({
      xaxis: {
        title: { text: xTitle },
        type: 'log',
        ...logAxisTicks(data.flatMap((d) => (d as { x?: number[] }).x ?? [])),
      },
      yaxis: {
        title: { text: `${quantityLabel} [${unit}]` },
        type: logY ? 'log' : 'linear',
        ...(logY
          ? logAxisTicks(data.flatMap((d) => (d as { y?: number[] }).y ?? []))
          : { exponentformat: 'power' as const }),
      },
      legend: { orientation: 'h', y: -0.22 },
      height: 420,
    }),
    [xTitle, quantityLabel, unit, logY, data],
  );
  return (
    <Plot
      data={data}
      layout={layout}
      filename={`sweep-${quantityLabel.replace(/\s+/g, '-')}`}
      label={`${quantityLabel} against the swept parameter`}
      testId="sweep-plot"
    />
  );
}
