/**
 * Downloads of a finished result: the CSV files and summary.json the command line writes (flow.csv with the units
 * chosen in the results card as extra columns) (the engine's own export
 * code: RFC 4180 fields, units in every header, ci95 columns next to values, formula-like text escaped), the case,
 * and the merged samples as a sample file for `tenuis merge`.
 */
import { loadRunApi } from '../bridge/loadEngine';
import type { CachedResult } from './resultCache';
import { downloadBlob, downloadText } from '../io/download';
import { slug } from '../format';
import { appStore } from '../store/appStore';

const CSV = 'text/csv;charset=utf-8';

export function ExportPanel({ entry }: { entry: CachedResult }) {
  const base = slug(entry.caseName);
  const csv = async (kind: 'profiles' | 'fields' | 'surfaces') => {
    const api = await loadRunApi();
    const text =
      kind === 'profiles'
        ? api.profilesCsv(entry.result, entry.comparison)
        : kind === 'fields'
          ? api.fieldsCsv(entry.result)
          : api.surfacesCsv(entry.result);
    downloadText(`${base}-${kind}.csv`, text, CSV);
  };
  // The command line's flow.csv, plus the units the results card shows as extra columns beside SI.
  const flow = async () => {
    const api = await loadRunApi();
    const f = entry.result.flow;
    if (!f) return;
    const chosen = appStore.getState().flowUnits;
    // A saved choice the table does not know (an older workbench's) falls back to the engine's unit, as the card does.
    const chosenUnits = Object.fromEntries(
      Object.entries(api.FLOW_UNIT_CHOICES).map(([q, options]) => [
        q,
        (options.find((c) => c.unit === chosen[q]) ?? options[0]).unit,
      ]),
    );
    downloadText(`${base}-flow.csv`, api.flowCsv(f, f.perDepth ?? !entry.result.axisymmetric, { chosenUnits }), CSV);
  };
  const summary = async () => {
    const api = await loadRunApi();
    const performance = entry.performance ?? { wallSeconds: NaN, particleSteps: NaN, particleStepsPerSecond: NaN };
    downloadText(
      `${base}-summary.json`,
      api.summaryJsonText(entry.result, { performance, caseName: entry.caseName, comparison: entry.comparison }),
      'application/json',
    );
  };
  const verdict = async () => {
    const api = await loadRunApi();
    if (entry.comparison?.recognised) downloadText(`${base}-verdict.csv`, api.verdictCsv(entry.comparison), CSV);
  };
  return (
    <section className="panel" aria-labelledby="export-title">
      <h2 id="export-title">Export</h2>
      <div className="actions">
        <button type="button" onClick={() => void csv('profiles')}>
          Profiles (CSV)
        </button>
        <button type="button" onClick={() => void csv('fields')}>
          Cell fields (CSV)
        </button>
        <button type="button" onClick={() => void csv('surfaces')}>
          Wall distributions (CSV)
        </button>
        {entry.result.flow && (
          <button type="button" onClick={() => void flow()}>
            Flow numbers (CSV)
          </button>
        )}
        <button type="button" onClick={() => void summary()}>
          Summary (JSON)
        </button>
        {entry.comparison?.recognised && (
          <button type="button" onClick={() => void verdict()}>
            Verdict (CSV)
          </button>
        )}
        <button
          type="button"
          onClick={() =>
            downloadText(`${base}-case.json`, `${JSON.stringify(entry.caseInput, null, 2)}\n`, 'application/json')
          }
        >
          Case (JSON)
        </button>
        {entry.samples && (
          <button type="button" onClick={() => downloadBlob(`${base}.tsamples`, new Blob([entry.samples!]))}>
            Samples (for tenuis merge)
          </button>
        )}
      </div>
      <p className="hint">Plots: use “Save plot as PNG / SVG” under each plot.</p>
    </section>
  );
}
