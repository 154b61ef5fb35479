/**
 * Progress of a sweep: point k of N, the running point's own progress, stop, and notices about the points; for a
 * saved sweep a reload ended, the point it was interrupted at.
 */
import { durationText } from '../format';
import { stopSweep } from './sweepActions';
import { useSweep } from './sweepStore';

export function SweepProgress() {
  const status = useSweep((s) => s.status);
  const current = useSweep((s) => s.current);
  const rows = useSweep((s) => s.rows);
  const count = useSweep((s) => s.planned?.pointCount ?? 0);
  const notices = useSweep((s) => s.notices);
  if (status === 'idle' && rows.length === 0) return null;
  const p = current?.progress ?? null;
  const fraction = p?.fraction ?? 0;
  const failed = rows.filter((r) => r.status === 'failed').length;
  return (
    <section className="panel" aria-labelledby="sweep-progress-title">
      <h2 id="sweep-progress-title">Sweep progress</h2>
      {status === 'interrupted' ? (
        // Points end in order, so the one that was running when the page went away is the one after the last row.
        <p data-testid="sweep-status">
          Status:{' '}
          <strong>
            interrupted at point {Math.min(rows.length + 1, count)} of {count}
          </strong>{' '}
          (the page was reloaded or closed) — {rows.length} finished point{rows.length === 1 ? '' : 's'} kept
          {failed ? `, ${failed} failed` : ''}
        </p>
      ) : (
        <p data-testid="sweep-status">
          Status: <strong>{status}</strong>
          {current ? (
            <>
              {' '}
              — point {current.index + 1} of {current.count}
            </>
          ) : (
            <>
              {' '}
              — {rows.length} of {count} points run{failed ? `, ${failed} failed` : ''}
            </>
          )}
        </p>
      )}
      {current && (
        <>
          <progress
            max={1}
            value={fraction}
            aria-label="progress of the running point"
            data-testid="sweep-point-progress"
          />
          <span className="percent"> {(100 * fraction).toFixed(0)} %</span>
          {p && (
            <p className="hint">
              {p.inTransient ? 'transient' : 'sampling'}, elapsed {durationText(p.elapsedSeconds)}, remaining about{' '}
              {durationText(p.remainingSeconds)}
            </p>
          )}
        </>
      )}
      <div className="actions">
        <button type="button" disabled={status !== 'running'} onClick={stopSweep}>
          Stop the sweep (keep finished points)
        </button>
      </div>
      {notices.length > 0 && (
        <ul className="warnings" aria-label="sweep notices">
          {notices.map((n) => (
            <li key={n} role="status">
              {n}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
