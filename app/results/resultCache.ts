/**
 * Results live here, outside the reactive store: typed arrays of profiles and fields are too big to diff or freeze.
 * The store holds the id of the result shown and a version number that changes when the entry does.
 */
import type { SimulationResult } from '../../engine/results/summarize';
import type { Performance } from '../../engine/report/summaryJson';
import type { CaseInput } from '../../engine/case/schema';
import type { ContinuumComparisonResult } from '../../engine/report/comparison';

export interface CachedResult {
  readonly result: SimulationResult;
  readonly caseInput: CaseInput;
  readonly caseName: string;
  /** Absent while live. */
  readonly performance?: Performance;
  /** Continuum predictions and verdicts; absent while live. */
  readonly comparison?: ContinuumComparisonResult;
  /** Merged samples as a sample file; absent while live. */
  readonly samples?: ArrayBuffer;
}

const cache = new Map<string, CachedResult>();

export function putResult(id: string, entry: CachedResult): void {
  cache.set(id, entry);
}

export function getResult(id: string | null): CachedResult | undefined {
  return id === null ? undefined : cache.get(id);
}

export function dropResult(id: string): void {
  cache.delete(id);
}
