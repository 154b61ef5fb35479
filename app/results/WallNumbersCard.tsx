/** Whole-wall numbers with 95 % half-widths and units: shear stress, normal stress, heat flux, number flux. */
import type { SimulationResult } from '../../engine/results/summarize';
import type { IntegralEstimate } from '../../engine/stats/estimate';
import { estimateText, sig } from '../format';

const LABELS: Readonly<Record<string, string>> = {
  shearStress: 'shear stress',
  normalStress: 'normal stress',
  heatFlux: 'heat flux',
  numberFlux: 'number flux',
};

export function WallNumbersCard({ result }: { result: SimulationResult }) {
  const walls = Object.entries(result.walls).filter(
    (w): w is [string, Record<string, IntegralEstimate>] => w[1] !== undefined,
  );
  if (!walls.length) return null;
  const unitOf = (q: string): string => {
    for (const bins of Object.values(result.wallBins)) {
      const k = bins?.table.names.indexOf(q) ?? -1;
      if (bins && k >= 0) return bins.table.units[k];
    }
    return '';
  };
  const quantities = Object.keys(walls[0][1]);
  return (
    <section className="panel" aria-labelledby="wall-numbers-title" data-testid="wall-numbers">
      <h2 id="wall-numbers-title">Wall numbers (mean ± 95 % half-width)</h2>
      <table className="grid">
        <thead>
          <tr>
            <th>wall</th>
            {quantities.map((q) => (
              <th key={q}>
                {LABELS[q] ?? q} [{unitOf(q)}]
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {walls.map(([side, e]) => (
            <tr key={side}>
              <th scope="row">{side}</th>
              {quantities.map((q) => {
                const x = e[q];
                return (
                  <td
                    key={q}
                    data-testid={`wall-${side}-${q}`}
                    data-mean={String(x.mean)}
                    data-ci95={String(x.ci95)}
                    title={`effective samples ${sig(x.effectiveSamples, 3)}, correlation time ${sig(x.correlationTimeSteps, 3)} steps`}
                  >
                    {estimateText(x.mean, x.ci95)}
                    {x.plateauFound ? '' : ' (half-width a lower bound)'}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="hint">
        Signs: shear stress is the force per area of the gas on the wall along +x (bottom, top walls); heat flux is from
        the gas into the wall.
      </p>
    </section>
  );
}
