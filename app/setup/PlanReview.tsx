/** Before the run: reference state, the advisor's ratios with a pass/warn mark, size, expected error and time. */
import type { PlanView } from '../bridge/types';
import { bytesText, countText, durationText, lengthUnitFor, sig } from '../format';
import { useApp } from '../store/appStore';

function ReferenceTable({ v }: { v: PlanView }) {
  const r = v.reference;
  const len = lengthUnitFor(r.lengthScaleM);
  const rows: [string, string][] = [
    [
      'pressure',
      `${sig(r.pressurePa)} Pa = ${sig(r.pressurePa / 100)} mbar = ${sig(r.pressurePa / (101325 / 760))} Torr`,
    ],
    ['temperature', `${sig(r.temperatureK)} K`],
    ['number density', `${sig(r.numberDensityPerM3)} 1/m³`],
    ['viscosity', `${sig(r.viscosityPaS)} Pa·s`],
    ['most probable speed v0', `${sig(r.mostProbableSpeedMPerS)} m/s`],
    ['mean free path λ (viscosity-based)', `${sig(r.meanFreePathM / len.factor)} ${len.unit}`],
    ['length scale L', `${sig(r.lengthScaleM / len.factor)} ${len.unit}`],
    ['Knudsen number Kn = λ/L', sig(r.knudsen)],
    ['rarefaction parameter δ', sig(r.rarefaction)],
    // The flow's speed: the fastest wall's, or the estimated mean speed of a driven flow (planView.ts says which).
    ['flow speed', `${sig(v.flowSpeedMPerS, 3)} m/s — ${v.flowSpeedSource}`],
    ['Mach number (flow speed)', sig(v.machNumber, 3)],
    ['Reynolds number (flow speed, L)', sig(v.reynoldsNumber, 3)],
  ];
  return (
    <table className="kv" aria-label="reference state">
      <tbody>
        {rows.map(([k, val]) => (
          <tr key={k}>
            <th scope="row">{k}</th>
            <td>{val}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function AdvisorTable({ v }: { v: PlanView }) {
  return (
    <table className="grid" aria-label="numerics advisor">
      <thead>
        <tr>
          <th>ratio</th>
          <th>value [1]</th>
          <th>advised</th>
          <th>mark</th>
        </tr>
      </thead>
      <tbody>
        {v.advisor.map((a) => (
          <tr key={a.label} className={a.pass ? 'pass' : 'warn'}>
            <td>{a.label}</td>
            <td>{sig(a.value, 3)}</td>
            <td>
              {a.bound === 'max' ? '≤' : '≥'} {sig(a.limit, 3)}
            </td>
            <td>{a.pass ? '✓ pass' : '⚠ warn'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function PlanReview() {
  const v = useApp((s) => s.plan);
  const speed = useApp((s) => s.speed);
  const replicas = useApp((s) => s.replicas);
  const errors = useApp((s) => s.planErrors);
  const pending = useApp((s) => s.planPending);
  const planning = pending && (
    <p className="hint" role="status" data-testid="plan-pending">
      Planning the changed case…
    </p>
  );
  if (!v && pending) {
    return (
      <section className="panel" aria-labelledby="review-title">
        <h2 id="review-title">Check before running</h2>
        {planning}
      </section>
    );
  }
  if (!v) {
    return (
      <section className="panel" aria-labelledby="review-title">
        <h2 id="review-title">Check before running</h2>
        <p>The case has problems; they are marked at the fields{errors.length ? ' and listed here' : ''}.</p>
        {errors.length > 0 && (
          <ul className="errors">
            {errors.map((e) => (
              <li key={e}>{e}</li>
            ))}
          </ul>
        )}
      </section>
    );
  }
  const e = v.expected;
  return (
    <section className="panel" aria-labelledby="review-title" data-testid="plan-review">
      <h2 id="review-title">Check before running</h2>
      {planning}
      <h3>Reference state</h3>
      <ReferenceTable v={v} />
      <h3>Numerics advisor</h3>
      <AdvisorTable v={v} />
      <h3>Size, error and time</h3>
      <table className="kv" aria-label="run estimates">
        <tbody>
          <tr>
            <th scope="row">cells</th>
            <td>
              {v.cellsX} × {v.cellsY}
            </td>
          </tr>
          <tr>
            <th scope="row">particles per replica</th>
            <td data-testid="particle-count">{countText(v.particles)}</td>
          </tr>
          <tr>
            <th scope="row">memory per replica</th>
            <td>{bytesText(v.memoryBytes)}</td>
          </tr>
          <tr>
            <th scope="row">time step</th>
            <td>{sig(v.timeStepS)} s</td>
          </tr>
          <tr>
            <th scope="row">transient</th>
            <td>
              {countText(v.transientSteps)} steps{' '}
              {v.transientMode === 'auto' ? '(estimate; the run detects its end)' : '(fixed)'}
            </td>
          </tr>
          <tr>
            <th scope="row">sampled steps per replica</th>
            <td>
              {countText(v.sampleSteps)}
              {v.sizingApplied ? ' (sized for the headline quantity, see Run sizing)' : ''}
            </td>
          </tr>
          <tr>
            <th scope="row">expected error of one cell, {replicas} replicas</th>
            <td data-testid="expected-error">
              density ±{sig(100 * 1.96 * e.densityRelative, 2)} %, temperature ±
              {sig(100 * 1.96 * e.temperatureRelative, 2)} %, velocity ±{sig(1.96 * e.velocityStandardErrorMPerS, 2)}{' '}
              m/s (95 %)
            </td>
          </tr>
          <tr>
            <th scope="row">estimated run time</th>
            <td data-testid="time-estimate">
              {durationText(v.estimatedSeconds)} at {sig(speed.particleStepsPerSecond / 1e6, 3)} million
              particle-steps/s per worker (
              {speed.measured ? 'measured in this browser' : 'assumed until a run is measured'})
            </td>
          </tr>
        </tbody>
      </table>
      <h3>Run sizing</h3>
      <ul className="hint" aria-label="run sizing" data-testid="run-sizing">
        {v.sizing.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      {v.warnings.length > 0 && (
        <ul className="warnings" aria-label="advisor warnings">
          {v.warnings.map((w) => (
            <li key={w}>⚠ {w}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
