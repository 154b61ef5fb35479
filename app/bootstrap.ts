/**
 * Start-up: load the set-up part of the engine, restore the set-up, the chosen flow units and saved runs from IndexedDB (or open the first
 * example on a first visit), keep the set-up saved as it changes, and warm the run and plot chunks while idle so
 * they are not parsed in the middle of a run.
 */
import { loadRunApi, loadSetupApi } from './bridge/loadEngine';
import { warmPlotly } from './charts/plotly';
import { fetchExampleCase, fetchExamples, type ExampleEntry } from './io/examples';
import { listRuns, loadFlowUnits, loadForm, loadSpeed, saveFlowUnits, saveForm } from './io/db';
import { formOf } from './store/caseSlice';
import type { AppStore } from './store/store';

export async function openExample(store: AppStore, example: ExampleEntry): Promise<void> {
  let text: string | null = null;
  try {
    text = await fetchExampleCase(example);
  } catch (e) {
    store
      .getState()
      .setFileMessage({ kind: 'error', text: `The example could not be loaded: ${(e as Error).message}` });
    if (!example.preset) return;
  }
  store.getState().applyExample(example, text);
}

let started: Promise<ExampleEntry[]> | null = null;

/** Starts the workbench once (React's StrictMode runs effects twice in development); resolves with the examples. */
export function bootstrap(store: AppStore): Promise<ExampleEntry[]> {
  started ??= start(store);
  return started;
}

async function start(store: AppStore): Promise<ExampleEntry[]> {
  const api = await loadSetupApi();
  const [saved, speed, runs, examples, flowUnits] = await Promise.all([
    loadForm().catch(() => undefined),
    loadSpeed().catch(() => undefined),
    listRuns().catch(() => []),
    fetchExamples().catch(() => [] as ExampleEntry[]),
    loadFlowUnits().catch(() => ({})),
  ]);
  const st = store.getState();
  st.restoreFlowUnits(flowUnits);
  if (speed) st.setSpeed(speed);
  st.setSavedRuns(runs);
  const usable = saved && (saved.source.kind === 'json' || Object.hasOwn(api.PRESETS, saved.presetName));
  if (usable) st.restoreForm(saved);
  else if (examples.length) await openExample(store, examples[0]);
  if (!store.getState().presetName && store.getState().source.kind === 'form') st.selectPreset(api.presetNames()[0]);
  st.setEngineReady(true);

  let timer: ReturnType<typeof setTimeout> | null = null;
  let last = formOf(store.getState());
  store.subscribe((s) => {
    const form = formOf(s);
    if (
      form.presetName === last.presetName &&
      form.params === last.params &&
      form.walls === last.walls &&
      form.gas === last.gas &&
      form.blocks === last.blocks &&
      form.source === last.source &&
      form.caseText === last.caseText
    )
      return;
    last = form;
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => void saveForm(form).catch(() => undefined), 300);
  });
  let lastUnits = store.getState().flowUnits;
  store.subscribe((s) => {
    if (s.flowUnits === lastUnits) return;
    lastUnits = s.flowUnits;
    void saveFlowUnits(s.flowUnits).catch(() => undefined);
  });
  const warm = () => void warmChunks(store);
  if ('requestIdleCallback' in window) window.requestIdleCallback(warm, { timeout: 2000 });
  else setTimeout(warm, 500);
  return examples;
}

const BUSY = new Set(['starting', 'running', 'paused', 'stopping']);

/**
 * Loads the run chunk, then plotly. Evaluating plotly holds the page's thread for about a second (more on a loaded
 * machine), and a run shows its live views without it: if the user has started a run meanwhile, plotly waits until
 * the run ends. Marks `tenuis-warm-done` when all is loaded.
 */
async function warmChunks(store: AppStore): Promise<void> {
  try {
    await loadRunApi();
    if (BUSY.has(store.getState().status)) {
      await new Promise<void>((resolve) => {
        const unsubscribe = store.subscribe((s) => {
          if (BUSY.has(s.status)) return;
          unsubscribe();
          resolve();
        });
      });
    }
    await warmPlotly();
    performance.mark('tenuis-warm-done');
  } catch {
    // Warming is only a head start: each chunk loads again when first needed.
  }
}
