/**
 * Every file `tenuis run` writes for a result, by name, as text: the one place that decides which files a run has,
 * shared by the command line (written to disk) and the browser (offered as downloads).
 */
import type { Plan } from '../plan/plan';
import type { SimulationResult } from '../results/summarize';
import { continuumComparisonOf } from './comparison';
import { flowCsv } from './flowCsv';
import { fieldsCsv, profilesCsv, surfacesCsv } from './resultCsv';
import { summaryJsonText, type SummaryExtra } from './summaryJson';
import { verdictCsv } from './verdictCsv';

/**
 * The result files of a run by file name, in the order they are written: summary.json, profiles.csv, fields.csv,
 * surfaces.csv, flow.csv with flow numbers, and verdict.csv when a continuum comparison applies. Given the run's plan
 * (or a comparison already made), summary.json and profiles.csv carry the continuum comparison.
 */
export function resultFiles(result: SimulationResult, extra: SummaryExtra & { plan?: Plan }): Record<string, string> {
  const comparison = extra.comparison ?? (extra.plan ? continuumComparisonOf(extra.plan, result) : undefined);
  const summaryExtra = {
    performance: extra.performance,
    caseName: extra.caseName,
    ...(comparison ? { comparison } : {}),
  };
  return {
    'summary.json': summaryJsonText(result, summaryExtra),
    'profiles.csv': profilesCsv(result, comparison),
    'fields.csv': fieldsCsv(result),
    'surfaces.csv': surfacesCsv(result),
    ...(result.flow ? { 'flow.csv': flowCsv(result.flow, result.flow.perDepth ?? !result.axisymmetric) } : {}),
    ...(comparison?.recognised ? { 'verdict.csv': verdictCsv(comparison) } : {}),
  };
}
