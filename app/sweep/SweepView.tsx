/**
 * The Sweep view: the form, progress, exports and saved sweeps on the left; the plot and the points' numbers on the
 * right. The first time it is shown it lists the saved sweeps and shows the latest again.
 */
import { useCallback, useEffect, useMemo } from 'react';
import { setupApi } from '../bridge/loadEngine';
import { SweepForm } from './SweepForm';
import { SweepProgress } from './SweepProgress';
import { SweepPlot } from './SweepPlot';
import { SweepTable } from './SweepTable';
import { SweepExport } from './SweepExport';
import { SavedSweepsPanel } from './SavedSweepsPanel';
import { restoreLastSweep } from './savedSweeps';
import { sweepSeries } from './sweepSeries';
import { sweepStore, useSweep } from './sweepStore';

function SweepResults() {
  const planned = useSweep((s) => s.planned);
  const request = useSweep((s) => s.request);
  const rows = useSweep((s) => s.rows);
  const curves = useSweep((s) => s.curves);
  const failures = useSweep((s) => s.failures);
  const quantity = useSweep((s) => s.quantity);
  const pressureUnit = useSweep((s) => s.pressureUnit);
  const chosen = planned?.quantities.find((q) => q.key === quantity) ?? planned?.quantities[0];
  const points = useMemo(() => (chosen ? sweepSeries(rows, chosen.key) : []), [rows, chosen]);
  const parameter = request?.parameter ?? 'knudsen';
  const xOf = useCallback(
    (v: number) => (parameter === 'knudsen' ? v : setupApi().convertFromSI(v, pressureUnit)),
    [parameter, pressureUnit],
  );
  if (!planned || !chosen) return null;
  const xTitle = parameter === 'knudsen' ? 'Knudsen number [1]' : `pressure [${pressureUnit}]`;
  const reason = curves && 'reason' in curves ? curves.reason : null;
  return (
    <section className="panel" aria-labelledby="sweep-plot-title">
      <h2 id="sweep-plot-title">
        {chosen.label} against the {parameter === 'knudsen' ? 'Knudsen number' : 'pressure'}
      </h2>
      <span className="field-inline">
        <label htmlFor="sweep-quantity">quantity</label>
        <select
          id="sweep-quantity"
          value={chosen.key}
          onChange={(e) => sweepStore.getState().setForm({ quantity: e.target.value })}
        >
          {planned.quantities.map((q) => (
            <option key={q.key} value={q.key}>
              {q.label} [{q.unit}]
            </option>
          ))}
        </select>
      </span>
      {planned.planar && planned.hasFlow && <p className="hint">Planar case: flow numbers per metre of depth.</p>}
      <SweepPlot
        points={points}
        curves={curves}
        quantityKey={chosen.key}
        quantityLabel={chosen.label}
        unit={chosen.unit}
        xTitle={xTitle}
        xOf={xOf}
      />
      {reason && <p className="hint">No continuum curves: {reason}.</p>}
      <SweepTable
        points={points}
        quantityLabel={chosen.label}
        unit={chosen.unit}
        xHeader={xTitle.replace(/^Knudsen number/, 'Kn')}
        xOf={xOf}
        failures={failures}
      />
    </section>
  );
}

export function SweepView() {
  useEffect(() => void restoreLastSweep(), []);
  return (
    <div className="columns">
      <div className="column">
        <SweepForm />
        <SweepProgress />
        <SweepExport />
        <SavedSweepsPanel />
      </div>
      <div className="column">
        <SweepResults />
      </div>
    </div>
  );
}
