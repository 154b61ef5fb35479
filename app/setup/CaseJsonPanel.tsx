/** The built case as JSON: editable, openable from disk, savable; messages for files that were refused. */
import { useEffect, useState } from 'react';
import { appStore, useApp } from '../store/appStore';
import { readCaseFile } from '../io/caseFile';
import { downloadText } from '../io/download';
import { slug } from '../format';
import { FileMessageBox } from './FileMessageBox';

export async function openCaseFile(file: File): Promise<void> {
  const read = await readCaseFile(file);
  if (!read.ok) appStore.getState().setFileMessage({ kind: 'error', text: read.message });
  else appStore.getState().openCaseText(read.text, file.name);
}

/** One empty list for every render while nothing is derived yet (a new [] each time would re-render forever). */
const NO_ERRORS: readonly string[] = [];

export function CaseJsonPanel() {
  const caseText = useApp((s) => s.caseText);
  const errors = useApp((s) => s.derived?.caseErrors ?? NO_ERRORS);
  const source = useApp((s) => s.source);
  const name = useApp((s) => (s.derived?.draft as { name?: string } | null)?.name ?? 'case');
  const fieldProblems = useApp((s) => Object.keys(s.derived?.fieldErrors ?? {}).length);
  const valid = useApp((s) => s.derived?.caseInput != null);
  // Local text while typing; the store takes it on "Apply" so half-typed JSON never replaces a good case.
  const [text, setText] = useState(caseText);
  useEffect(() => setText(caseText), [caseText]);
  const dirty = text !== caseText;
  return (
    <section className="panel" aria-labelledby="case-json-title">
      <h2 id="case-json-title">Case file (JSON, SI units)</h2>
      <FileMessageBox />
      <div className="actions">
        <label className="button-like">
          Open case file…
          <input
            type="file"
            accept=".json,application/json"
            className="visually-hidden"
            data-testid="open-case-file"
            onChange={(e) => {
              const f = e.target.files?.[0];
              if (f) void openCaseFile(f);
              e.target.value = '';
            }}
          />
        </label>
        <button
          type="button"
          disabled={!valid}
          title={valid ? undefined : 'fix the marked problems first'}
          onClick={() => downloadText(`${slug(String(name))}.json`, caseText, 'application/json')}
        >
          Save case as JSON
        </button>
        <button type="button" disabled={!dirty} onClick={() => appStore.getState().editCaseText(text)}>
          Apply JSON edits
        </button>
        {dirty && (
          <button type="button" onClick={() => setText(caseText)}>
            Discard edits
          </button>
        )}
      </div>
      <p className="hint">
        Drop a case file anywhere on the page to open it. Source:{' '}
        {source.kind === 'form' ? 'built from the form' : source.label}.
      </p>
      {source.kind === 'form' && fieldProblems > 0 && (
        <p className="message message-error" role="status">
          The JSON below leaves out the {fieldProblems} form value{fieldProblems === 1 ? '' : 's'} marked invalid (their
          defaults stand in); it is not the case you asked for until they are fixed.
        </p>
      )}
      <textarea
        aria-label="case JSON"
        spellCheck={false}
        value={text}
        onChange={(e) => setText(e.target.value)}
        rows={18}
      />
      {errors.length > 0 && (
        <ul className="errors" aria-label="case problems">
          {errors.map((e) => (
            <li key={e} role="alert">
              {e}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
