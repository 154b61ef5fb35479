/** A number with a unit selector (or a fixed unit), its label naming the unit, and its message beneath. */
import type { ReactNode } from 'react';

export interface QuantityFieldProps {
  readonly id: string;
  readonly label: ReactNode;
  readonly description?: string;
  readonly text: string;
  /** Unit of `text`; one choice shows as a fixed unit. */
  readonly unit: string;
  readonly units: readonly string[];
  readonly placeholder?: string;
  readonly error?: string;
  onText(text: string): void;
  onUnit(unit: string): void;
}

export function QuantityField(p: QuantityFieldProps) {
  return (
    <div className={`field${p.error ? ' field-invalid' : ''}`}>
      <label htmlFor={p.id}>
        {p.label} [{p.unit || '1'}]{p.description && <span className="field-description">{p.description}</span>}
      </label>
      <div className="field-input">
        <input
          id={p.id}
          inputMode="decimal"
          value={p.text}
          placeholder={p.placeholder}
          aria-invalid={p.error ? true : undefined}
          aria-describedby={p.error ? `${p.id}-error` : undefined}
          onChange={(e) => p.onText(e.target.value)}
        />
        {p.units.length > 1 ? (
          <select aria-label={`${p.id} unit`} value={p.unit} onChange={(e) => p.onUnit(e.target.value)}>
            {p.units.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        ) : (
          <span className="unit-fixed">{p.unit || '1'}</span>
        )}
      </div>
      {p.error && (
        <p className="field-error" id={`${p.id}-error`} role="alert">
          {p.error}
        </p>
      )}
    </div>
  );
}
