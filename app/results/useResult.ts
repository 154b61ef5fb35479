/** Hooks that read the shown and the compared result from the cache, re-rendering when their version changes. */
import { useApp } from '../store/appStore';
import { getResult, type CachedResult } from './resultCache';

export function useShownResult(): {
  entry: CachedResult | undefined;
  live: boolean;
  version: number;
  id: string | null;
} {
  const id = useApp((s) => s.resultId);
  const version = useApp((s) => s.resultVersion);
  const live = useApp((s) => s.resultIsLive);
  return { entry: getResult(id), live, version, id };
}

export function useComparedResult(): { entry: CachedResult | undefined; name: string } {
  const id = useApp((s) => s.compareId);
  const runs = useApp((s) => s.savedRuns);
  return { entry: getResult(id), name: runs.find((r) => r.id === id)?.name ?? '' };
}
