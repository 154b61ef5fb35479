/**
 * "Which model is good enough", first on the results page (comparisonView.ts): the one-sentence answer for the case's
 * headline quantity, then per quantity the status in words and colour — adequate (green), not adequate (red),
 * undecided (amber: never shown as a pass), not applicable here (grey) — each model's status and the verdict's text.
 * Colours are the page's own variables, set inline so the card needs no stylesheet of its own; the status is also in
 * words and in data-status, so no one has to read colour.
 */
import type { ComparisonView, VerdictStatus } from './comparisonView';
import { STATUS_WORDS } from './comparisonView';
import { sig } from '../format';

const STATUS_COLOURS: Readonly<Record<string, string>> = {
  adequate: 'var(--good)',
  notAdequate: 'var(--bad)',
  undecided: 'var(--warn)',
  notApplicable: 'var(--muted)',
  noData: 'var(--muted)',
};

function Status({ status }: { status: VerdictStatus }) {
  return (
    <strong style={{ color: STATUS_COLOURS[status] ?? 'inherit' }} data-status={status}>
      {STATUS_WORDS[status] ?? status}
    </strong>
  );
}

export function ComparisonCard({ view }: { view: ComparisonView | null }) {
  if (!view) return null;
  return (
    <section className="panel" aria-labelledby="comparison-title" data-testid="comparison">
      <h2 id="comparison-title">Which model is good enough</h2>
      {view.headline && (
        <p data-testid="verdict-headline" data-status={view.headline.status}>
          <Status status={view.headline.status} />: {view.headline.text}
          {view.headline.time ? ` ${view.headline.time}` : ''}
        </p>
      )}
      <p className="hint">{view.description}</p>
      {view.verdicts.length > 0 && (
        <table className="grid">
          <thead>
            <tr>
              <th>quantity</th>
              <th>verdict</th>
              <th>models</th>
              <th>model values</th>
              <th>why</th>
            </tr>
          </thead>
          <tbody>
            {view.verdicts.map((v) => (
              <tr key={v.quantity} data-status={v.status}>
                <td>
                  {v.quantity}
                  {v.unit && v.unit !== '1' ? ` [${v.unit}]` : ''}
                </td>
                <td>
                  <Status status={v.status} />
                </td>
                <td>
                  {v.models.map((m, i) => (
                    <span key={m.label}>
                      {i > 0 ? '; ' : ''}
                      {m.label} <Status status={m.status} />
                    </span>
                  ))}
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
