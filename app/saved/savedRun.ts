/**
 * What a saved run holds, decided in one typed table: everything needed to show it again with the same numbers
 * (the case and the merged samples as a sample file, from which the summary is recomputed) and what the list shows.
 */
import type { CaseInput } from '../../engine/case/schema';
import type { Performance } from '../../engine/report/summaryJson';
import type { ReplicaEnd } from '../bridge/types';

export interface SavedRunMeta {
  readonly id: string;
  readonly name: string;
  /** ISO 8601 time the run ended. */
  readonly finishedAt: string;
  readonly caseName: string;
  readonly status: 'finished' | 'stopped';
  readonly replicas: number;
  readonly lostReplicas: number;
  readonly sampledSteps: number;
  readonly knudsen: number;
}

export interface SavedRunRecord extends SavedRunMeta {
  readonly caseInput: CaseInput;
  /** The merged samples in the sample-file format (engine/io/sampleFile.ts). */
  readonly samples: ArrayBuffer;
  readonly runWarnings: readonly string[];
  readonly performance: Performance;
  readonly replicaEnds: readonly ReplicaEnd[];
}

/** Keys of the record that the list shows; typed over SavedRunMeta so a new field must be placed here. */
const META_KEYS: { readonly [K in keyof SavedRunMeta]: true } = {
  id: true,
  name: true,
  finishedAt: true,
  caseName: true,
  status: true,
  replicas: true,
  lostReplicas: true,
  sampledSteps: true,
  knudsen: true,
};

export function metaOf(r: SavedRunRecord): SavedRunMeta {
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(META_KEYS)) out[k] = (r as unknown as Record<string, unknown>)[k];
  return out as unknown as SavedRunMeta;
}
