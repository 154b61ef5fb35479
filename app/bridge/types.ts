/**
 * What the page may call on the engine, written out: the set-up API (the set-up chunk, setupApi.ts) and the run API
 * (the run chunk, runApi.ts with its sweep side sweepApi.ts). loadEngine.ts checks each chunk against its interface
 * when it loads, so a chunk that stops providing a member fails the type check here rather than somewhere in a
 * panel, and the rest of app/ depends on these declarations instead of on whatever the chunk modules happen to
 * export. Types only: importing this file never pulls engine code into the page's main bundle.
 *
 * The data types the APIs take and return are declared by the modules that produce them (the engine, and the bridge
 * modules for the page's own views); they are re-exported here so that app/ outside the bridge reads them from one
 * place.
 */
import type { Preset, PresetName } from '../../engine/case/presets';
import type { CaseInput, CaseParseResult, WallSpec } from '../../engine/case/schema';
import type { SideName } from '../../engine/case/caseConstants';
import type { SweepParameter, SweepSpacing } from '../../engine/case/sweep';
import type { SweepTableOptions } from '../../engine/report/sweepTable';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SweepPointRun } from '../../engine/report/sweepRow';
import type { SweepContinuumCurves } from '../../engine/report/sweepCurves';
import type { SpeciesData, SpeciesId } from '../../engine/gas/species';
import type { ConversionContext, QuantityKind } from '../../engine/units/engineeringUnits';
import type {
  ConductanceCurveRequest,
  LongDuctAnswer,
  LongDuctProfileRows,
  LongDuctRequest,
} from '../../engine/report/longDuctReport';
import type { DuctFlowResult } from '../../engine/longDuct/ductFlow';
import type { ConductancePoint } from '../../engine/longDuct/conductanceCurve';
import type { CoefficientTable } from '../../engine/longDuct/coefficientTable';
import type { ContinuumComparison, ContinuumComparisonResult } from '../../engine/report/comparison';
import type { ContinuumModelName } from '../../engine/continuum/caseModelTypes';
import type { SimulationResult } from '../../engine/results/summarize';
import type { SummaryExtra } from '../../engine/report/summaryJson';
import type { Headline } from '../../engine/report/headline';
import type { FlowQuantityName, FlowResult } from '../../engine/results/flowQuantities';
import type { FlowUnitChoice, FlowUnitQuantity } from '../../engine/units/flowUnits';
import type { FlowCsvOptions } from '../../engine/report/flowCsv';
import type { CutPrediction, CutProfileTable } from '../../engine/report/cutProfileCsv';
import type { FormState } from '../setup/formModel';
import type { ResultGeometry } from '../results/resultGeometry';
import type { CaseDerivation } from './deriveCase';
import type { PlanOptions, PlanViewResult } from './planView';
import type { RunCallbacks, RunHandle, RunRequest } from './runApi';
import type { SweepPlanView, SweepPointView, SweepRequest } from './sweepApi';

export type { AdvisorRow, PlanOptions, PlanView, PlanViewResult } from './planView';
export type { CaseDerivation } from './deriveCase';
export type {
  FinishedRun,
  ReplicaEnd,
  ReplicaView,
  RunCallbacks,
  RunEnd,
  RunHandle,
  RunProgressView,
  RunRequest,
  TargetRequest,
  TargetView,
} from './runApi';
export type { SweepPlanView, SweepPointView, SweepQuantity, SweepRequest } from './sweepApi';

/** A case file's text checked without changing anything: the case, or every reason it is refused. */
export type CaseTextCheck = { ok: true; caseInput: CaseInput } | { ok: false; errors: string[] };

/** The set-up chunk: presets, validation, the planner's view of a case, the engine's units. */
export interface SetupApi {
  readonly PRESETS: Readonly<Record<PresetName, Preset>>;
  /** Preset names in the order the picker lists them. */
  presetNames(): PresetName[];
  buildPreset(name: string, overrides?: Readonly<Record<string, string>>): CaseInput;
  parseCase(input: unknown): CaseParseResult;
  readonly SIDE_NAMES: readonly SideName[];
  readonly WALL_MODELS: readonly WallSpec['model'][];
  readonly COLLISION_MODELS: readonly ('HS' | 'VHS' | 'VSS')[];
  readonly SPECIES: Readonly<Record<SpeciesId, SpeciesData>>;
  readonly SPECIES_IDS: readonly SpeciesId[];
  readonly AVOGADRO_PER_MOL: number;
  unitsOf(kind: QuantityKind): readonly string[];
  convertFromSI(valueSI: number, unit: string, context?: ConversionContext): number;
  convertToSI(value: number, unit: string, context?: ConversionContext): number;
  formatQuantity(valueSI: number, unit: string, significantDigits?: number, context?: ConversionContext): string;
  /** The set-up form to a case, its JSON text and the messages at the fields they concern. */
  deriveCase(form: FormState): CaseDerivation;
  checkCaseText(text: string): CaseTextCheck;
  /** What the set-up shows of a case's plan before a run (numerics advisor, expected noise, time estimate). */
  describePlan(caseInput: unknown, options: PlanOptions): PlanViewResult;
}

/** The sweep side of the run chunk: the set-up's case planned over a range, and the engine's own sweep tables. */
export interface SweepApi {
  /** A value in `unit`, in SI (for the ends of a pressure sweep). */
  convertToSI(value: number, unit: string, context?: ConversionContext): number;
  /** Every point planned, as `tenuis sweep` does before it runs any; refused at the first point that cannot run. */
  planSweep(caseInput: unknown, request: SweepRequest): SweepPlanView;
  /** The continuum models' predictions over the sweep's range (evaluated a few values per macrotask). */
  sweepCurves(
    caseInput: unknown,
    request: SweepRequest,
    points: readonly SweepPointView[],
  ): Promise<SweepContinuumCurves | { readonly reason: string }>;
  sweepRowOf(point: number, value: number, run: SweepPointRun): SweepRow;
  sweepCsv(rows: readonly SweepRow[], options: SweepTableOptions): string;
  sweepJson(
    rows: readonly SweepRow[],
    options: {
      caseName: string;
      parameter: SweepParameter;
      from: number;
      to: number;
      points: number;
      spacing: SweepSpacing;
      interrupted: boolean;
    },
  ): object;
}

/** The run chunk: runs in the replica workers, saved runs' results again, and the files `tenuis run` writes. */
export interface RunApi extends SweepApi {
  startRun(request: RunRequest, callbacks: RunCallbacks): RunHandle;
  /** A saved run's result and comparison again from its sample file (worked out off the page's thread). */
  resultFromSamples(
    samples: ArrayBuffer,
    runWarnings: readonly string[],
  ): Promise<{ result: SimulationResult; comparison: ContinuumComparisonResult }>;
  /** Cells, walls, blocks and gas constants of the case's plan, for the result plots; null if it does not plan. */
  resultGeometryOf(caseInput: unknown): ResultGeometry | null;
  flowQuantityUnits(planar: boolean): Record<FlowQuantityName, string>;
  /** The units each flow number can be shown in, the engine's own first. */
  readonly FLOW_UNIT_CHOICES: Readonly<Record<FlowUnitQuantity, readonly FlowUnitChoice[]>>;
  /** flow.csv as the command line writes it, with the chosen units as extra columns when given. */
  flowCsv(flow: FlowResult, planar: boolean, options?: FlowCsvOptions): string;
  readonly MODEL_LABELS: { readonly [M in ContinuumModelName]: string };
  profilesCsv(result: SimulationResult, comparison?: ContinuumComparisonResult): string;
  fieldsCsv(result: SimulationResult): string;
  surfacesCsv(result: SimulationResult): string;
  summaryJsonText(result: SimulationResult, extra: SummaryExtra): string;
  /** verdict.csv of a recognised comparison (engine/report/verdictCsv.ts). */
  verdictCsv(comparison: ContinuumComparison): string;
  /** The one-sentence answer and its time to decide (engine/report/headline.ts). */
  verdictHeadline(comparison: ContinuumComparison): Headline;
  extraTimeText(headline: Headline, sampledSeconds: number): string;
  sampledWallSeconds(wallSeconds: number, sampleSteps: number, steps: number): number;
  cutProfileCsv(cut: CutProfileTable, predictions?: readonly CutPrediction[]): string;
}

/** The long-duct chunk: the long-duct answer and its files, the shipped coefficient tables, a table's check. */
export interface LongDuctApi {
  longDuctAnswer(request: LongDuctRequest): LongDuctAnswer;
  longDuctProfile(request: LongDuctRequest, result: DuctFlowResult, points?: number): LongDuctProfileRows;
  longDuctProfileCsv(rows: LongDuctProfileRows): string;
  longDuctConductanceCurve(request: ConductanceCurveRequest): ConductancePoint[];
  conductanceCurveCsv(curve: readonly ConductancePoint[]): string;
  pressureRange(fromPa: number, toPa: number, n: number, log: boolean): number[];
  readonly BUILTIN_TABLES: readonly CoefficientTable[];
  tableProblem(table: CoefficientTable): string | null;
}
