/**
 * Live profile of the selected quantity while a run goes on (SVG; see charts/LiveProfileChart.tsx), along the same
 * cut and axis the final profile starts on (profileCut.ts defaultCut): across the middle of a duct, r in an
 * axisymmetric case, so the picture does not change meaning when the run ends.
 */
import { useMemo } from 'react';
import type { SimulationResult } from '../../engine/results/summarize';
import { LiveProfileChart } from '../charts/LiveProfileChart';
import { lengthUnitFor, sig } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';
import { cellCentres, cutColumn, defaultCut, extractCut } from './profileCut';
import { solidCellsFor, type ResultGeometry } from './resultGeometry';

export function LiveProfilePanel({
  result,
  geometry = null,
}: {
  result: SimulationResult;
  geometry?: ResultGeometry | null;
}) {
  const chosen = useApp((s) => s.profileQuantity);
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const radial = result.axisymmetric ? 'r' : 'y';
  const solid = solidCellsFor(geometry, result.numerics) ?? undefined;
  const cut = useMemo(() => {
    const spec = defaultCut({
      columnsM: cellCentres(result, 'x'),
      rowsM: cellCentres(result, 'y'),
      blocks: geometry?.blocks ?? [],
      solidCells: solid,
      axisymmetric: result.axisymmetric,
      ductFlow: result.flow !== undefined,
    });
    return extractCut(result, spec, solid);
  }, [result, geometry, solid]);
  const f = Math.max(0, cut.names.indexOf(chosen));
  const values = cutColumn(cut, cut.names[f]);
  const where = cut.kind === 'vertical' ? ` at x = ${sig(cut.atM / len.factor, 4)} ${len.unit}` : '';
  return (
    <section className="panel" aria-labelledby="live-profile-title">
      <h2 id="live-profile-title">
        Live profile along {radial}
        {where} ({result.numerics.sampleSteps.toLocaleString('en-US')} sampled steps so far)
      </h2>
      <QuantitySelect
        id="live-quantity"
        label="quantity"
        names={cut.names}
        units={cut.units}
        value={cut.names[f]}
        onChange={(q) => appStore.getState().select({ profileQuantity: q })}
      />
      <LiveProfileChart
        x={Array.from(cut.positionsM, (v) => v / len.factor)}
        y={values.mean}
        ci95={values.ci95}
        xLabel={`${radial} [${len.unit}]`}
        yLabel={`${cut.names[f]} [${cut.units[f]}] ± 95 %`}
      />
    </section>
  );
}
