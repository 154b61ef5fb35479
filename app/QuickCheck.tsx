import { useState } from 'react';
import type { QuickCheckResult } from './demo/quickCheck';

type State = { kind: 'idle' } | { kind: 'running'; fraction: number } | { kind: 'done'; result: QuickCheckResult } | { kind: 'failed'; message: string };

/** Runs the engine's quick check in Web Workers and shows the merged wall shear stress with its 95 % half-width. */
export function QuickCheck() {
  const [state, setState] = useState<State>({ kind: 'idle' });
  const start = async () => {
    setState({ kind: 'running', fraction: 0 });
    // A progress message can arrive after the result (it crosses the thread boundary on its own): ignore it then.
    let finished = false;
    try {
      const { runQuickCheck } = await import('./demo/quickCheck');
      const result = await runQuickCheck((fraction) => {
        if (!finished) setState({ kind: 'running', fraction });
      });
      finished = true;
      setState({ kind: 'done', result });
    } catch (e) {
      finished = true;
      setState({ kind: 'failed', message: (e as Error).message });
    }
  };
  return (
    <section aria-labelledby="quick-check-title">
      <h2 id="quick-check-title">Engine check in this browser</h2>
      <p>Runs a small Couette flow (argon, Kn = 0.5) as independent replicas in Web Workers, one per core (up to 4), and merges them.</p>
      <button type="button" onClick={start} disabled={state.kind === 'running'}>
        Run the check
      </button>
      {state.kind === 'running' && (
        <p>
          <progress value={state.fraction} max={1} aria-label="check progress" /> {(100 * state.fraction).toFixed(0)} %
        </p>
      )}
      {state.kind === 'done' && (
        <p data-testid="quick-check-result">
          Wall shear stress on the bottom wall: {state.result.shearStressPa.mean.toFixed(3)} ± {state.result.shearStressPa.ci95.toFixed(3)} Pa (95 %), from{' '}
          {state.result.completed} of {state.result.replicas} replicas in {state.result.seconds.toFixed(1)} s (
          {(state.result.particleStepsPerSecond / 1e6).toFixed(1)} million particle-steps/s).
        </p>
      )}
      {state.kind === 'failed' && <p role="alert">The check failed: {state.message}</p>}
    </section>
  );
}
