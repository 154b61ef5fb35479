/**
 * The workbench's one store, in five slices: case (the set-up and what is derived from it), run (the run going on),
 * results (which result is shown, and the saved runs), ui (views and selections), and sweep (the Sweep view's form,
 * its sweep and the saved sweeps). Large typed arrays never enter it: results live in results/resultCache.ts and the
 * store holds their id and a version number; a sweep keeps only its points' summary.json objects.
 *
 * The sweep slice is one field, `sweep`, rather than fields spread over the store like the others': its names
 * (status, notices, error …) are the run slice's too, and a sweep never changes the state of single runs.
 */
import type { CaseDerivation, PlanView, RunProgressView, SweepRequest } from '../bridge/types';
import type { FormState, ParamEntry, WallEdit, CaseSource, GasEdit, BlockTable } from '../setup/formModel';
import type { SideName } from '../../engine/case/caseConstants';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SweepContinuumCurves } from '../../engine/report/sweepCurves';
import type { SavedRunMeta } from '../saved/savedRun';
import type { ExampleEntry } from '../io/examples';
import type { SavedSweepMeta, SweepPlanOutline } from '../sweep/savedSweep';
import type { SweepFormState } from '../sweep/sweepForm';

export type { FormState, ParamEntry, WallEdit, CaseSource, GasEdit, BlockTable };

export interface FileMessage {
  readonly kind: 'error' | 'info';
  readonly text: string;
  readonly details?: readonly string[];
}

export interface CaseSlice extends FormState {
  readonly derived: CaseDerivation | null;
  readonly plan: PlanView | null;
  readonly planErrors: readonly string[];
  /** A change is being derived and planned off the page's thread: derived and plan are the previous change's. */
  readonly planPending: boolean;
  readonly fileMessage: FileMessage | null;
  /** The example the set-up started from, if any (shown by the example picker; saved runs are named for the case). */
  readonly exampleTitle: string | null;
  selectPreset(name: string): void;
  applyExample(example: ExampleEntry, caseText: string | null): void;
  setParamText(name: string, text: string): void;
  setParamUnit(name: string, unit: string): void;
  setWall(side: SideName, patch: WallEdit): void;
  /** The gas edit; undefined = the preset's table gas parameters alone. */
  setGas(gas: GasEdit | undefined): void;
  /** The block table replacing the preset's blocks; null = the preset's blocks again. */
  setBlocks(blocks: BlockTable | null): void;
  editCaseText(text: string): void;
  /** Opens a case file's text: refused with a message (and nothing changed) unless it is a valid case. */
  openCaseText(text: string, label: string): boolean;
  rebuildFromForm(): void;
  restoreForm(form: FormState): void;
  setFileMessage(m: FileMessage | null): void;
}

export type RunStatus = 'idle' | 'starting' | 'running' | 'paused' | 'stopping' | 'finished' | 'stopped' | 'failed';

/** The precision target as the user set it: a quantity, its goal as text in %, and whether reaching it ends the run. */
export interface TargetSetting {
  /** '' for no target. */
  readonly path: string;
  readonly goalPercent: string;
  readonly stopWhenReached: boolean;
}

/** A run's end told to a user who is elsewhere (the set-up, the Sweep view): what happened, and its result if any. */
export interface RunEndNotice {
  readonly text: string;
  /** The result to open from the notice, or null when the run kept none. */
  readonly resultId: string | null;
}

export interface RunSlice {
  readonly replicas: number;
  readonly cores: number;
  /** Particle-steps per second of one replica worker: measured by the last run in this browser, or a default. */
  readonly speed: { readonly particleStepsPerSecond: number; readonly measured: boolean };
  readonly status: RunStatus;
  readonly progress: RunProgressView | null;
  readonly notices: readonly string[];
  readonly runError: string | null;
  readonly endNotice: RunEndNotice | null;
  readonly target: TargetSetting;
  /** End a run as soon as no model's verdict on the headline quantity is undecided. */
  readonly stopWhenDecided: boolean;
  setReplicas(n: number): void;
  setTarget(patch: Partial<TargetSetting>): void;
  setStopWhenDecided(on: boolean): void;
  setSpeed(particleStepsPerSecond: number): void;
  setRunState(patch: Partial<Pick<RunSlice, 'status' | 'progress' | 'notices' | 'runError' | 'endNotice'>>): void;
  addNotice(text: string): void;
}

export interface ResultsSlice {
  /** Id of the result shown (live or finished) in results/resultCache.ts, and its version (bumped on each update). */
  readonly resultId: string | null;
  readonly resultVersion: number;
  readonly resultIsLive: boolean;
  readonly savedRuns: readonly SavedRunMeta[];
  /** A saved run overlaid on the plots for comparison. */
  readonly compareId: string | null;
  showResult(id: string | null, live: boolean): void;
  bumpResult(): void;
  setSavedRuns(runs: readonly SavedRunMeta[]): void;
  setCompare(id: string | null): void;
}

export type ViewName = 'setup' | 'run' | 'results' | 'sweep' | 'longDuct' | 'saved';

export interface UiSlice {
  readonly view: ViewName;
  readonly engineReady: boolean;
  readonly profileQuantity: string;
  readonly fieldQuantity: string;
  readonly wallQuantity: string;
  /** The unit each flow number is shown in (by flow quantity name), kept in the saved settings; absent = SI. */
  readonly flowUnits: Readonly<Record<string, string>>;
  setView(v: ViewName): void;
  setFlowUnit(quantity: string, unit: string): void;
  /** The saved choices at start-up. */
  restoreFlowUnits(units: Readonly<Record<string, string>>): void;
  setEngineReady(ready: boolean): void;
  select(patch: Partial<Pick<UiSlice, 'profileQuantity' | 'fieldQuantity' | 'wallQuantity'>>): void;
}

/** `interrupted`: a saved sweep this page did not finish (a reload or a closed tab ended it), shown with its finished points. */
export type SweepStatus = 'idle' | 'planning' | 'running' | 'stopping' | 'finished' | 'stopped' | 'interrupted';

export interface SweepRunState {
  readonly status: SweepStatus;
  /** The planned sweep being run or last run (for the table options and the export). */
  readonly planned: SweepPlanOutline | null;
  /** Id of the record in IndexedDB the sweep shown is kept as (null before it is saved or after it is deleted). */
  readonly savedId: string | null;
  readonly request: SweepRequest | null;
  /** The set-up's case the sweep started from (exported as case.json for `tenuis sweep`). */
  readonly baseCase: unknown;
  /** The finished points' rows, each a point's summary.json object (plain numbers, no typed arrays). */
  readonly rows: readonly SweepRow[];
  /** Why a failed point failed, by point number. */
  readonly failures: Readonly<Record<number, string>>;
  readonly current: {
    readonly index: number;
    readonly count: number;
    readonly progress: RunProgressView | null;
  } | null;
  /** The continuum curves over the range (a few hundred numbers), or why there are none. */
  readonly curves: SweepContinuumCurves | { readonly reason: string } | null;
  readonly error: string | null;
  readonly notices: readonly string[];
}

/** The sweep slice's state (AppState.sweep): the form's texts, what the sweep is doing, the saved sweeps. */
export interface SweepState extends SweepFormState, SweepRunState {
  /** Sweeps saved in this browser, the latest started first. */
  readonly saved: readonly SavedSweepMeta[];
  setForm(patch: Partial<SweepFormState>): void;
  setRun(patch: Partial<SweepRunState>): void;
  setSaved(saved: readonly SavedSweepMeta[]): void;
}

export interface SweepSlice {
  readonly sweep: SweepState;
}

export type AppState = CaseSlice & RunSlice & ResultsSlice & UiSlice & SweepSlice;
