/**
 * One preset parameter: a number with a unit selector, a whole number, or a choice; its message shown beneath. The
 * label is in words ("Upstream pressure"), the case-file name beside it in small type for people who edit the JSON.
 */
import type { PresetParameter } from '../../engine/case/presets';
import { setupApi } from '../bridge/loadEngine';
import { unitChoices } from '../setup/formModel';
import { appStore, useApp } from '../store/appStore';

function allowedText(p: PresetParameter): string {
  if (p.kind === 'count') return p.default === null ? 'whole number; empty = automatic' : 'whole number';
  if (p.min === undefined) return '';
  return p.exclusiveMin ? `greater than ${p.min}` : `at least ${p.min}`;
}

/**
 * True when a message already says what is allowed ("must be between 0 and 1"), so the field's own hint is not added:
 * a hint from the parameter's lower bound alone ("at least 0") would contradict a message that names both bounds.
 */
function statesWhatIsAllowed(message: string): boolean {
  return /\b(must be|between|at least|at most|greater than|less than|one of)\b/.test(message);
}

export function ParameterField({ p }: { p: PresetParameter }) {
  const entry = useApp((s) => s.params[p.name]);
  const error = useApp((s) => s.derived?.fieldErrors[`param:${p.name}`]);
  const st = appStore.getState();
  const id = `param-${p.name}`;
  const units = unitChoices(p.kind, setupApi());
  const hint = allowedText(p);
  return (
    <div className={`field${error ? ' field-invalid' : ''}`}>
      <label htmlFor={id} title={p.description}>
        {p.label ?? p.name}
        {p.label && <code className="field-key">{p.name}</code>}
        <span className="field-description">{p.description}</span>
      </label>
      <div className="field-input">
        {p.kind === 'choice' ? (
          <select id={id} value={entry?.text ?? ''} onChange={(e) => st.setParamText(p.name, e.target.value)}>
            {(p.choices ?? []).map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </select>
        ) : (
          <input
            id={id}
            inputMode="decimal"
            value={entry?.text ?? ''}
            placeholder={p.default === null ? 'auto' : ''}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-error` : undefined}
            onChange={(e) => st.setParamText(p.name, e.target.value)}
          />
        )}
        {units.length > 0 && (
          <select
            aria-label={`${p.name} unit`}
            value={entry?.unit ?? ''}
            onChange={(e) => st.setParamUnit(p.name, e.target.value)}
          >
            {units.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        )}
        {units.length === 0 && p.kind !== 'choice' && (
          <span className="unit-fixed">{p.kind === 'count' ? '' : '1'}</span>
        )}
      </div>
      {error && (
        <p className="field-error" id={`${id}-error`} role="alert">
          {error}
          {hint && !statesWhatIsAllowed(error) ? ` (allowed: ${hint})` : ''}
        </p>
      )}
    </div>
  );
}
