/**
 * "Stop when decided": a run may end as soon as the verdict on its headline quantity (headline.ts) has no undecided
 * model — every applicable continuum model is adequate or not adequate. Judged on a live summary by the run pipeline
 * (workers/runCase.ts StoppingRules.decided), the same for `tenuis run --target decide` and the page's run panel.
 */
import type { Plan } from '../plan/plan';
import type { SimulationResult } from '../results/summarize';
import { continuumComparisonOf } from './comparison';
import { verdictHeadline } from './headline';

/** The reason to stop (`decided: <headline sentence>`), or null while a model is still undecided or there is none. */
export function headlineDecision(plan: Plan, result: SimulationResult): string | null {
  const c = continuumComparisonOf(plan, result);
  if (!c.recognised) return null;
  const v = c.verdict[c.predictions.headline];
  if (!v || v.status === 'noData' || v.models.some((m) => m.status === 'undecided')) return null;
  return `decided: ${verdictHeadline(c).text}`;
}
