/** Progress of the run: bar, steps, samples, elapsed and remaining time, each replica's state, and notices. */
import { countText, durationText } from '../format';
import type { TargetView } from '../bridge/types';
import { pauseRun, resumeRun, stopRun } from './runController';
import { appStore, useApp } from '../store/appStore';

function percentText(fraction: number): string {
  return Number.isFinite(fraction) ? `${(100 * fraction).toPrecision(2)} %` : '—';
}

/** The precision target's current half-width against its goal, and the sampling time still needed for it. */
function TargetRow({ target }: { target: TargetView }) {
  const known = Number.isFinite(target.current);
  const now = target.reached
    ? `±${percentText(target.current)}: goal met`
    : known
      ? `±${percentText(target.current)} now; about ${durationText(target.remainingSeconds)} more sampling to the goal (estimate)`
      : 'no estimate yet (too few batches)';
  return (
    <tr>
      <th scope="row">precision of {target.path} (95 % half-width / |mean|)</th>
      <td
        data-testid="progress-target"
        data-current={String(target.current)}
        data-goal={String(target.goal)}
        data-reached={String(target.reached)}
      >
        <div>
          goal ±{percentText(target.goal)}; {now}
          {target.stopWhenReached ? '. The run stops when the goal is met.' : '.'}
        </div>
        <meter
          min={0}
          max={1}
          value={known ? Math.min(1, target.goal / target.current) : 0}
          aria-label="precision reached towards the goal"
        />
      </td>
    </tr>
  );
}

export function RunProgress() {
  const status = useApp((s) => s.status);
  const p = useApp((s) => s.progress);
  const notices = useApp((s) => s.notices);
  const error = useApp((s) => s.runError);
  const active = status === 'running' || status === 'paused' || status === 'starting' || status === 'stopping';
  const fraction = status === 'finished' ? 1 : (p?.fraction ?? 0);
  return (
    <section className="panel" aria-labelledby="progress-title">
      <h2 id="progress-title">Run progress</h2>
      <p data-testid="run-status">
        Status: <strong>{status}</strong>
      </p>
      <progress
        max={1}
        value={fraction}
        aria-label="run progress"
        data-testid="run-progress"
        data-fraction={fraction.toFixed(4)}
      />
      <span className="percent"> {(100 * fraction).toFixed(0)} %</span>
      {p && (
        <table className="kv" aria-label="progress numbers">
          <tbody>
            <tr>
              <th scope="row">steps (mean per replica)</th>
              <td data-testid="progress-steps">
                {countText(p.stepsDone)} of {p.target?.stopWhenReached ? 'at most ' : ''}
                {countText(p.totalSteps)}
                {p.inTransient ? ' (transient still running: total is an estimate)' : ''}
              </td>
            </tr>
            <tr>
              <th scope="row">sampled steps (all replicas)</th>
              <td data-testid="progress-samples">{countText(p.sampledSteps)}</td>
            </tr>
            <tr>
              <th scope="row">elapsed</th>
              <td>{durationText(p.elapsedSeconds)}</td>
            </tr>
            <tr>
              <th scope="row">remaining (estimate)</th>
              <td>{status === 'finished' ? '0 s' : durationText(p.remainingSeconds)}</td>
            </tr>
            {p.target && <TargetRow target={p.target} />}
          </tbody>
        </table>
      )}
      <div className="actions">
        <button type="button" disabled={status !== 'running'} onClick={() => pauseRun(appStore)}>
          Pause
        </button>
        <button type="button" disabled={status !== 'paused'} onClick={() => resumeRun(appStore)}>
          Resume
        </button>
        <button type="button" disabled={!active || status === 'stopping'} onClick={() => stopRun(appStore)}>
          Stop and keep samples
        </button>
      </div>
      {p && (
        <ul className="replicas" aria-label="replicas">
          {p.replicas.map((r) => (
            <li key={r.stream} className={r.state === 'lost' ? 'lost' : ''} data-testid={`replica-${r.stream}`}>
              replica {r.stream}:{' '}
              {r.state === 'lost'
                ? `lost — ${r.reason ?? 'its worker failed'}`
                : r.state === 'starting'
                  ? 'starting'
                  : `${r.state}, step ${countText(r.stepsDone)} of ${countText(r.totalSteps)}`}
            </li>
          ))}
        </ul>
      )}
      {notices.length > 0 && (
        <ul className="warnings" aria-label="run notices">
          {notices.map((n) => (
            <li key={n} role="status">
              {n}
            </li>
          ))}
        </ul>
      )}
      {error && (
        <p className="message message-error" role="alert">
          The run failed: {error}
        </p>
      )}
    </section>
  );
}
