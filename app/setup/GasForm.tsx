/**
 * The gas: a table gas and collision model (the preset's own `gas` and `model` parameters, so the pressure it derives
 * from the Knudsen number is that gas's), or a custom gas with the case file's gas.custom fields. A custom gas keeps
 * the Knudsen number typed above: every pressure of the case is rescaled to it (app/bridge/deriveCase.ts).
 */
import { setupApi } from '../bridge/loadEngine';
import type { SpeciesId } from '../../engine/gas/species';
import { QuantityField } from '../fields/QuantityField';
import {
  MOLECULAR_MASS_UNITS,
  convertEntry,
  entryOfSI,
  numberText,
  type CustomGasEdit,
  type GasEdit,
  type ParamEntry,
} from './formModel';
import { appStore, useApp } from '../store/appStore';

/** The custom fields filled from a table gas, so that "custom" starts from known data. */
function customFrom(speciesId: string, model: string): CustomGasEdit {
  const api = setupApi();
  const s = api.SPECIES[(Object.hasOwn(api.SPECIES, speciesId) ? speciesId : 'Ar') as SpeciesId];
  const vss = model === 'VSS' && s.vssDiameterM !== null;
  return {
    name: `my ${s.name}`.replace(/\s+/g, '-'),
    mass: entryOfSI(s.massKg, 'g/mol', api),
    diameter: entryOfSI(vss ? s.vssDiameterM! : s.vhsDiameterM, 'nm', api),
    referenceTemperature: { text: numberText(s.referenceTemperatureK), unit: 'K' },
    viscosityIndex: numberText(s.viscosityIndex),
    scatteringExponent: numberText(vss ? s.vssScatteringExponent! : 1),
    rotationalDof: String(s.rotationalDof),
  };
}

type QuantityKey = 'mass' | 'diameter' | 'referenceTemperature';
const QUANTITIES: readonly {
  key: QuantityKey;
  field: string;
  label: string;
  units: readonly string[];
  description: string;
}[] = [
  {
    key: 'mass',
    field: 'massKg',
    label: 'molecular mass',
    units: MOLECULAR_MASS_UNITS,
    description: 'molar mass (g/mol), or the mass of one molecule (kg)',
  },
  {
    key: 'diameter',
    field: 'referenceDiameterM',
    label: 'reference diameter',
    units: ['nm', 'µm', 'm'],
    description: 'VHS/VSS molecular diameter at the reference temperature',
  },
  {
    key: 'referenceTemperature',
    field: 'referenceTemperatureK',
    label: 'reference temperature',
    units: ['K', '°C'],
    description: 'temperature at which the diameter holds',
  },
];
const NUMBERS: readonly {
  key: 'viscosityIndex' | 'scatteringExponent';
  field: string;
  label: string;
  description: string;
}[] = [
  {
    key: 'viscosityIndex',
    field: 'viscosityIndex',
    label: 'viscosity index ω',
    description: 'μ ∝ T^ω: 0.5 hard sphere … 1 Maxwell molecules (HS uses 0.5 whatever is typed)',
  },
  {
    key: 'scatteringExponent',
    field: 'scatteringExponent',
    label: 'VSS scattering exponent α',
    description: '1 isotropic … 2; used by the VSS model only',
  },
];
const SHOWN_FIELDS = new Set([
  'name',
  'massKg',
  'referenceDiameterM',
  'referenceTemperatureK',
  'viscosityIndex',
  'scatteringExponent',
  'rotationalDof',
  'rotationalCollisionNumber',
  'model',
  'species',
]);

function CustomGasFields({ gas, custom: c }: { gas: GasEdit; custom: CustomGasEdit }) {
  const errors = useApp((s) => s.derived?.fieldErrors);
  const api = setupApi();
  const st = appStore.getState();
  const set = (patch: Partial<CustomGasEdit>) => st.setGas({ ...gas, custom: { ...c, ...patch } });
  const nameError = errors?.['gas:name'];
  const dofError = errors?.['gas:rotationalDof'];
  return (
    <fieldset data-testid="custom-gas">
      <legend>Custom gas (gas.custom)</legend>
      <div className={`field${nameError ? ' field-invalid' : ''}`}>
        <label htmlFor="gas-name">gas name</label>
        <div className="field-input">
          <input
            id="gas-name"
            value={c.name}
            aria-invalid={nameError ? true : undefined}
            onChange={(e) => set({ name: e.target.value })}
          />
        </div>
        {nameError && (
          <p className="field-error" role="alert">
            {nameError}
          </p>
        )}
      </div>
      {QUANTITIES.map((q) => (
        <QuantityField
          key={q.key}
          id={`gas-${q.key}`}
          label={q.label}
          description={q.description}
          text={c[q.key].text}
          unit={c[q.key].unit}
          units={q.units}
          error={errors?.[`gas:${q.field}`]}
          onText={(text) => set({ [q.key]: { ...c[q.key], text } as ParamEntry })}
          onUnit={(unit) => set({ [q.key]: convertEntry(c[q.key], unit, api) })}
        />
      ))}
      {NUMBERS.map((q) => (
        <QuantityField
          key={q.key}
          id={`gas-${q.key}`}
          label={q.label}
          description={q.description}
          text={c[q.key]}
          unit=""
          units={[]}
          error={errors?.[`gas:${q.field}`]}
          onText={(text) => set({ [q.key]: text })}
          onUnit={() => undefined}
        />
      ))}
      <div className={`field${dofError ? ' field-invalid' : ''}`}>
        <label htmlFor="gas-rotationalDof">rotational degrees of freedom [1]</label>
        <div className="field-input">
          <select
            id="gas-rotationalDof"
            value={c.rotationalDof}
            onChange={(e) => set({ rotationalDof: e.target.value })}
          >
            <option value="0">0 (monatomic)</option>
            <option value="2">2 (linear molecule)</option>
            <option value="3">3 (non-linear molecule)</option>
          </select>
        </div>
        {dofError && (
          <p className="field-error" role="alert">
            {dofError}
          </p>
        )}
      </div>
    </fieldset>
  );
}

export function GasForm() {
  const source = useApp((s) => s.source);
  const gasParam = useApp((s) => s.params.gas);
  const modelParam = useApp((s) => s.params.model);
  const gas = useApp((s) => s.gas);
  const errors = useApp((s) => s.derived?.fieldErrors);
  const hasPreset = useApp((s) => Object.hasOwn(setupApi().PRESETS, s.presetName));
  if (!hasPreset) return null;
  const api = setupApi();
  const st = appStore.getState();
  const species = gasParam?.text ?? 'Ar';
  const model = modelParam?.text ?? 'VHS';
  const edit: GasEdit = gas ?? { source: 'table' };
  const custom = edit.source === 'custom' && edit.custom !== undefined;
  const speciesError = errors?.['param:gas'] ?? errors?.['gas:species'];
  const modelError = errors?.['param:model'] ?? errors?.['gas:model'];
  const zError = errors?.['gas:rotationalCollisionNumber'];
  const others = Object.entries(errors ?? {}).filter(([k]) => k.startsWith('gas:') && !SHOWN_FIELDS.has(k.slice(4)));
  return (
    <section className="panel" aria-labelledby="gas-title" data-testid="gas-form">
      <h2 id="gas-title">Gas</h2>
      <fieldset disabled={source.kind === 'json'}>
        <legend>Gas and collision model</legend>
        <div className="field">
          <span className="field-label">gas from</span>
          <div className="field-input" role="radiogroup" aria-label="gas from">
            <label className="field-inline">
              <input
                type="radio"
                name="gas-source"
                checked={!custom}
                onChange={() => st.setGas({ ...edit, source: 'table' })}
              />{' '}
              the table
            </label>
            <label className="field-inline">
              <input
                type="radio"
                name="gas-source"
                checked={custom}
                onChange={() =>
                  st.setGas({ ...edit, source: 'custom', custom: edit.custom ?? customFrom(species, model) })
                }
              />{' '}
              my own data (custom gas)
            </label>
          </div>
        </div>
        {!custom && (
          <div className={`field${speciesError ? ' field-invalid' : ''}`}>
            <label htmlFor="gas-species">
              table gas<span className="field-description">molecular data of Bird (1994), Appendix A</span>
            </label>
            <div className="field-input">
              <select id="gas-species" value={species} onChange={(e) => st.setParamText('gas', e.target.value)}>
                {api.SPECIES_IDS.map((id) => (
                  <option key={id} value={id}>
                    {id} — {api.SPECIES[id].name}
                  </option>
                ))}
              </select>
            </div>
            {speciesError && (
              <p className="field-error" role="alert">
                {speciesError}
              </p>
            )}
          </div>
        )}
        <div className={`field${modelError ? ' field-invalid' : ''}`}>
          <label htmlFor="gas-model">
            collision model
            <span className="field-description">
              HS hard sphere, VHS variable hard sphere, VSS variable soft sphere
            </span>
          </label>
          <div className="field-input">
            <select id="gas-model" value={model} onChange={(e) => st.setParamText('model', e.target.value)}>
              {api.COLLISION_MODELS.map((m) => (
                <option key={m} value={m}>
                  {m}
                </option>
              ))}
            </select>
          </div>
          {modelError && (
            <p className="field-error" role="alert">
              {modelError}
            </p>
          )}
        </div>
        <QuantityField
          id="gas-rotationalCollisionNumber"
          label="rotational collision number Z"
          description="collisions per rotational relaxation (Larsen–Borgnakke); empty = 5"
          text={edit.rotationalCollisionNumber ?? ''}
          unit=""
          units={[]}
          placeholder="5"
          error={zError}
          onText={(text) => st.setGas({ ...edit, rotationalCollisionNumber: text })}
          onUnit={() => undefined}
        />
        {custom && <CustomGasFields gas={edit} custom={edit.custom!} />}
        {custom && (
          <p className="hint">
            The Knudsen number of the geometry form holds for this gas: every pressure of the case is set for it (the
            JSON shows the result).
          </p>
        )}
        {others.length > 0 && (
          <ul className="errors">
            {others.map(([k, m]) => (
              <li key={k} role="alert">
                {k.slice(4)}: {m}
              </li>
            ))}
          </ul>
        )}
      </fieldset>
    </section>
  );
}
