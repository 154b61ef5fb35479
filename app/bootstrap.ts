/**
 * Start-up: load the set-up part of the engine, restore the set-up and saved runs from IndexedDB (or open the first
 * example on a first visit), keep the set-up saved as it changes, and load the run chunk while idle.
 */
import { loadRunApi, loadSetupApi } from './engine/loadEngine';
import { fetchExampleCase, fetchExamples, type ExampleEntry } from './io/examples';
import { listRuns, loadForm, loadSpeed, saveForm } from './io/db';
import { formOf } from './store/caseSlice';
import type { AppStore } from './store/store';

export async function openExample(store: AppStore, example: ExampleEntry): Promise<void> {
  let text: string | null = null;
  try {
    text = await fetchExampleCase(example);
  } catch (e) {
    store.getState().setFileMessage({ kind: 'error', text: `The example could not be loaded: ${(e as Error).message}` });
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
  const [saved, speed, runs, examples] = await Promise.all([
    loadForm().catch(() => undefined),
    loadSpeed().catch(() => undefined),
    listRuns().catch(() => []),
    fetchExamples().catch(() => [] as ExampleEntry[]),
  ]);
  const st = store.getState();
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
    if (form.presetName === last.presetName && form.params === last.params && form.walls === last.walls && form.gas === last.gas && form.blocks === last.blocks && form.source === last.source && form.caseText === last.caseText) return;
    last = form;
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => void saveForm(form).catch(() => undefined), 300);
  });
  const warm = () => void warmChunks();
  if ('requestIdleCallback' in window) window.requestIdleCallback(warm, { timeout: 2000 });
  else setTimeout(warm, 500);
  return examples;
}

/**
 * Loads the run chunk while the page is idle, so the first run starts at once. Plotly is not loaded ahead: evaluating
 * it holds the page's thread for a second or more (five under load), which would freeze the set-up at a random
 * moment; it loads when a plot is first shown, and live views during a run need none (they are plain SVG).
 */
async function warmChunks(): Promise<void> {
  try {
    await loadRunApi();
    performance.mark('tenuis-warm-done');
  } catch {
    // Warming is only a head start: the chunk loads again when first needed.
  }
}
