/**
 * The profile of one quantity along a cut (row average across the gap, one column, or one row of cells), with 95 %
 * error bars, a saved run for comparison and the continuum predictions as toggleable overlays; its values and CSV.
 */
import { useMemo, useState } from 'react';
import type { SimulationResult } from '../../engine/results/summarize';
import { Plot } from '../charts/Plot';
import type { Data, Layout } from '../charts/plotly';
import type { ContinuumCurve } from './comparisonView';
import { withDerivedFields } from './derivedFields';
import {
  cellCentres,
  cellSizeOf,
  cutColumn,
  extractCut,
  nearestCentre,
  GAP_SOLID,
  type CutSource,
  type CutSpec,
  type CutDefaultsInput,
  defaultCut,
  defaultCutIndex,
  type ProfileCut,
} from './profileCut';
import { solidCellsFor, type ResultGeometry } from './resultGeometry';
import { loadRunApi } from '../bridge/loadEngine';
import { downloadText } from '../io/download';
import { estimateText, lengthUnitFor, sig, slug } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';
import { CutControls } from './CutControls';
import { ModelToggles } from './ModelToggles';

export interface ProfilePanelProps {
  readonly result: SimulationResult;
  readonly live: boolean;
  readonly compare?: { result: SimulationResult; name: string };
  readonly continuum?: readonly ContinuumCurve[];
  readonly geometry?: ResultGeometry | null;
  /** Case name for the cut's CSV file; no export button without it. */
  readonly exportName?: string;
}

const plotValues = (v: readonly number[]) => v.map((x) => (Number.isFinite(x) ? x : null));
const barValues = (v: readonly number[]) => v.map((x) => (Number.isFinite(x) ? x : 0));

function derivedSource(result: SimulationResult, geometry: ResultGeometry | null): CutSource {
  const gas = geometry?.gas ?? null;
  return { ...result, cells: withDerivedFields(result.cells, gas), profile: withDerivedFields(result.profile, gas) };
}

/** The same cut through another result: same kind, at the grid line nearest the same position. */
function matchingSpec(spec: CutSpec, from: CutSource, to: CutSource): CutSpec {
  if (spec.kind === 'average') return spec;
  const axis = spec.kind === 'vertical' ? 'x' : 'y';
  return { kind: spec.kind, index: nearestCentre(cellCentres(to, axis), cellCentres(from, axis)[spec.index]) };
}

/**
 * Continuum curves that predict this cut, at its own positions: across-gap profiles (no line) on vertical cuts and
 * the average; a prediction along one column or row (the cavity's centrelines) on the cut through the cells nearest
 * to it — within half a cell, so on an even grid either of the two middle columns.
 */
function curvesFor(
  cut: ProfileCut,
  continuum: readonly ContinuumCurve[],
  cellSizeM: { x: number; y: number },
): ContinuumCurve[] {
  const fits = (c: ContinuumCurve) => {
    if (!c.line) return cut.kind !== 'horizontal';
    if (cut.kind === 'average' || (cut.kind === 'vertical') !== (c.line.kind === 'column')) return false;
    const half = 0.5 * (c.line.kind === 'column' ? cellSizeM.x : cellSizeM.y);
    return Math.abs(c.line.atM - cut.atM) <= half * (1 + 1e-9);
  };
  return continuum.filter((c) => fits(c) && c.values.length === cut.positionsM.length);
}

function headingOf(cut: ProfileCut, radial: string, len: { unit: string; factor: number }): string {
  if (cut.kind === 'average') return `Profile along ${radial}: average over x (each row of cells)`;
  const at = `${sig(cut.atM / len.factor, 4)} ${len.unit}`;
  return cut.kind === 'vertical'
    ? `Profile across ${radial} at x = ${at} (one column of cells)`
    : `Profile along x at ${radial} = ${at} (one row of cells)`;
}

export function ProfilePanel({
  result,
  live,
  compare,
  continuum = [],
  geometry = null,
  exportName,
}: ProfilePanelProps) {
  const chosen = useApp((s) => s.profileQuantity);
  // null until the user picks a cut: the default follows the case's geometry (defaultCut).
  const [pickedSpec, setSpec] = useState<CutSpec | null>(null);
  const [hidden, setHidden] = useState<ReadonlySet<string>>(new Set());
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const radial = result.axisymmetric ? 'r' : 'y';
  const source = useMemo(() => derivedSource(result, geometry), [result, geometry]);
  const solid = solidCellsFor(geometry, result.numerics) ?? undefined;
  const columnsM = useMemo(() => cellCentres(source, 'x'), [source]);
  const rowsM = useMemo(() => cellCentres(source, 'y'), [source]);
  const defaults = useMemo(
    (): CutDefaultsInput => ({
      columnsM,
      rowsM,
      blocks: geometry?.blocks ?? [],
      solidCells: solid,
      axisymmetric: result.axisymmetric,
      ductFlow: result.flow !== undefined,
    }),
    [columnsM, rowsM, geometry, solid, result.axisymmetric, result.flow],
  );
  const chosenSpec = pickedSpec ?? defaultCut(defaults);
  // A cut chosen on another result may lie beyond this grid: kept, but clamped to its last column or row.
  const last = (chosenSpec.kind === 'vertical' ? columnsM.length : rowsM.length) - 1;
  const spec = useMemo(
    (): CutSpec => ({ kind: chosenSpec.kind, index: Math.max(0, Math.min(last, chosenSpec.index)) }),
    [chosenSpec, last],
  );
  const cut = useMemo(() => extractCut(source, spec, solid), [source, spec, solid]);
  const f = Math.max(0, cut.names.indexOf(chosen));
  const name = cut.names[f];
  const unit = cut.units[f];
  const along = cut.along === 'x' ? 'x' : radial;
  const positions = useMemo(() => Array.from(cut.positionsM, (v) => v / len.factor), [cut, len.factor]);
  const values = useMemo(() => cutColumn(cut, name), [cut, name]);
  const cellSizeM = useMemo(() => cellSizeOf(result), [result]);
  const curves = useMemo(() => curvesFor(cut, continuum, cellSizeM), [cut, continuum, cellSizeM]);
  const models = useMemo(
    () => [...new Set(curves.filter((c) => c.quantity === name).map((c) => c.model))],
    [curves, name],
  );
  const shownCurves = useMemo(() => curves.filter((c) => !hidden.has(c.model)), [curves, hidden]);
  const quantityCurves = shownCurves.filter((c) => c.quantity === name);
  const data = useMemo((): Data[] => {
    const traces: Data[] = [
      {
        type: 'scatter',
        mode: 'lines+markers',
        name: live ? 'this run (live)' : 'this run',
        x: positions,
        y: plotValues(values.mean),
        error_y: { type: 'data', array: barValues(values.ci95), visible: true },
      },
    ];
    if (compare) {
      const other = derivedSource(compare.result, null);
      const c = cutColumn(extractCut(other, matchingSpec(spec, source, other)), name);
      if (c.mean.length > 0) {
        const at =
          spec.kind === 'horizontal'
            ? cellCentres(other, 'x')
            : spec.kind === 'vertical'
              ? cellCentres(other, 'y')
              : other.profileY;
        traces.push({
          type: 'scatter',
          mode: 'lines+markers',
          name: `saved: ${compare.name}`,
          x: Array.from(at, (v) => v / len.factor),
          y: plotValues(c.mean),
          error_y: { type: 'data', array: barValues(c.ci95), visible: true },
          marker: { symbol: 'square' },
        });
      }
    }
    for (const curve of quantityCurves) {
      traces.push({
        type: 'scatter',
        mode: 'lines',
        name: curve.model,
        x: (curve.y ?? Array.from(cut.positionsM)).map((v) => v / len.factor),
        y: [...curve.values],
        line: { dash: 'dash' },
      });
    }
    return traces;
  }, [positions, values, live, compare, spec, source, name, len.factor, quantityCurves, cut]);
  const layout = useMemo(
    (): Partial<Layout> => ({
      xaxis: { title: { text: `${along} [${len.unit}]` }, zeroline: false },
      yaxis: { title: { text: `${name} [${unit}]` } },
      legend: { orientation: 'h', y: -0.2 },
      height: 380,
    }),
    [name, unit, len.unit, along],
  );
  const exportCut = async () => {
    const api = await loadRunApi();
    const predictions = shownCurves.map((c) => ({ quantity: c.quantity, model: c.model, values: c.values }));
    const where =
      cut.kind === 'average'
        ? 'average'
        : `${cut.kind}-${sig(cut.atM / len.factor, 4)}${len.unit === 'µm' ? 'um' : len.unit}`;
    downloadText(
      `${slug(exportName ?? 'case')}-cut-${slug(where)}.csv`,
      api.cutProfileCsv(cut, predictions),
      'text/csv;charset=utf-8',
    );
  };
  const toggle = (model: string, shown: boolean) => {
    const next = new Set(hidden);
    if (shown) next.delete(model);
    else next.add(model);
    setHidden(next);
  };
  const gaps = cut.gap.reduce((s, g) => s + (g ? 1 : 0), 0);
  return (
    <section className="panel" aria-labelledby="profile-title" data-testid="profile-panel" data-cut={cut.kind}>
      <h2 id="profile-title">{headingOf(cut, radial, len)}</h2>
      <div className="cut-controls">
        <QuantitySelect
          id="profile-quantity"
          label="quantity"
          names={cut.names}
          units={cut.units}
          value={name}
          onChange={(q) => appStore.getState().select({ profileQuantity: q })}
        />
        <CutControls
          spec={spec}
          columnsM={columnsM}
          rowsM={rowsM}
          lengthUnit={len}
          radial={radial}
          onChange={setSpec}
          startOf={(kind) => defaultCutIndex(kind, defaults)}
        />
      </div>
      <Plot
        data={data}
        layout={layout}
        filename={`profile-${name}`}
        label={`profile of ${name}`}
        testId="profile-plot"
      />
      <ModelToggles models={models} hidden={hidden} onToggle={toggle} />
      {continuum.length > 0 && curves.length === 0 && (
        <p className="hint">
          {continuum.some((c) => c.line)
            ? 'The continuum predictions hold along particular lines (here: ' +
              [
                ...new Set(
                  continuum
                    .filter((c) => c.line)
                    .map(
                      (c) =>
                        `${c.line!.kind === 'column' ? 'x' : radial} = ${sig(c.line!.atM / len.factor, 4)} ${len.unit}`,
                    ),
                ),
              ].join(', ') +
              '): choose the cut through them to see them.'
            : 'The continuum predictions are profiles across the gap: they are drawn on vertical cuts and the average over x.'}
        </p>
      )}
      {gaps > 0 && (
        <p className="hint" data-testid="cut-gaps">
          {gaps} of {cut.gap.length} points lie inside blocks or saw no molecule: left blank.
        </p>
      )}
      {!live && exportName !== undefined && (
        <div className="actions">
          <button type="button" onClick={() => void exportCut()}>
            This cut (CSV)
          </button>
          <span className="hint">every quantity along the cut with its 95 % half-width, and the predictions shown</span>
        </div>
      )}
      <details>
        <summary>
          Profile values ({cut.positionsM.length} points, {result.cells.batches} batches of{' '}
          {result.cells.batchLengthSteps} steps)
        </summary>
        <table className="grid" data-testid="profile-values">
          <thead>
            <tr>
              <th>
                {along} [{len.unit}]
              </th>
              <th>
                {name} [{unit}] ± 95 %
              </th>
              {quantityCurves.map((c) => (
                <th key={c.model}>
                  {c.model} [{unit}]
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {positions.map((v, r) => (
              <tr key={r}>
                <td>{sig(v, 4)}</td>
                <td data-mean={String(values.mean[r])} data-ci95={String(values.ci95[r])}>
                  {cut.gap[r]
                    ? cut.gap[r] === GAP_SOLID
                      ? '— (inside a block)'
                      : '— (no molecule sampled)'
                    : estimateText(values.mean[r], values.ci95[r])}
                </td>
                {quantityCurves.map((c) => (
                  <td key={c.model}>{sig(c.values[r], 4)}</td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </section>
  );
}
