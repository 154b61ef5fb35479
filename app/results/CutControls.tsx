/**
 * Chooses the cut a profile is read along: the row average, or one column or row of cells at a snapped position; a
 * newly chosen kind starts where the case suggests (mid-duct, the axis), not at a middle row that may lie in a wall.
 */
import { useEffect, useState } from 'react';
import type { CutKind, CutSpec } from './profileCut';
import { nearestCentre } from './profileCut';
import { sig } from '../format';

export interface CutControlsProps {
  readonly spec: CutSpec;
  /** Centres of the columns (x) and rows (y) of the grid, m. */
  readonly columnsM: ArrayLike<number>;
  readonly rowsM: ArrayLike<number>;
  readonly lengthUnit: { readonly unit: string; readonly factor: number };
  /** 'r' in an axisymmetric domain. */
  readonly radial: string;
  readonly onChange: (spec: CutSpec) => void;
  /** Where a newly chosen kind of cut starts (profileCut.ts defaultCutIndex): the axis, mid-duct … */
  readonly startOf: (kind: CutKind) => number;
}

export function CutControls({ spec, columnsM, rowsM, lengthUnit, radial, onChange, startOf }: CutControlsProps) {
  const centres = spec.kind === 'vertical' ? columnsM : rowsM;
  const coordinate = spec.kind === 'vertical' ? 'x' : radial;
  const at = centres[spec.index] ?? NaN;
  const shown = (m: number) => sig(m / lengthUnit.factor, 6);
  // The typed text is kept until the field is left, so typing "12" does not snap at "1" first.
  const [text, setText] = useState(shown(at));
  useEffect(() => setText(shown(at)), [at, lengthUnit.factor]);
  const kindChange = (kind: CutKind) => onChange({ kind, index: startOf(kind) });
  const typed = (value: string) => {
    setText(value);
    const v = Number(value);
    if (value.trim() !== '' && Number.isFinite(v))
      onChange({ kind: spec.kind, index: nearestCentre(centres, v * lengthUnit.factor) });
  };
  const step = centres.length > 1 ? (centres[1] - centres[0]) / lengthUnit.factor : undefined;
  return (
    <>
      <span className="field-inline">
        <label htmlFor="profile-cut">cut</label>
        <select id="profile-cut" value={spec.kind} onChange={(e) => kindChange(e.target.value as CutKind)}>
          <option value="average">average over x (row averages), along {radial}</option>
          <option value="vertical">across {radial} at one x (vertical cut)</option>
          <option value="horizontal">along x at one {radial} (horizontal cut)</option>
        </select>
      </span>
      {spec.kind !== 'average' && (
        <span className="field-inline">
          <label htmlFor="profile-cut-position">
            {coordinate} [{lengthUnit.unit}]
          </label>
          <input
            id="profile-cut-position"
            type="number"
            inputMode="decimal"
            step={step}
            value={text}
            onChange={(e) => typed(e.target.value)}
            onBlur={() => setText(shown(at))}
          />
          <input
            type="range"
            aria-label={`cut position (${spec.kind === 'vertical' ? 'column' : 'row'} of cells)`}
            min={0}
            max={centres.length - 1}
            step={1}
            value={spec.index}
            onChange={(e) => onChange({ kind: spec.kind, index: Number(e.target.value) })}
          />
          <span className="hint" data-testid="cut-position">
            {coordinate} = {shown(at)} {lengthUnit.unit}: centre of {spec.kind === 'vertical' ? 'column' : 'row'}{' '}
            {spec.index + 1} of {centres.length}
          </span>
        </span>
      )}
    </>
  );
}
