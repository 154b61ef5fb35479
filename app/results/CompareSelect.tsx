/** Overlay a saved run on the plots of the shown one. */
import { compareWithSavedRun } from '../saved/savedRuns';
import { appStore, useApp } from '../store/appStore';

export function CompareSelect() {
  const runs = useApp((s) => s.savedRuns);
  const shown = useApp((s) => s.resultId);
  const compareId = useApp((s) => s.compareId);
  const others = runs.filter((r) => r.id !== shown);
  if (!others.length) return null;
  return (
    <span className="field-inline">
      <label htmlFor="compare-select">overlay a saved run</label>
      <select
        id="compare-select"
        value={compareId ?? ''}
        onChange={(e) => void compareWithSavedRun(appStore, e.target.value || null)}
      >
        <option value="">(none)</option>
        {others.map((r) => (
          <option key={r.id} value={r.id}>
            {r.name}
          </option>
        ))}
      </select>
    </span>
  );
}
