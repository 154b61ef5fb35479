/** The sweep's points as numbers: swept value, status, Kn, the quantity with its 95 % half-width, each model's value. */
import { estimateText, sig } from '../format';
import type { SweepPointValue } from './sweepSeries';

export interface SweepTableProps {
  readonly points: readonly SweepPointValue[];
  readonly quantityLabel: string;
  readonly unit: string;
  readonly xHeader: string;
  readonly xOf: (valueSI: number) => number;
  readonly failures: Readonly<Record<number, string>>;
}

export function SweepTable({ points, quantityLabel, unit, xHeader, xOf, failures }: SweepTableProps) {
  const models = [...new Set(points.flatMap((p) => Object.keys(p.predictions)))];
  return (
    // Scrolls sideways rather than widen the column: one column per continuum model.
    <div style={{ overflowX: 'auto', maxWidth: '100%' }}>
      <table className="grid" data-testid="sweep-values">
        <thead>
          <tr>
            <th>point</th>
            <th>{xHeader}</th>
            <th>status</th>
            <th>reference Kn [1]</th>
            <th>
              {quantityLabel} [{unit}] ± 95 %
            </th>
            {models.map((m) => (
              <th key={m}>
                {m} [{unit}]
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {points.map((p) => (
            <tr key={p.point} data-testid={`sweep-point-${p.point}`} data-status={p.status}>
              <td>{p.point}</td>
              <td data-value={String(p.value)}>{sig(xOf(p.value), 6)}</td>
              <td title={failures[p.point]}>
                {p.status}
                {failures[p.point] ? `: ${failures[p.point]}` : ''}
              </td>
              <td>{sig(p.knudsen, 4)}</td>
              <td data-mean={String(p.mean)} data-ci95={String(p.ci95)}>
                {estimateText(p.mean, p.ci95)}
              </td>
              {models.map((m) => (
                <td key={m} data-model={m} data-value={String(p.predictions[m] ?? NaN)}>
                  {sig(p.predictions[m] ?? NaN, 4)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
