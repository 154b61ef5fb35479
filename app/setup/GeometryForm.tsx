/**
 * The starting geometry (read from the engine's presets at run time) and the form of its parameters; the gas and
 * collision model parameters are edited in the gas panel (GasForm). The gas state has its own group: the user picks
 * whether they give the Knudsen number or pressures, and the other is shown derived beside it (GasStateFields).
 */
import { setupApi } from '../bridge/loadEngine';
import type { Preset, PresetParameter } from '../../engine/case/presets';
import { ParameterField } from '../fields/ParameterField';
import { appStore, useApp } from '../store/appStore';
import { sig } from '../format';
import {
  GAS_STATE_PARAMETERS,
  fromSI,
  gasStateModeOf,
  gasStateModes,
  gasStateSwitch,
  type DerivedGasState,
  type GasStateMode,
  type ParamEntries,
} from './formModel';

const MODE_LABELS: Readonly<Record<GasStateMode, string>> = {
  knudsen: 'Knudsen number',
  pressure: 'Gas pressure',
  meanPressure: 'Mean pressure and ratio',
  vesselPressures: 'Upstream and downstream pressures',
};

/** A pressure in the unit its entry is shown in (Pa when it has none yet). */
function pressureText(pa: number | undefined, name: string, params: ParamEntries): string {
  if (pa === undefined) return '';
  const unit = params[name]?.unit || 'Pa';
  return `${sig(fromSI(pa, unit, setupApi()), 4)} ${unit}`;
}

/** What the chosen way gives for the others, in words and units. */
function derivedText(mode: GasStateMode, s: DerivedGasState, params: ParamEntries): string {
  const kn = `Kn = ${sig(s.knudsen, 4)}`;
  const up = pressureText(s.upstreamPressurePa, 'upstreamPressure', params);
  const down = pressureText(s.downstreamPressurePa, 'downstreamPressure', params);
  const ratio =
    s.upstreamPressurePa !== undefined && s.downstreamPressurePa ? s.upstreamPressurePa / s.downstreamPressurePa : 0;
  if (mode === 'pressure') return `gives ${kn}`;
  if (mode === 'knudsen')
    return up
      ? `gives upstream ${up}, downstream ${down} (mean ${pressureText(s.pressurePa, 'meanPressure', params)})`
      : `gives the pressure ${pressureText(s.pressurePa, 'pressure', params)}`;
  if (mode === 'meanPressure') return `gives ${kn} at the mean pressure; upstream ${up}, downstream ${down}`;
  return `gives ${kn} at the mean pressure ${pressureText(s.pressurePa, 'upstreamPressure', params)}, ratio ${sig(ratio, 4)}`;
}

function GasStateFields({
  preset,
  modes,
  disabled,
}: {
  preset: Preset;
  modes: readonly GasStateMode[];
  disabled: boolean;
}) {
  const params = useApp((s) => s.params);
  const state = useApp((s) => s.derived?.gasState ?? null);
  const mode = gasStateModeOf(params);
  const byName = new Map<string, PresetParameter>(preset.parameters.map((p) => [p.name, p]));
  const choose = (to: GasStateMode) => {
    const texts = Object.entries(gasStateSwitch(to, modes, params, state, setupApi())).filter(([n]) => byName.has(n));
    const st = appStore.getState();
    // Empty the other way's entries first, so that no state in between gives two ways.
    for (const [name, text] of texts) if (text === '') st.setParamText(name, text);
    for (const [name, text] of texts) if (text !== '') st.setParamText(name, text);
  };
  return (
    <fieldset className="gas-state" disabled={disabled}>
      <legend>Gas state</legend>
      <div className="field" role="radiogroup" aria-label="give the gas state as">
        <span className="field-label">Give the gas state as</span>
        <div className="gas-state-modes">
          {modes.map((m) => (
            <label key={m}>
              <input
                type="radio"
                name={`gas-state-${preset.name}`}
                value={m}
                checked={mode === m}
                onChange={() => choose(m)}
              />{' '}
              {MODE_LABELS[m]}
            </label>
          ))}
        </div>
      </div>
      {GAS_STATE_PARAMETERS[mode]
        .filter((n) => byName.has(n))
        .map((n) => (
          <ParameterField key={`${preset.name}:${n}`} p={byName.get(n)!} />
        ))}
      {state && (
        <p className="gas-state-derived" data-testid="gas-state-derived" role="status">
          {derivedText(mode, state, params)}
        </p>
      )}
    </fieldset>
  );
}

const NUMERICS = new Set([
  'cells',
  'cellsX',
  'cellsY',
  'particlesPerCell',
  'transientSteps',
  'sampleSteps',
  'seed',
  'timeStep',
  'verdictTolerance',
]);
const IN_GAS_PANEL = new Set(['gas', 'model']);

export function GeometryForm() {
  const presetName = useApp((s) => s.presetName);
  const source = useApp((s) => s.source);
  const presets = setupApi().PRESETS as Readonly<Record<string, Preset>>;
  const preset = presets[presetName];
  const modes = preset ? gasStateModes(preset.parameters) : [];
  const gasState = new Set(modes.flatMap((m) => GAS_STATE_PARAMETERS[m]));
  const physical =
    preset?.parameters.filter((p) => !NUMERICS.has(p.name) && !IN_GAS_PANEL.has(p.name) && !gasState.has(p.name)) ?? [];
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
      {preset && modes.length > 0 && <GasStateFields preset={preset} modes={modes} disabled={source.kind === 'json'} />}
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
