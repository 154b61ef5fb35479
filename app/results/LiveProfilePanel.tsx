/** Live profile of the selected quantity while a run goes on (SVG; see charts/LiveProfileChart.tsx). */
import type { SimulationResult } from '../../engine/results/summarize';
import { LiveProfileChart } from '../charts/LiveProfileChart';
import { lengthUnitFor } from '../format';
import { appStore, useApp } from '../store/appStore';
import { QuantitySelect } from './QuantitySelect';

export function LiveProfilePanel({ result }: { result: SimulationResult }) {
  const chosen = useApp((s) => s.profileQuantity);
  const t = result.profile;
  const f = Math.max(0, t.names.indexOf(chosen));
  const w = t.names.length;
  const len = lengthUnitFor(result.reference.lengthScaleM);
  const rows = Array.from({ length: t.rows }, (_, r) => r);
  return (
    <section className="panel" aria-labelledby="live-profile-title">
      <h2 id="live-profile-title">
        Live profile along y ({result.numerics.sampleSteps.toLocaleString('en-US')} sampled steps so far)
      </h2>
      <QuantitySelect
        id="live-quantity"
        label="quantity"
        names={t.names}
        units={t.units}
        value={t.names[f]}
        onChange={(q) => appStore.getState().select({ profileQuantity: q })}
      />
      <LiveProfileChart
        x={rows.map((r) => result.profileY[r] / len.factor)}
        y={rows.map((r) => t.mean[r * w + f])}
        ci95={rows.map((r) => t.ci95[r * w + f])}
        xLabel={`y [${len.unit}]`}
        yLabel={`${t.names[f]} [${t.units[f]}] ± 95 %`}
      />
    </section>
  );
}
