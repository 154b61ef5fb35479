/** A labelled selector of one quantity of a result table (names with their units). */
export function QuantitySelect({
  id,
  label,
  names,
  units,
  value,
  onChange,
}: {
  id: string;
  label: string;
  names: readonly string[];
  units: readonly string[];
  value: string;
  onChange: (name: string) => void;
}) {
  return (
    <span className="field-inline">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={names.includes(value) ? value : names[0]} onChange={(e) => onChange(e.target.value)}>
        {names.map((n, k) => (
          <option key={n} value={n}>
            {n} [{units[k]}]
          </option>
        ))}
      </select>
    </span>
  );
}
