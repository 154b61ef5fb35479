/**
 * Downloads of a sweep: sweep.csv and sweep.json made by the engine's sweepCsv / sweepJson (the functions
 * `tenuis sweep` writes them with: RFC 4180, units in every header, ci95 columns next to values), and the case the
 * sweep started from, so `tenuis sweep case.json …` repeats it.
 */
import { loadRunApi } from '../bridge/loadEngine';
import { downloadText } from '../io/download';
import { slug } from '../format';
import { useSweep, sweepStore } from './sweepStore';

export function SweepExport() {
  const rows = useSweep((s) => s.rows);
  const status = useSweep((s) => s.status);
  if (rows.length === 0) return null;
  const base = slug(sweepStore.getState().planned?.caseName ?? 'sweep');
  const table = async (kind: 'csv' | 'json') => {
    const { planned, request, rows: all, status: st } = sweepStore.getState();
    if (!planned || !request) return;
    const api = await loadRunApi();
    if (kind === 'csv') {
      downloadText(
        `${base}-sweep.csv`,
        api.sweepCsv(all, { parameter: request.parameter, planar: planned.planar, hasFlow: planned.hasFlow }),
        'text/csv;charset=utf-8',
      );
    } else {
      const j = api.sweepJson(all, {
        caseName: planned.caseName,
        parameter: request.parameter,
        from: request.from,
        to: request.to,
        points: request.points,
        spacing: request.spacing,
        interrupted: st === 'stopped' || st === 'interrupted',
      });
      downloadText(`${base}-sweep.json`, `${JSON.stringify(j, null, 2)}\n`, 'application/json');
    }
  };
  const caseFile = () =>
    downloadText(
      `${base}-case.json`,
      `${JSON.stringify(sweepStore.getState().baseCase, null, 2)}\n`,
      'application/json',
    );
  return (
    <section className="panel" aria-labelledby="sweep-export-title">
      <h2 id="sweep-export-title">Export the sweep</h2>
      <div className="actions">
        <button type="button" onClick={() => void table('csv')}>
          sweep.csv
        </button>
        <button type="button" onClick={() => void table('json')}>
          sweep.json
        </button>
        <button type="button" onClick={caseFile}>
          Sweep case (JSON)
        </button>
      </div>
      {status === 'running' && <p className="hint">The files hold the points finished so far.</p>}
    </section>
  );
}
