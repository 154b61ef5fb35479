/** The case slice: the set-up form, and the case, messages and plan derived from it on every change. */
import type { StateCreator } from 'zustand/vanilla';
import type { SetupApi } from '../bridge/types';
import { convertEntry, entriesFor, type FormState } from '../setup/formModel';
import type { AppState, CaseSlice } from './types';

export interface StoreDeps {
  /** The loaded set-up API (presets, validation, planner). */
  readonly setup: () => SetupApi;
  /**
   * Derives and plans off the page's thread (app/setup/planInWorker.ts); without it (unit tests) every change is
   * derived on the spot. Resolves with null when a later change made this one's answer stale.
   */
  readonly deriveAsync?: (form: FormState, settings: DeriveSettings) => Promise<Derived | null>;
}

/** The run settings the plan view depends on. */
export type DeriveSettings = Pick<AppState, 'replicas' | 'cores' | 'speed'>;
export type Derived = Pick<CaseSlice, 'derived' | 'plan' | 'planErrors' | 'caseText'>;

export function formOf(s: FormState): FormState {
  return {
    presetName: s.presetName,
    params: s.params,
    walls: s.walls,
    gas: s.gas,
    blocks: s.blocks ?? null,
    source: s.source,
    caseText: s.caseText,
  };
}

/** Derives case, messages and plan from a form and the run settings. */
export function derive(api: SetupApi, form: FormState, s: DeriveSettings): Derived {
  const derived = api.deriveCase(form);
  let plan = null;
  let planErrors: string[] = [];
  if (derived.caseInput) {
    const r = api.describePlan(derived.caseInput, {
      replicas: s.replicas,
      cores: s.cores,
      particleStepsPerSecond: s.speed.particleStepsPerSecond,
    });
    if (r.ok) plan = r.view;
    else planErrors = r.errors;
  }
  return { derived, plan, planErrors, caseText: derived.caseText };
}

/**
 * Applies a change of the form or the run settings: derived on the spot, or (with deps.deriveAsync) marked as being
 * planned and derived off the page's thread, the answer taken only if no later change came meanwhile.
 */
let generation = 0;

export function rederive(
  deps: StoreDeps,
  set: (patch: Partial<AppState>) => void,
  get: () => AppState,
  patch: Partial<AppState>,
  sync = false,
): void {
  const mine = ++generation;
  // Set-up actions that are not typing (a preset, an example, a restored form) are small cases: derived on the spot.
  if (!deps.deriveAsync || sync) {
    const next = { ...formOf(get()), ...(patch as Partial<FormState>) };
    set({ ...patch, ...derive(deps.setup(), next, { ...get(), ...patch }), planPending: false });
    return;
  }
  set({ ...patch, planPending: true });
  const s = get();
  void deps.deriveAsync(formOf(s), { replicas: s.replicas, cores: s.cores, speed: s.speed }).then(
    (d) => d && mine === generation && set({ ...d, planPending: false }),
    (e: Error) =>
      mine === generation &&
      set({ planPending: false, plan: null, planErrors: [`the case could not be planned: ${e.message}`] }),
  );
}

export function createCaseSlice(deps: StoreDeps): StateCreator<AppState, [], [], CaseSlice> {
  return (set, get) => {
    type Patch = Partial<FormState> & Partial<Pick<CaseSlice, 'fileMessage' | 'exampleTitle'>>;
    const update = (patch: Patch) => rederive(deps, set, get, patch);
    const updateNow = (patch: Patch) => rederive(deps, set, get, patch, true);
    return {
      presetName: '',
      params: {},
      walls: {},
      gas: undefined,
      blocks: null,
      source: { kind: 'form' },
      caseText: '',
      derived: null,
      plan: null,
      planErrors: [],
      planPending: false,
      fileMessage: null,
      exampleTitle: null,
      selectPreset: (name) =>
        updateNow({
          presetName: name,
          params: entriesFor(name, deps.setup()),
          walls: {},
          gas: undefined,
          blocks: null,
          source: { kind: 'form' },
          fileMessage: null,
          exampleTitle: null,
        }),
      applyExample: (example, caseText) => {
        const api = deps.setup();
        if (example.preset && Object.hasOwn(api.PRESETS, example.preset)) {
          updateNow({
            presetName: example.preset,
            params: entriesFor(example.preset, api, example.parameters ?? {}),
            walls: {},
            gas: undefined,
            blocks: null,
            source: { kind: 'form' },
            fileMessage: null,
            exampleTitle: example.title,
          });
        } else if (caseText !== null) {
          updateNow({
            source: { kind: 'json', label: `example ${example.file}` },
            caseText,
            fileMessage: null,
            exampleTitle: example.title,
          });
        }
      },
      setParamText: (name, text) =>
        update({ params: { ...get().params, [name]: { ...(get().params[name] ?? { unit: '' }), text } } }),
      setParamUnit: (name, unit) => {
        const entry = get().params[name];
        if (entry) update({ params: { ...get().params, [name]: convertEntry(entry, unit, deps.setup()) } });
      },
      setWall: (side, patch) => update({ walls: { ...get().walls, [side]: { ...get().walls[side], ...patch } } }),
      setGas: (gas) => update({ gas }),
      setBlocks: (blocks) => update({ blocks }),
      editCaseText: (text) => update({ source: { kind: 'json', label: 'edited as JSON' }, caseText: text }),
      openCaseText: (text, label) => {
        const checked = deps.setup().checkCaseText(text);
        if (!checked.ok) {
          set({
            fileMessage: {
              kind: 'error',
              text: `${label} was not opened: it is not a valid case. Nothing was changed.`,
              details: checked.errors,
            },
          });
          return false;
        }
        update({
          source: { kind: 'json', label },
          caseText: text,
          fileMessage: { kind: 'info', text: `Opened ${label}.` },
          exampleTitle: null,
        });
        return true;
      },
      rebuildFromForm: () => update({ source: { kind: 'form' }, fileMessage: null }),
      // Forms saved before the gas and block edits existed have neither: the preset's gas and blocks then stand.
      restoreForm: (form) => updateNow({ gas: undefined, blocks: null, ...form }),
      setFileMessage: (m) => set({ fileMessage: m }),
    };
  };
}
