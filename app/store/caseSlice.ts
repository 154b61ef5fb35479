/** The case slice: the set-up form, and the case, messages and plan derived from it on every change. */
import type { StateCreator } from 'zustand/vanilla';
import type { SetupApi } from '../bridge/types';
import { convertEntry, entriesFor, type FormState } from '../setup/formModel';
import type { AppState, CaseSlice } from './types';

export interface StoreDeps {
  /** The loaded set-up API (presets, validation, planner). */
  readonly setup: () => SetupApi;
}

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
export function derive(
  api: SetupApi,
  form: FormState,
  s: Pick<AppState, 'replicas' | 'cores' | 'speed'>,
): Pick<CaseSlice, 'derived' | 'plan' | 'planErrors' | 'caseText'> {
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

export function createCaseSlice(deps: StoreDeps): StateCreator<AppState, [], [], CaseSlice> {
  return (set, get) => {
    const update = (patch: Partial<FormState> & Partial<Pick<CaseSlice, 'fileMessage' | 'exampleTitle'>>) => {
      const next = { ...formOf(get()), ...patch };
      set({ ...patch, ...derive(deps.setup(), next, get()) });
    };
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
      fileMessage: null,
      exampleTitle: null,
      selectPreset: (name) =>
        update({
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
          update({
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
          update({
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
      restoreForm: (form) => update({ gas: undefined, blocks: null, ...form }),
      setFileMessage: (m) => set({ fileMessage: m }),
    };
  };
}
