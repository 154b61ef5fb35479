/**
 * Flow numbers and the model verdict, shown when the engine's result carries `flow` or `verdict`
 * (results/extensions.ts); nothing is shown, and nothing is made up, while it does not.
 */
import type { ResultExtensions } from './extensions';
import type { ComparisonView } from './comparisonView';
import { estimateText, sig } from '../format';

export function FlowNumbersCard({ ext }: { ext: ResultExtensions }) {
  if (!ext.flow.length) return null;
  return (
    <section className="panel" aria-labelledby="flow-title" data-testid="flow-numbers">
      <h2 id="flow-title">Flow numbers (mean ± 95 % half-width)</h2>
      {ext.flowContext && <p className="hint">{ext.flowContext}</p>}
      <table className="kv">
        <tbody>
          {ext.flow.map((f) => (
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

export function VerdictCard({ ext }: { ext: ResultExtensions }) {
  if (!ext.verdict) return null;
  return (
    <section className="panel" aria-labelledby="verdict-title" data-testid="verdict">
      <h2 id="verdict-title">Which model is good enough</h2>
      <p>{ext.verdict.text}</p>
      {ext.verdict.reasons.length > 0 && (
        <ul>
          {ext.verdict.reasons.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** The continuum comparison's verdicts: which cheaper model is good enough, with the numbers behind each. */
export function ComparisonCard({ view }: { view: ComparisonView | null }) {
  if (!view) return null;
  return (
    <section className="panel" aria-labelledby="comparison-title" data-testid="comparison">
      <h2 id="comparison-title">Continuum models beside DSMC</h2>
      <p className="hint">{view.description}</p>
      {view.verdicts.length > 0 && (
        <table className="grid">
          <thead>
            <tr>
              <th>quantity</th>
              <th>model values</th>
              <th>verdict</th>
            </tr>
          </thead>
          <tbody>
            {view.verdicts.map((v) => (
              <tr
                key={v.quantity}
                className={v.category === 'withinError' || v.category === 'adequate' ? 'pass' : 'warn'}
              >
                <td>
                  {v.quantity}
                  {v.unit && v.unit !== '1' ? ` [${v.unit}]` : ''}
                </td>
                <td>{v.values.map((x) => `${x.label} ${sig(x.value, 4)}`).join('; ') || 'profile (see plot)'}</td>
                <td>{v.text}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
