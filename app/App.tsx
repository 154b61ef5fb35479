/** The workbench: views for set-up, run, results and saved runs, a drop target for case files, the caution. */
import { useEffect, useState } from 'react';
import { bootstrap } from './bootstrap';
import type { ExampleEntry } from './io/examples';
import { appStore, useApp } from './store/appStore';
import type { ViewName } from './store/types';
import { ExamplePicker } from './setup/ExamplePicker';
import { GeometryForm } from './setup/GeometryForm';
import { WallForm } from './setup/WallForm';
import { GasForm } from './setup/GasForm';
import { BlocksForm } from './setup/BlocksForm';
import { CaseJsonPanel } from './setup/CaseJsonPanel';
import { PlanReview } from './setup/PlanReview';
import { RunLauncher } from './run/RunLauncher';
import { RunProgress } from './run/RunProgress';
import { ResultPanels } from './results/ResultPanels';
import { LiveProfile } from './run/LiveProfile';
import { SavedRunsView } from './saved/SavedRunsView';
import { SweepView } from './sweep/SweepView';
import { LongDuctView } from './longDuct/LongDuctView';
import { DropTarget } from './setup/DropTarget';
import { Footer } from './Footer';

const VIEWS: readonly { id: ViewName; label: string }[] = [
  { id: 'setup', label: '1 Set up and check' },
  { id: 'run', label: '2 Run' },
  { id: 'results', label: '3 Results' },
  { id: 'sweep', label: 'Sweep' },
  { id: 'longDuct', label: 'Long duct' },
  { id: 'saved', label: 'Saved runs' },
];

function RunBadge() {
  const status = useApp((s) => s.status);
  const fraction = useApp((s) => s.progress?.fraction ?? 0);
  if (status === 'idle') return null;
  const busy = status === 'running' || status === 'paused' || status === 'starting' || status === 'stopping';
  return (
    <span className="run-badge" role="status" data-testid="run-badge">
      run {status}
      {busy ? ` ${(100 * fraction).toFixed(0)} %` : ''}
    </span>
  );
}

/** A run's end while the user was elsewhere: said here, with a link to its result, instead of switching views. */
function RunEndNotice() {
  const notice = useApp((s) => s.endNotice);
  const view = useApp((s) => s.view);
  if (!notice || view === 'run') return null;
  const close = () => appStore.getState().setRunState({ endNotice: null });
  return (
    <p className="message run-end-notice" role="status" data-testid="run-end-notice">
      {notice.text}{' '}
      {notice.resultId && (
        <a
          href="#results"
          onClick={(e) => {
            e.preventDefault();
            const st = appStore.getState();
            st.showResult(notice.resultId, false);
            st.setView('results');
            close();
          }}
        >
          Show the results
        </a>
      )}{' '}
      <button type="button" className="link" aria-label="dismiss the notice" onClick={close}>
        ×
      </button>
    </p>
  );
}

function ViewTabs() {
  const view = useApp((s) => s.view);
  const saved = useApp((s) => s.savedRuns.length);
  return (
    <nav className="tabs" aria-label="views">
      {VIEWS.map((v) => (
        <button
          key={v.id}
          type="button"
          role="tab"
          aria-selected={view === v.id}
          onClick={() => appStore.getState().setView(v.id)}
        >
          {v.label}
          {v.id === 'saved' && saved ? ` (${saved})` : ''}
        </button>
      ))}
    </nav>
  );
}

function SetupView({ examples }: { examples: readonly ExampleEntry[] }) {
  return (
    <div className="columns">
      <div className="column">
        <ExamplePicker examples={examples} />
        <GeometryForm />
        <GasForm />
        <WallForm />
        <BlocksForm />
        <CaseJsonPanel />
      </div>
      <div className="column">
        <RunLauncher />
        <PlanReview />
      </div>
    </div>
  );
}

export function App() {
  const view = useApp((s) => s.view);
  const ready = useApp((s) => s.engineReady);
  const [examples, setExamples] = useState<ExampleEntry[]>([]);
  const [failure, setFailure] = useState<string | null>(null);
  useEffect(() => {
    let cancelled = false;
    bootstrap(appStore)
      .then((e) => !cancelled && setExamples(e))
      .catch((e: Error) => !cancelled && setFailure(e.message));
    return () => {
      cancelled = true;
    };
  }, []);
  return (
    <>
      <header className="header">
        <h1>Tenuis — rarefied gas workbench</h1>
        {ready && <ViewTabs />}
        <RunBadge />
      </header>
      <main className="main">
        {failure && (
          <p className="message message-error" role="alert">
            The workbench could not start: {failure}
          </p>
        )}
        {!ready && !failure && <p role="status">Loading the engine…</p>}
        {ready && <RunEndNotice />}
        {ready && view === 'setup' && <SetupView examples={examples} />}
        {ready && view === 'run' && (
          <div className="columns">
            <div className="column">
              <RunProgress />
            </div>
            <div className="column">
              <LiveProfile />
            </div>
          </div>
        )}
        {ready && view === 'results' && <ResultPanels />}
        {ready && view === 'sweep' && <SweepView />}
        {ready && view === 'longDuct' && <LongDuctView />}
        {ready && view === 'saved' && <SavedRunsView />}
      </main>
      <DropTarget />
      <Footer />
    </>
  );
}
