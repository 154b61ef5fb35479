/** The message about the last case file opened or dropped (refused files: why, and that nothing changed). */
import { appStore, useApp } from '../store/appStore';

export function FileMessageBox() {
  const m = useApp((s) => s.fileMessage);
  if (!m) return null;
  return (
    <div
      className={m.kind === 'error' ? 'message message-error' : 'message'}
      role={m.kind === 'error' ? 'alert' : 'status'}
      data-testid="file-message"
    >
      <p>{m.text}</p>
      {m.details && m.details.length > 0 && (
        <ul>
          {m.details.map((d) => (
            <li key={d}>{d}</li>
          ))}
        </ul>
      )}
      <button type="button" onClick={() => appStore.getState().setFileMessage(null)}>
        Dismiss
      </button>
    </div>
  );
}
