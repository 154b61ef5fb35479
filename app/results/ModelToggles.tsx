/** One checkbox per continuum model overlaid on a profile: which predictions are drawn (and exported with the cut). */
export function ModelToggles({
  models,
  hidden,
  onToggle,
}: {
  models: readonly string[];
  hidden: ReadonlySet<string>;
  onToggle: (model: string, shown: boolean) => void;
}) {
  if (models.length === 0) return null;
  return (
    <fieldset className="model-toggles" data-testid="continuum-toggles">
      <legend>continuum predictions shown</legend>
      {models.map((m) => (
        <label key={m} className="field-inline">
          <input type="checkbox" checked={!hidden.has(m)} onChange={(e) => onToggle(m, e.target.checked)} />
          {m}
        </label>
      ))}
    </fieldset>
  );
}
