import { planFromInput, type Plan } from '../../engine/case/plan';
import { createSimulation, advance, type Simulation } from '../../engine/simulation';

/** Parses and plans a case a test built itself; any refusal is a bug in the test, so it throws. */
export function planOrThrow(input: unknown): Plan {
  const r = planFromInput(input);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.plan;
}

/** Plans a case and runs its transient and sampling steps. */
export function runToEnd(input: unknown): Simulation {
  const plan = planOrThrow(input);
  const sim = createSimulation(plan);
  advance(sim, plan.transientSteps + plan.sampleSteps);
  return sim;
}
