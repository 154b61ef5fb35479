/**
 * Per wall: model, accommodation, temperature and speed along the wall, applied on top of the case the geometry form
 * builds. A field left empty keeps the preset's value (shown greyed as its placeholder).
 */
import { setupApi } from '../bridge/loadEngine';
import type { WallSpec } from '../../engine/case/schema';
import type { SideName } from '../../engine/case/caseConstants';
import { QuantityField } from '../fields/QuantityField';
import { convertEntry, entryOfSI, numberText, fromSI, unitChoices, type ParamEntry } from './formModel';
import { appStore, useApp } from '../store/appStore';

const COEFFICIENTS = {
  maxwell: [['accommodation', 'accommodation coefficient (0 specular … 1 diffuse)']],
  cercignaniLampis: [
    ['normalAccommodation', 'normal energy accommodation (0 … 1)'],
    ['tangentialAccommodation', 'tangential momentum accommodation (0 … 1)'],
  ],
} as const;

/** Bottom and top walls move along x, left and right walls along y (the schema allows no other in-plane motion). */
const ALONG: Readonly<Record<SideName, { axis: 0 | 1; name: string }>> = {
  left: { axis: 1, name: 'y' },
  right: { axis: 1, name: 'y' },
  bottom: { axis: 0, name: 'x' },
  top: { axis: 0, name: 'x' },
};

/** The wall's value in an entry: the user's own text if any, else empty with the built value as placeholder. */
function shown(edit: ParamEntry | undefined, builtSI: number, defaultUnit: string) {
  const unit = edit?.unit ?? defaultUnit;
  return { text: edit?.text ?? '', unit, placeholder: numberText(fromSI(builtSI, unit, setupApi())) };
}

function WallQuantities({ side, wall }: { side: SideName; wall: WallSpec }) {
  const edit = useApp((s) => s.walls[side]);
  const errors = useApp((s) => s.derived?.fieldErrors);
  const st = appStore.getState();
  const api = setupApi();
  const along = ALONG[side];
  const temperature = shown(edit?.temperature, wall.temperatureK, 'K');
  const speed = shown(edit?.speed, wall.velocityMPerS?.[along.axis] ?? 0, 'm/s');
  const convert = (e: ParamEntry | undefined, builtSI: number, to: string) =>
    e && e.text.trim() !== '' ? convertEntry(e, to, api) : { ...entryOfSI(builtSI, to, api), text: '' };
  return (
    <>
      <QuantityField
        id={`wall-${side}-temperature`}
        label={`${side} wall temperature`}
        {...temperature}
        units={unitChoices('temperature', api)}
        error={errors?.[`wall:${side}:temperatureK`]}
        onText={(text) => st.setWall(side, { temperature: { text, unit: temperature.unit } })}
        onUnit={(unit) => st.setWall(side, { temperature: convert(edit?.temperature, wall.temperatureK, unit) })}
      />
      <QuantityField
        id={`wall-${side}-speed`}
        label={`${side} wall speed along ${along.name}`}
        {...speed}
        units={unitChoices('speed', api)}
        error={errors?.[`wall:${side}:velocityMPerS`]}
        onText={(text) => st.setWall(side, { speed: { text, unit: speed.unit } })}
        onUnit={(unit) =>
          st.setWall(side, { speed: convert(edit?.speed, wall.velocityMPerS?.[along.axis] ?? 0, unit) })
        }
      />
    </>
  );
}

/** Wall fields with a place of their own in the row: the model, the temperature, the speed and the model's coefficients. */
function shownKeys(coefficients: readonly string[]): ReadonlySet<string> {
  return new Set(['model', 'temperatureK', 'velocityMPerS', ...coefficients]);
}

function WallRow({ side, wall }: { side: SideName; wall: WallSpec }) {
  const edit = useApp((s) => s.walls[side]);
  const errors = useApp((s) => s.derived?.fieldErrors);
  const st = appStore.getState();
  const model = edit?.model ?? wall.model ?? 'diffuse';
  const coefficients: readonly (readonly [string, string])[] = COEFFICIENTS[model as keyof typeof COEFFICIENTS] ?? [];
  const modelError = errors?.[`wall:${side}:model`];
  return (
    <fieldset className="wall-row" data-testid={`wall-${side}`}>
      <legend>
        {side} wall{wall.name ? ` (reported as ${wall.name})` : ''}
      </legend>
      <div className={`field${modelError && coefficients.length === 0 ? ' field-invalid' : ''}`}>
        <label htmlFor={`wall-${side}-model`}>{side} wall model</label>
        <select id={`wall-${side}-model`} value={model} onChange={(e) => st.setWall(side, { model: e.target.value })}>
          {setupApi().WALL_MODELS.map((m) => (
            <option key={m} value={m}>
              {m}
            </option>
          ))}
        </select>
        {modelError && coefficients.length === 0 && (
          <p className="field-error" role="alert">
            {modelError}
          </p>
        )}
      </div>
      {coefficients.map(([key, label]) => {
        const error = errors?.[`wall:${side}:${key}`] ?? (key === 'accommodation' ? modelError : undefined);
        const id = `wall-${side}-${key}`;
        const value =
          edit?.[key as 'accommodation'] ??
          (typeof (wall as Record<string, unknown>)[key] === 'number'
            ? String((wall as Record<string, unknown>)[key])
            : '');
        return (
          <div key={key} className={`field${error ? ' field-invalid' : ''}`}>
            <label htmlFor={id}>
              {side} {label} [1]
            </label>
            <div className="field-input">
              <input
                id={id}
                inputMode="decimal"
                value={value}
                aria-invalid={error ? true : undefined}
                onChange={(e) => st.setWall(side, { [key]: e.target.value })}
              />
            </div>
            {error && (
              <p className="field-error" role="alert">
                {error}
              </p>
            )}
          </div>
        );
      })}
      <WallQuantities side={side} wall={wall} />
      {/* Messages of fields not shown for this model (e.g. an accommodation typed before switching to diffuse). */}
      {Object.entries(errors ?? {})
        .filter(
          ([k]) =>
            k.startsWith(`wall:${side}:`) &&
            !shownKeys(coefficients.map(([key]) => key)).has(k.slice(`wall:${side}:`.length)),
        )
        .map(([k, m]) => (
          <p key={k} className="field-error" role="alert">
            {side} wall, {k.slice(`wall:${side}:`.length)}: {m}
          </p>
        ))}
    </fieldset>
  );
}

export function WallForm() {
  const draft = useApp((s) => s.derived?.draft);
  const source = useApp((s) => s.source);
  if (!draft || source.kind === 'json') return null;
  const sides = setupApi().SIDE_NAMES.filter((side) => draft.boundaries[side].type === 'wall');
  return (
    <section className="panel" aria-labelledby="walls-title">
      <h2 id="walls-title">Walls</h2>
      {sides.length === 0 && (
        <p className="hint">No side of this domain is a wall; the solid walls are blocks (below).</p>
      )}
      {sides.map((side) => (
        <WallRow key={side} side={side} wall={draft.boundaries[side] as WallSpec} />
      ))}
    </section>
  );
}
