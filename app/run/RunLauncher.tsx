/**
 * Replica count, the precision target and the Run button, disabled (with the reason) while the case or the target has
 * problems or a run goes on.
 */
import { startRun } from './runController';
import { targetRequestOf } from './targetSetting';
import { SWEEP_BUSY, useSweep } from '../sweep/sweepStore';
import { appStore, useApp } from '../store/appStore';

const BUSY = ['starting', 'running', 'paused', 'stopping'];

export function RunLauncher() {
  const replicas = useApp((s) => s.replicas);
  const stopWhenDecided = useApp((s) => s.stopWhenDecided);
  const cores = useApp((s) => s.cores);
  const ready = useApp((s) => s.plan !== null && s.derived?.caseInput != null);
  // The plan shown is the previous change's until the new one is worked out: never run a case not yet checked.
  const pending = useApp((s) => s.planPending);
  const problems = useApp(
    (s) => Object.keys(s.derived?.fieldErrors ?? {}).length + (s.derived?.caseErrors.length ?? 0) + s.planErrors.length,
  );
  const busy = useApp((s) => BUSY.includes(s.status));
  // A sweep's points use the cores' workers already: one pool at a time.
  const sweeping = useSweep((s) => SWEEP_BUSY.includes(s.status));
  const target = useApp((s) => s.target);
  const paths = useApp((s) => s.plan?.targetPaths);
  const checked = targetRequestOf(target, paths ?? []);
  const targetError = checked.ok ? null : checked.message;
  const reason = busy
    ? 'a run is going on'
    : sweeping
      ? 'a sweep is going on (Sweep view)'
      : pending
        ? 'the changed case is being checked'
        : !ready
          ? `fix the ${problems || ''} marked problem${problems === 1 ? '' : 's'} first`
          : targetError
            ? 'fix the precision target first'
            : null;
  const st = appStore.getState();
  return (
    <section className="panel run-launcher" aria-labelledby="launch-title">
      <h2 id="launch-title">Run</h2>
      <div className="field">
        <label htmlFor="replica-count">replicas (Web Workers; this browser reports {cores} cores)</label>
        <div className="field-input">
          <input
            id="replica-count"
            type="number"
            min={1}
            max={64}
            step={1}
            value={replicas}
            onChange={(e) => appStore.getState().setReplicas(Number(e.target.value))}
          />
        </div>
      </div>
      {paths && paths.length > 0 && (
        <fieldset className="target-setting">
          <legend>Precision target (optional)</legend>
          <div className="field">
            <label htmlFor="target-quantity">quantity (as named in summary.json)</label>
            <select
              id="target-quantity"
              value={paths.includes(target.path) ? target.path : ''}
              onChange={(e) => st.setTarget({ path: e.target.value })}
            >
              <option value="">(none: run the planned samples)</option>
              {paths.map((p) => (
                <option key={p} value={p}>
                  {p}
                </option>
              ))}
            </select>
          </div>
          {paths.includes(target.path) && (
            <>
              <div className={`field${targetError ? ' field-invalid' : ''}`}>
                <label htmlFor="target-goal">goal: 95 % half-width / |mean| [%]</label>
                <div className="field-input">
                  <input
                    id="target-goal"
                    inputMode="decimal"
                    value={target.goalPercent}
                    aria-invalid={targetError ? true : undefined}
                    onChange={(e) => st.setTarget({ goalPercent: e.target.value })}
                  />
                </div>
                {targetError && (
                  <p className="field-error" role="alert">
                    {targetError}
                  </p>
                )}
              </div>
              <div className="field">
                <label htmlFor="target-stop">
                  <input
                    id="target-stop"
                    type="checkbox"
                    checked={target.stopWhenReached}
                    onChange={(e) => st.setTarget({ stopWhenReached: e.target.checked })}
                  />{' '}
                  stop when the goal is met (sampling may then run up to 50 × the planned steps)
                </label>
              </div>
            </>
          )}
        </fieldset>
      )}
      <div className="field">
        <label htmlFor="stop-when-decided">
          <input
            id="stop-when-decided"
            type="checkbox"
            checked={stopWhenDecided}
            onChange={(e) => appStore.getState().setStopWhenDecided(e.target.checked)}
          />{' '}
          stop when decided: as soon as no model&apos;s verdict on the headline quantity is undecided
        </label>
      </div>
      <button type="button" className="primary" disabled={reason !== null} onClick={() => void startRun(appStore)}>
        Run the case
      </button>
      {reason && (
        <p className="hint" data-testid="run-disabled-reason">
          Run is disabled: {reason}.
        </p>
      )}
    </section>
  );
}
