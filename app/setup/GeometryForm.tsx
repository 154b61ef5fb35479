/**
 * The starting geometry (read from the engine's presets at run time) and the form of its parameters; the gas and
 * collision model parameters are edited in the gas panel (GasForm).
 */
import { setupApi } from '../bridge/loadEngine';
import type { Preset } from '../../engine/case/presets';
import { ParameterField } from '../fields/ParameterField';
import { appStore, useApp } from '../store/appStore';

const NUMERICS = new Set([
  'cells',
  'cellsX',
  'cellsY',
  'particlesPerCell',
  'transientSteps',
  'sampleSteps',
  'seed',
  'timeStep',
]);
const IN_GAS_PANEL = new Set(['gas', 'model']);

export function GeometryForm() {
  const presetName = useApp((s) => s.presetName);
  const source = useApp((s) => s.source);
  const presets = setupApi().PRESETS as Readonly<Record<string, Preset>>;
  const preset = presets[presetName];
  const physical = preset?.parameters.filter((p) => !NUMERICS.has(p.name) && !IN_GAS_PANEL.has(p.name)) ?? [];
  const numerics = preset?.parameters.filter((p) => NUMERICS.has(p.name)) ?? [];
  return (
    <section className="panel" aria-labelledby="geometry-title">
      <h2 id="geometry-title">Geometry and conditions</h2>
      <div className="field">
        <label htmlFor="preset-select">starting geometry</label>
        <select
          id="preset-select"
          value={presetName}
          onChange={(e) => appStore.getState().selectPreset(e.target.value)}
        >
          {!preset && <option value="">(choose)</option>}
          {Object.values(presets).map((p) => (
            <option key={p.name} value={p.name}>
              {p.name} — {p.description}
            </option>
          ))}
        </select>
      </div>
      {source.kind === 'json' && (
        <p className="note" role="status">
          The case now comes from JSON ({source.label}); the form below is not applied.{' '}
          <button type="button" onClick={() => appStore.getState().rebuildFromForm()}>
            Rebuild the case from the form
          </button>
        </p>
      )}
      <fieldset disabled={source.kind === 'json'}>
        <legend>Physical parameters</legend>
        {physical.map((p) => (
          <ParameterField key={`${presetName}:${p.name}`} p={p} />
        ))}
      </fieldset>
      <fieldset disabled={source.kind === 'json'}>
        <legend>Numerics and sampling</legend>
        {numerics.map((p) => (
          <ParameterField key={`${presetName}:${p.name}`} p={p} />
        ))}
      </fieldset>
    </section>
  );
}
