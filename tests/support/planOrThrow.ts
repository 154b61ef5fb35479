import { planFromInput, type Plan } from '../../engine/plan/plan';
import { createSimulation, runToCompletion, type Simulation } from '../../engine/run/simulation';

/** Parses and plans a case a test built itself; any refusal is a bug in the test, so it throws. */
export function planOrThrow(input: unknown): Plan {
  const r = planFromInput(input);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.plan;
}

/** Plans a case and runs its transient (fixed, or until steady state is detected) and its sampling steps. */
export function runToEnd(input: unknown): Simulation {
  const sim = createSimulation(planOrThrow(input));
  runToCompletion(sim);
  return sim;
}
