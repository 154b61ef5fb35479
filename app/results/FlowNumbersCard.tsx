/**
 * The flow numbers of a case with flow sections (flowNumbers.ts), mean ± 95 % half-width with their units, and what
 * they refer to; nothing is shown, and nothing is made up, for a result without them.
 */
import type { FlowNumbers } from './flowNumbers';
import { estimateText } from '../format';

export function FlowNumbersCard({ flow }: { flow: FlowNumbers }) {
  if (!flow.rows.length) return null;
  return (
    <section className="panel" aria-labelledby="flow-title" data-testid="flow-numbers">
      <h2 id="flow-title">Flow numbers (mean ± 95 % half-width)</h2>
      {flow.context && <p className="hint">{flow.context}</p>}
      <table className="kv">
        <tbody>
          {flow.rows.map((f) => (
            <tr key={f.name}>
              <th scope="row">
                {f.label}
                {f.unit ? ` [${f.unit}]` : ''}
              </th>
              <td>{estimateText(f.mean, f.ci95)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
