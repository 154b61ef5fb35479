/** Wall model and accommodation per wall, applied on top of the case the geometry form builds. */
import { setupApi } from '../engine/loadEngine';
import type { SideName, WallSpec } from '../../engine/case/schema';
import { appStore, useApp } from '../store/appStore';

const COEFFICIENTS = {
  maxwell: [['accommodation', 'accommodation coefficient (0 specular … 1 diffuse)']],
  cercignaniLampis: [
    ['normalAccommodation', 'normal energy accommodation (0 … 1)'],
    ['tangentialAccommodation', 'tangential momentum accommodation (0 … 1)'],
  ],
} as const;

function WallRow({ side, wall }: { side: SideName; wall: WallSpec }) {
  const edit = useApp((s) => s.walls[side]);
  const errors = useApp((s) => s.derived?.fieldErrors);
  const st = appStore.getState();
  const model = edit?.model ?? wall.model ?? 'diffuse';
  const coefficients = COEFFICIENTS[model as keyof typeof COEFFICIENTS] ?? [];
  return (
    <fieldset className="wall-row">
      <legend>{side} wall — {wall.temperatureK} K, moving at {wall.velocityMPerS?.[0] ?? 0} m/s along x</legend>
      <div className="field">
        <label htmlFor={`wall-${side}-model`}>{side} wall model</label>
        <select id={`wall-${side}-model`} value={model} onChange={(e) => st.setWall(side, { model: e.target.value })}>
          {setupApi().WALL_MODELS.map((m) => <option key={m} value={m}>{m}</option>)}
        </select>
      </div>
      {coefficients.map(([key, label]) => {
        const error = errors?.[`wall:${side}:${key}`] ?? (key === 'accommodation' ? errors?.[`wall:${side}:model`] : undefined);
        const id = `wall-${side}-${key}`;
        const value = edit?.[key] ?? (typeof (wall as Record<string, unknown>)[key] === 'number' ? String((wall as Record<string, unknown>)[key]) : '');
        return (
          <div key={key} className={`field${error ? ' field-invalid' : ''}`}>
            <label htmlFor={id}>{side} {label} [1]</label>
            <div className="field-input">
              <input id={id} inputMode="decimal" value={value} aria-invalid={error ? true : undefined} onChange={(e) => st.setWall(side, { [key]: e.target.value })} />
            </div>
            {error && <p className="field-error" role="alert">{error}</p>}
          </div>
        );
      })}
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
      {sides.map((side) => <WallRow key={side} side={side} wall={draft.boundaries[side] as WallSpec} />)}
    </section>
  );
}
