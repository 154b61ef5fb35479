/**
 * The continuum comparison beside the DSMC result (comparisonView.ts): what was compared, and per quantity the
 * models' values and which cheaper model is good enough; nothing when the run API found no comparison.
 */
import type { ComparisonView } from './comparisonView';
import { sig } from '../format';

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
