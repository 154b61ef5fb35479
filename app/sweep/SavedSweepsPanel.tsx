/** Sweeps kept in this browser: which one is shown, how each stands (interrupted ones at which point), reopen, rename, delete. */
import { useState } from 'react';
import type { SavedSweepMeta } from './savedSweep';
import { sweepStandingText } from './savedSweep';
import { deleteSavedSweep, renameSavedSweep, reopenSavedSweep } from './savedSweeps';
import { SWEEP_BUSY, useSweep } from './sweepStore';

function SavedSweepRow({
  sweep,
  shown,
  activeId,
  busy,
}: {
  sweep: SavedSweepMeta;
  shown: boolean;
  activeId: string | null;
  busy: boolean;
}) {
  const [name, setName] = useState(sweep.name);
  const [editing, setEditing] = useState(false);
  return (
    <tr data-testid="saved-sweep" data-shown={shown ? 'yes' : 'no'}>
      <td>
        {editing ? (
          <form
            onSubmit={(e) => {
              e.preventDefault();
              setEditing(false);
              void renameSavedSweep(sweep.id, name);
            }}
          >
            <input aria-label="new sweep name" value={name} onChange={(e) => setName(e.target.value)} autoFocus />
            <button type="submit">Keep name</button>
          </form>
        ) : (
          <span className="run-name">{sweep.name}</span>
        )}
        {shown && <span className="hint"> (shown)</span>}
      </td>
      <td data-testid="saved-sweep-status">{sweepStandingText(sweep, activeId)}</td>
      <td>{sweep.replicas}</td>
      <td>{new Date(sweep.startedAt).toLocaleString()}</td>
      <td>
        <div className="actions">
          <button type="button" disabled={busy || shown} onClick={() => void reopenSavedSweep(sweep.id)}>
            Open
          </button>
          <button
            type="button"
            onClick={() => {
              setName(sweep.name);
              setEditing(true);
            }}
          >
            Rename
          </button>
          <button
            type="button"
            disabled={sweep.id === activeId}
            onClick={() => {
              if (window.confirm(`Delete the saved sweep “${sweep.name}”?`)) void deleteSavedSweep(sweep.id);
            }}
          >
            Delete
          </button>
        </div>
      </td>
    </tr>
  );
}

export function SavedSweepsPanel() {
  const saved = useSweep((s) => s.saved);
  const savedId = useSweep((s) => s.savedId);
  const busy = useSweep((s) => SWEEP_BUSY.includes(s.status));
  const activeId = busy ? savedId : null;
  return (
    <section className="panel" aria-labelledby="saved-sweeps-title">
      <h2 id="saved-sweeps-title">Saved sweeps in this browser</h2>
      {saved.length === 0 ? (
        <p>No saved sweeps yet: every sweep is kept here as its points finish.</p>
      ) : (
        <table className="grid" aria-label="saved sweeps">
          <thead>
            <tr>
              <th>name</th>
              <th>status</th>
              <th>replicas</th>
              <th>started</th>
              <th>actions</th>
            </tr>
          </thead>
          <tbody>
            {saved.map((s) => (
              <SavedSweepRow key={s.id} sweep={s} shown={s.id === savedId} activeId={activeId} busy={busy} />
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
