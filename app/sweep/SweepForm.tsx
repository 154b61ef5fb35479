/**
 * What to sweep: Knudsen number or pressure (Pa, mbar, Torr), the range, the number of points and their spacing,
 * starting from the set-up's current valid case. A message under each field says what is allowed; the sweep
 * cannot start while anything is wrong.
 */
import { useApp } from '../store/appStore';
import { sig } from '../format';
import { setupApi } from '../bridge/loadEngine';
import { startSweep, SWEEP_BUSY } from './sweepActions';
import { readSweepForm, SWEEP_PRESSURE_UNITS } from './sweepForm';
import { sweepStore, useSweep } from './sweepStore';
import type { SweepParameter, SweepSpacing } from '../../engine/case/sweep';

function FieldError({ id, text }: { id: string; text: string | undefined }) {
  return text ? (
    <p className="field-error" id={id} role="alert">
      {text}
    </p>
  ) : null;
}

export function SweepForm() {
  const parameter = useSweep((s) => s.parameter);
  const fromText = useSweep((s) => s.fromText);
  const toText = useSweep((s) => s.toText);
  const pressureUnit = useSweep((s) => s.pressureUnit);
  const pointsText = useSweep((s) => s.pointsText);
  const spacing = useSweep((s) => s.spacing);
  const status = useSweep((s) => s.status);
  const error = useSweep((s) => s.error);
  const f = { parameter, fromText, toText, pressureUnit, pointsText, spacing, status, error, quantity: '' };
  const caseValid = useApp((s) => s.derived?.caseInput != null && s.plan !== null);
  const reference = useApp((s) => s.plan?.reference ?? null);
  const replicas = useApp((s) => s.replicas);
  // One thing at a time on the cores: a sweep waits for a single run to end.
  const singleRunBusy = useApp((s) => ['starting', 'running', 'paused', 'stopping'].includes(s.status));
  // Positivity and counts only here; the ends are converted to SI with the engine's units when the sweep starts.
  const read = readSweepForm(f, (v) => v);
  const errors = read.ok ? {} : read.errors;
  const busy = SWEEP_BUSY.includes(f.status);
  const reason = busy
    ? 'a sweep is going on'
    : singleRunBusy
      ? 'a single run is going on (see “2 Run”)'
      : !caseValid
        ? 'the set-up has problems: fix them in “1 Set up and check” first'
        : !read.ok
          ? 'fix the marked fields first'
          : null;
  const setForm = sweepStore.getState().setForm;
  const unit = f.parameter === 'knudsen' ? '1' : f.pressureUnit;
  const chooseParameter = (parameter: SweepParameter) => {
    if (parameter === f.parameter) return;
    // Start from a decade either side of the set-up's own value, in the unit shown.
    const own = reference
      ? parameter === 'knudsen'
        ? reference.knudsen
        : setupApi().convertFromSI(reference.pressurePa, f.pressureUnit)
      : NaN;
    setForm(Number.isFinite(own) ? { parameter, fromText: sig(own / 10, 3), toText: sig(own * 10, 3) } : { parameter });
  };
  const chooseUnit = (u: string) => {
    // Keep the same pressures when the unit changes.
    const api = setupApi();
    const convert = (text: string) =>
      Number(text) > 0 ? sig(api.convertFromSI(Number(text) / api.convertFromSI(1, f.pressureUnit), u), 6) : text;
    setForm({ pressureUnit: u, fromText: convert(f.fromText), toText: convert(f.toText) });
  };
  return (
    <section className="panel" aria-labelledby="sweep-form-title">
      <h2 id="sweep-form-title">Sweep</h2>
      <p className="hint">
        Runs the set-up's case at each point, changing only its pressures (Kn ∝ 1/p at fixed temperature and geometry),
        as <code>tenuis sweep</code> does.
        {reference ? ` The set-up is at Kn ${sig(reference.knudsen, 4)}, ${sig(reference.pressurePa, 4)} Pa.` : ''}
      </p>
      <div className="field">
        <label htmlFor="sweep-parameter">
          parameter<span className="field-description">what changes from point to point</span>
        </label>
        <div className="field-input">
          <select
            id="sweep-parameter"
            value={f.parameter}
            onChange={(e) => chooseParameter(e.target.value as SweepParameter)}
          >
            <option value="knudsen">Knudsen number</option>
            <option value="pressure">pressure</option>
          </select>
        </div>
      </div>
      {(['from', 'to'] as const).map((end) => (
        <div key={end} className={`field${errors[end] ? ' field-invalid' : ''}`}>
          <label htmlFor={`sweep-${end}`}>
            {end}
            <span className="field-description">{end === 'from' ? 'first' : 'last'} value of the range, above 0</span>
          </label>
          <div className="field-input">
            <input
              id={`sweep-${end}`}
              inputMode="decimal"
              value={end === 'from' ? f.fromText : f.toText}
              aria-invalid={errors[end] ? true : undefined}
              aria-describedby={errors[end] ? `sweep-${end}-error` : undefined}
              onChange={(e) => setForm(end === 'from' ? { fromText: e.target.value } : { toText: e.target.value })}
            />
            {f.parameter === 'pressure' ? (
              <select aria-label={`${end} unit`} value={f.pressureUnit} onChange={(e) => chooseUnit(e.target.value)}>
                {SWEEP_PRESSURE_UNITS.map((u) => (
                  <option key={u} value={u}>
                    {u}
                  </option>
                ))}
              </select>
            ) : (
              <span className="unit-fixed">{unit}</span>
            )}
          </div>
          <FieldError id={`sweep-${end}-error`} text={errors[end]} />
        </div>
      ))}
      <div className={`field${errors.points ? ' field-invalid' : ''}`}>
        <label htmlFor="sweep-points">
          points<span className="field-description">whole number, 1 to 999, both ends included</span>
        </label>
        <div className="field-input">
          <input
            id="sweep-points"
            inputMode="numeric"
            value={f.pointsText}
            aria-invalid={errors.points ? true : undefined}
            aria-describedby={errors.points ? 'sweep-points-error' : undefined}
            onChange={(e) => setForm({ pointsText: e.target.value })}
          />
          <select
            id="sweep-spacing"
            aria-label="spacing"
            value={f.spacing}
            onChange={(e) => setForm({ spacing: e.target.value as SweepSpacing })}
          >
            <option value="log">log-spaced (equal ratios)</option>
            <option value="linear">linear (equal steps)</option>
          </select>
        </div>
        <FieldError id="sweep-points-error" text={errors.points} />
      </div>
      <p className="hint">
        Each point runs with {replicas} replica{replicas === 1 ? '' : 's'} (set in the Run panel of “1 Set up and
        check”) and the set-up's numerics; cells and time step it leaves open are planned again per point.
      </p>
      <button type="button" className="primary" disabled={reason !== null} onClick={() => void startSweep()}>
        Run the sweep
      </button>
      {reason && (
        <p className="hint" data-testid="sweep-disabled-reason">
          The sweep is disabled: {reason}.
        </p>
      )}
      {f.error && (
        <p className="message message-error" role="alert" data-testid="sweep-error">
          The sweep cannot run: {f.error}
        </p>
      )}
    </section>
  );
}
