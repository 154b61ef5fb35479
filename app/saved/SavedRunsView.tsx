/** Runs kept in this browser: reopen, rename, delete, overlay. */
import { useState } from 'react';
import { compareWithSavedRun, deleteSavedRun, openSavedRun, renameSavedRun } from './savedRuns';
import type { SavedRunMeta } from './savedRun';
import { countText } from '../format';
import { appStore, useApp } from '../store/appStore';

function SavedRunRow({ run }: { run: SavedRunMeta }) {
  const [name, setName] = useState(run.name);
  const [editing, setEditing] = useState(false);
  return (
    <tr data-testid="saved-run">
      <td>
        {editing ? (
          <form
            onSubmit={(e) => {
              e.preventDefault();
              setEditing(false);
              void renameSavedRun(appStore, run.id, name);
            }}
          >
            <input aria-label="new name" value={name} onChange={(e) => setName(e.target.value)} autoFocus />
            <button type="submit">Keep name</button>
          </form>
        ) : (
          <span className="run-name">{run.name}</span>
        )}
      </td>
      <td>
        {run.status}
        {run.lostReplicas ? `, ${run.lostReplicas} replica(s) lost` : ''}
      </td>
      <td>{run.knudsen.toPrecision(3)}</td>
      <td>{run.replicas}</td>
      <td>{countText(run.sampledSteps)}</td>
      <td>{new Date(run.finishedAt).toLocaleString()}</td>
      <td>
        <div className="actions">
          <button type="button" onClick={() => void openSavedRun(appStore, run.id)}>
            Open
          </button>
          <button
            type="button"
            onClick={() =>
              void compareWithSavedRun(appStore, run.id).then(() => appStore.getState().setView('results'))
            }
          >
            Overlay on shown result
          </button>
          <button type="button" onClick={() => setEditing(true)}>
            Rename
          </button>
          <button
            type="button"
            onClick={() => {
              if (window.confirm(`Delete the saved run “${run.name}”?`)) void deleteSavedRun(appStore, run.id);
            }}
          >
            Delete
          </button>
        </div>
      </td>
    </tr>
  );
}

export function SavedRunsView() {
  const runs = useApp((s) => s.savedRuns);
  return (
    <section className="panel" aria-labelledby="saved-title">
      <h2 id="saved-title">Saved runs in this browser</h2>
      {runs.length === 0 ? (
        <p>No saved runs yet: every finished or stopped run is kept here.</p>
      ) : (
        <table className="grid" aria-label="saved runs">
          <thead>
            <tr>
              <th>name</th>
              <th>status</th>
              <th>Kn [1]</th>
              <th>replicas</th>
              <th>sampled steps</th>
              <th>finished</th>
              <th>actions</th>
            </tr>
          </thead>
          <tbody>
            {runs.map((r) => (
              <SavedRunRow key={r.id} run={r} />
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
