/**
 * The quantities a precision target can name (`walls.top.shearStress`, `flow.massFlowRate`,
 * `flow.sections.outlet.massFlowRate`: the paths of summary.json), and reading such a path's estimate from a result.
 * Shared by `tenuis run --target` and the workbench's run panel, so both accept the same names. In results/, not
 * stats/: it knows the result's shape, while the stop rule (stats/stopping.ts) takes only the numbers read here, so
 * stats stays below results.
 */
import type { Plan } from '../plan/plan';
import { wallNamesOf } from '../kernel/sideTable';
import { WALL_QUANTITIES } from './wallQuantities';
import { FLOW_QUANTITIES, hasFlowResult } from './flowQuantities';
import type { Estimate } from '../stats/estimate';
import type { SimulationResult } from './summarize';

/** Every path a target may name for this plan: each wall's quantities, then the flow numbers and sections. */
export function targetPathsOf(plan: Plan): string[] {
  return [
    ...wallNamesOf(plan).flatMap((w) => WALL_QUANTITIES.map((q) => `walls.${w}.${q}`)),
    ...(hasFlowResult(plan) ? FLOW_QUANTITIES.map((q) => `flow.${q}`) : []),
    ...plan.caseData.flowSections.map((s) => `flow.sections.${s.name}.massFlowRate`),
  ];
}

/**
 * Reads a target path from a result: the estimate, or undefined. Names may hold dots (block faces such as
 * `plate.left`), so at each level the longest run of segments that is a key wins.
 */
export function estimateAt(result: SimulationResult, path: string): Estimate | undefined {
  const flow = result.flow
    ? {
        ...result.flow.values,
        sections: Object.fromEntries(Object.entries(result.flow.sections).map(([n, e]) => [n, { massFlowRate: e }])),
      }
    : undefined;
  let node: unknown = { walls: result.walls, flow };
  const parts = path.split('.');
  for (let at = 0; at < parts.length;) {
    if (node === null || typeof node !== 'object') return undefined;
    let end = parts.length;
    while (end > at && !Object.hasOwn(node, parts.slice(at, end).join('.'))) end--;
    if (end === at) return undefined;
    node = (node as Record<string, unknown>)[parts.slice(at, end).join('.')];
    at = end;
  }
  const e = node as { mean?: unknown; ci95?: unknown };
  return typeof e?.mean === 'number' && typeof e.ci95 === 'number' ? { mean: e.mean, ci95: e.ci95 } : undefined;
}
