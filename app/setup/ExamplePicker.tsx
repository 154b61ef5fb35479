/** Ready cases from public/examples/: pick one to start the set-up from it. */
import { openExample } from '../bootstrap';
import type { ExampleEntry } from '../io/examples';
import { appStore, useApp } from '../store/appStore';

export function ExamplePicker({ examples }: { examples: readonly ExampleEntry[] }) {
  const current = useApp((s) => s.exampleTitle);
  if (!examples.length) return null;
  const chosen = examples.find((e) => e.title === current);
  return (
    <section className="panel" aria-labelledby="examples-title">
      <h2 id="examples-title">Start from an example</h2>
      <div className="field">
        <label htmlFor="example-select">example case</label>
        <select
          id="example-select"
          value={chosen?.id ?? ''}
          onChange={(e) => {
            const ex = examples.find((x) => x.id === e.target.value);
            if (ex) void openExample(appStore, ex);
          }}
        >
          <option value="">(none: own set-up)</option>
          {examples.map((e) => (
            <option key={e.id} value={e.id}>
              {e.title}
            </option>
          ))}
        </select>
      </div>
      {chosen && <p className="hint">{chosen.scenario}</p>}
    </section>
  );
}
