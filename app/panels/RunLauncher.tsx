/** Replica count and the Run button, disabled (with the reason) while the case has problems or a run goes on. */
import { startRun } from '../run/runController';
import { appStore, useApp } from '../store/appStore';

const BUSY = ['starting', 'running', 'paused', 'stopping'];

export function RunLauncher() {
  const replicas = useApp((s) => s.replicas);
  const cores = useApp((s) => s.cores);
  const ready = useApp((s) => s.plan !== null && s.derived?.caseInput != null);
  const problems = useApp((s) => Object.keys(s.derived?.fieldErrors ?? {}).length + (s.derived?.caseErrors.length ?? 0) + s.planErrors.length);
  const busy = useApp((s) => BUSY.includes(s.status));
  const reason = busy ? 'a run is going on' : !ready ? `fix the ${problems || ''} marked problem${problems === 1 ? '' : 's'} first` : null;
  return (
    <section className="panel run-launcher" aria-labelledby="launch-title">
      <h2 id="launch-title">Run</h2>
      <div className="field">
        <label htmlFor="replica-count">replicas (Web Workers; this browser reports {cores} cores)</label>
        <div className="field-input">
          <input id="replica-count" type="number" min={1} max={64} step={1} value={replicas}
            onChange={(e) => appStore.getState().setReplicas(Number(e.target.value))} />
        </div>
      </div>
      <button type="button" className="primary" disabled={reason !== null} onClick={() => void startRun(appStore)}>Run the case</button>
      {reason && <p className="hint" data-testid="run-disabled-reason">Run is disabled: {reason}.</p>}
    </section>
  );
}
