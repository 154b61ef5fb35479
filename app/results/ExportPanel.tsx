/**
 * Downloads of a finished result: the CSV files and summary.json the command line writes (the engine's own export
 * code: RFC 4180 fields, units in every header, ci95 columns next to values, formula-like text escaped), the case,
 * and the merged samples as a sample file for `tenuis merge`.
 */
import { loadRunApi } from '../bridge/loadEngine';
import type { CachedResult } from './resultCache';
import { downloadBlob, downloadText } from '../io/download';
import { slug } from '../format';

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
