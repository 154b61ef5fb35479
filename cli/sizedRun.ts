/**
 * The run sizing on the command line (engine/sizing/runSizing.ts): `tenuis check` shows it, `tenuis run` applies
 * it when the case leaves sampling.sampleSteps unset and no --target, --max-steps or --max-seconds is given.
 */
import { totalmem } from 'node:os';
import type { Case } from '../engine/case/schema';
import type { Plan } from '../engine/plan/plan';
import { DEFAULT_CAP_SECONDS, sizedPlanOf, type NotSized, type RunSizing } from '../engine/sizing/runSizing';
import { CliError, type UsageError } from './errors';

export interface SizedRun {
  readonly caseData: Case;
  readonly plan: Plan;
  readonly sizing: RunSizing | NotSized;
}

/** --time-cap S: the sizing's wall-clock cap, seconds (default 300). */
export function parseTimeCap(text: string | undefined, usage: (m: string) => UsageError): number {
  if (text === undefined) return DEFAULT_CAP_SECONDS;
  const v = Number(text);
  if (!Number.isFinite(v) || v <= 0) throw usage(`--time-cap ${text}: give the cap in seconds, a number above 0`);
  return v;
}

/** --tolerance T: the verdict's tolerance, a fraction (0.05) or a percentage (5%), above 0 and at most 100 %. */
export function parseTolerance(text: string, usage: (m: string) => UsageError): number {
  const percent = text.trim().endsWith('%');
  const v = Number((percent ? text.trim().slice(0, -1) : text).trim());
  const value = percent ? v / 100 : v;
  if (!(Number.isFinite(value) && value > 0 && value <= 1))
    throw usage(
      `--tolerance ${text}: give the relative deviation a model may have, e.g. 0.05 or 5% (above 0, at most 100 %)`,
    );
  return value;
}

/** The case and its plan with the verdict tolerance set (comparison.tolerance), so the case as run records it. */
export function withTolerance(
  loaded: { caseData: Case; plan: Plan },
  tolerance: number,
): { caseData: Case; plan: Plan } {
  const caseData = { ...loaded.caseData, comparison: { ...loaded.caseData.comparison, tolerance } };
  return { caseData, plan: { ...loaded.plan, caseData } };
}

/** The case sized for its headline (applied when `apply` and the case leaves its sampling open). */
export function sizedRunOf(
  caseData: Case,
  plan: Plan,
  options: { readonly replicas: number; readonly capSeconds: number; readonly apply: boolean },
): SizedRun {
  const sized = sizedPlanOf(
    plan,
    {
      replicas: options.replicas,
      capSeconds: options.capSeconds,
      keepSamplingBecause: options.apply
        ? undefined
        : 'the run sets its own budget (--target, --max-steps or --max-seconds)',
    },
    { memoryBudgetBytes: 0.8 * totalmem() },
  );
  if (!sized.sizing.sized && sized.sizing.reason.startsWith('the sized case cannot run'))
    throw new CliError(sized.sizing.reason);
  return sized.plan === plan ? { caseData, plan, sizing: sized.sizing } : { caseData: sized.plan.caseData, ...sized };
}
