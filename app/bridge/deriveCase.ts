/**
 * From the set-up form (or the user's own JSON) to a case: the case object, its JSON text, and every message placed
 * at the field it concerns. Part of the lazily loaded set-up chunk.
 *
 * The preset builds the case from its parameters; the form's edits are then applied on top of it: per wall model,
 * accommodation, temperature and speed; a custom gas; the block table (which replaces the preset's blocks).
 *
 * A custom gas keeps the preset's Knudsen number when the form gives one (the pressures given stay otherwise): the preset is built with its table gas (VHS), and every pressure
 * (initial, reservoirs, flowReport's) is multiplied by p_custom/p_table, where p = μ(T)·sqrt(πkT/(2m))/(Kn·L) is
 * the pressure at which the viscosity-based mean free path gives that Knudsen number at the initial temperature T.
 * A force-driven preset whose acceleration is left to its default gets it scaled by m_table/m_custom, since that
 * default is a fixed fraction of v0² = 2kT/m.
 *
 * Field keys: `param:NAME` (preset parameter), `wall:SIDE:FIELD` (wall edit; FIELD as in the case file:
 * temperatureK, velocityMPerS, model, accommodation …), `gas:FIELD` (gas.custom's fields, model, species,
 * rotationalCollisionNumber), `block:ROW:FIELD` (a row of the block table; FIELD xMinM … temperatureK, model, name,
 * or `other`); messages that belong to no field of the form (e.g. from JSON typed by the user) go to caseErrors.
 */
import {
  PRESETS,
  buildPreset,
  checkPresetParameter,
  gasStateOfPresetCase,
  type Preset,
} from '../../engine/case/presets';
import { parseCase, type Case, type CaseInput } from '../../engine/case/schema';
import { SIDE_NAMES, type SideName } from '../../engine/case/caseConstants';
import { planFromInput } from '../../engine/plan/plan';
import { gasModelOf } from '../../engine/plan/referenceState';
import { scalePressures } from '../../engine/case/sweep';
import { modelFromSpecies, viscosityPaS, type MolecularModel } from '../../engine/gas/molecularModel';
import { SPECIES_IDS, type SpeciesId } from '../../engine/gas/species';
import { AVOGADRO_PER_MOL } from '../../engine/physics/constants';
import { convertFromSI, unitsOf } from '../../engine/units/engineeringUnits';
import {
  entrySI,
  numberOf,
  toSI,
  type BlockEdit,
  type CustomGasEdit,
  type DerivedGasState,
  type FormState,
  gasStateModeOf,
  type ParamEntry,
  type UnitApi,
} from '../setup/formModel';
import { lengthLabel } from '../setup/blockEdits';

export interface CaseDerivation {
  /** The valid case, or null while anything is wrong. */
  readonly caseInput: CaseInput | null;
  /** The case as built (possibly invalid), for showing wall settings; null when JSON did not parse. */
  readonly draft: CaseInput | null;
  readonly caseText: string;
  readonly fieldErrors: Readonly<Record<string, string>>;
  readonly caseErrors: readonly string[];
  /**
   * The case's gas state both ways — Knudsen number and pressures — for the form to show the one not given beside
   * the one given: the planned reference state (custom gas included) when the case plans, else the preset's case.
   */
  readonly gasState: DerivedGasState | null;
}

const UNIT_API: UnitApi = { convertFromSI, unitsOf, AVOGADRO_PER_MOL };
const ACCOMMODATIONS = ['accommodation', 'normalAccommodation', 'tangentialAccommodation'] as const;
const WALL_FIELDS = [...ACCOMMODATIONS, 'model', 'temperatureK', 'velocityMPerS'] as const;
/** The velocity component a side's wall may have: along itself. */
const ALONG_WALL: Readonly<Record<SideName, 0 | 1>> = { left: 1, right: 1, bottom: 0, top: 0 };

function presetOf(name: string): Preset | undefined {
  return (PRESETS as Readonly<Record<string, Preset>>)[name];
}

function overrideText(e: ParamEntry): string {
  return e.unit ? `${e.text.trim()} ${e.unit}` : e.text.trim();
}

/** Drops "preset NAME, parameter P: " (the field already says which one). */
function fieldMessage(message: string): string {
  return message.replace(/^preset [^,]+, parameter [^:]+: /, '');
}

function notANumber(text: string, what: string): string {
  return `"${text.trim()}" is not a number; give ${what}`;
}

/** Where a case's block i came from in the block table (rows with unreadable numbers are left out of the case). */
interface Built {
  readonly c: CaseInput;
  readonly blockRows: readonly number[];
}

function buildFromForm(form: FormState, fieldErrors: Record<string, string>, caseErrors: string[]): Built | null {
  const preset = presetOf(form.presetName);
  if (!preset) {
    caseErrors.push(`unknown starting geometry "${form.presetName}"`);
    return null;
  }
  const custom = form.gas?.source === 'custom' && form.gas.custom !== undefined;
  const overrides: Record<string, string> = {};
  for (const p of preset.parameters) {
    const e = form.params[p.name];
    if (!e || e.text.trim() === '') continue;
    const text = overrideText(e);
    try {
      // The value alone: whether the parameters given go together is the whole build's to say (below).
      checkPresetParameter(preset.name, p.name, text);
      overrides[p.name] = text;
    } catch (err) {
      fieldErrors[`param:${p.name}`] = fieldMessage((err as Error).message);
    }
  }
  // A custom gas is built from the table gas's VHS state and rescaled (see the header); its model is applied after.
  if (custom && preset.parameters.some((p) => p.name === 'model')) overrides.model = 'VHS';
  let built: CaseInput;
  try {
    built = buildPreset(preset.name, overrides);
  } catch (err) {
    caseErrors.push((err as Error).message);
    return null;
  }
  for (const side of SIDE_NAMES) applyWallEdit(built, side, form, fieldErrors);
  applyGas(built, form, preset, fieldErrors);
  const blockRows = applyBlocks(built, form, fieldErrors);
  return { c: built, blockRows };
}

function applyWallEdit(c: CaseInput, side: SideName, form: FormState, fieldErrors: Record<string, string>): void {
  const edit = form.walls[side];
  const b = c.boundaries[side];
  if (!edit || b.type !== 'wall') return;
  // A copy: a preset may use one wall object for several sides and blocks.
  const wall = { ...b } as Record<string, unknown>;
  c.boundaries[side] = wall as typeof b;
  if (edit.model) wall.model = edit.model;
  for (const f of ACCOMMODATIONS) {
    const v = numberOf(edit[f]);
    if (v === null) continue;
    if (Number.isNaN(v)) fieldErrors[`wall:${side}:${f}`] = notANumber(edit[f]!, 'a number between 0 and 1');
    else wall[f] = v;
  }
  const t = entrySI(edit.temperature, UNIT_API);
  if (t !== null && Number.isNaN(t))
    fieldErrors[`wall:${side}:temperatureK`] = notANumber(
      edit.temperature!.text,
      `the wall temperature in ${edit.temperature!.unit}`,
    );
  else if (t !== null) wall.temperatureK = t;
  const u = entrySI(edit.speed, UNIT_API);
  if (u !== null && Number.isNaN(u))
    fieldErrors[`wall:${side}:velocityMPerS`] = notANumber(edit.speed!.text, `the wall speed in ${edit.speed!.unit}`);
  else if (u !== null) {
    const velocity = [...((wall.velocityMPerS as number[] | undefined) ?? [0, 0, 0])];
    velocity[ALONG_WALL[side]] = u;
    wall.velocityMPerS = velocity;
  }
}

/** The custom gas's fields as the case file has them; unreadable numbers are marked and left out. */
function customGasOf(g: CustomGasEdit, fieldErrors: Record<string, string>): Record<string, unknown> {
  const out: Record<string, unknown> = { name: g.name.trim() };
  const quantities: [keyof typeof g & ('mass' | 'diameter' | 'referenceTemperature'), string, string][] = [
    ['mass', 'massKg', 'the molecular mass'],
    ['diameter', 'referenceDiameterM', 'the reference diameter'],
    ['referenceTemperature', 'referenceTemperatureK', 'the reference temperature'],
  ];
  for (const [key, field, what] of quantities) {
    const v = entrySI(g[key], UNIT_API);
    if (v !== null && Number.isNaN(v))
      fieldErrors[`gas:${field}`] = notANumber(g[key].text, `${what} in ${g[key].unit}`);
    else if (v !== null) out[field] = v;
  }
  const numbers: [string, string, string][] = [
    [g.viscosityIndex, 'viscosityIndex', 'ω between 0.5 and 1'],
    [g.scatteringExponent, 'scatteringExponent', 'α between 1 and 2'],
    [g.rotationalDof, 'rotationalDof', '0, 2 or 3'],
  ];
  for (const [t, field, what] of numbers) {
    const v = numberOf(t);
    if (v !== null && Number.isNaN(v)) fieldErrors[`gas:${field}`] = notANumber(t, what);
    else if (v !== null) out[field] = v;
  }
  return out;
}

/** The custom gas's collision model when its fields make one, else null (the schema's messages explain). */
function customModel(gas: CaseInput['gas']): MolecularModel | null {
  const parsed = parseCase({ ...minimalCase, gas });
  if (!parsed.ok) return null;
  return gasModelOf(parsed.value).model;
}

/** Everything but the gas, valid, so that parseCase judges the gas alone. */
const minimalCase = {
  schemaVersion: 1,
  name: 'gas check',
  initial: { pressurePa: 1, temperatureK: 300 },
  domain: { lengthXM: 1, lengthYM: 1 },
  boundaries: {
    left: { type: 'periodic' },
    right: { type: 'periodic' },
    bottom: { type: 'symmetry' },
    top: { type: 'symmetry' },
  },
};

function applyGas(c: CaseInput, form: FormState, preset: Preset, fieldErrors: Record<string, string>): void {
  const g = form.gas;
  if (!g) return;
  const z = numberOf(g.rotationalCollisionNumber);
  if (z !== null && Number.isNaN(z))
    fieldErrors['gas:rotationalCollisionNumber'] = notANumber(g.rotationalCollisionNumber!, 'a number of at least 1');
  const collisionNumber = z !== null && !Number.isNaN(z) ? { rotationalCollisionNumber: z } : {};
  if (g.source !== 'custom' || !g.custom) {
    c.gas = { ...c.gas, ...collisionNumber };
    return;
  }
  const table = c.gas.species as SpeciesId | undefined;
  const model = (form.params.model?.text.trim() || c.gas.model || 'VHS') as NonNullable<CaseInput['gas']['model']>;
  c.gas = {
    custom: customGasOf(g.custom, fieldErrors) as NonNullable<CaseInput['gas']['custom']>,
    model,
    ...collisionNumber,
  };
  const name = String(c.gas.custom!.name) || 'custom gas';
  if (table && (SPECIES_IDS as readonly string[]).includes(table)) {
    const word = new RegExp(`\\b${table}\\b(?: \\((?:HS|VHS|VSS)\\))?`);
    c.name = c.name.replace(word, name);
    if (c.description) c.description = c.description.replace(word, `${name} (${model})`);
  }
  const mine = customModel(c.gas);
  // Pressures given stay as given: the custom gas then changes the Knudsen number instead.
  if (!mine || !table || gasStateModeOf(form.params) !== 'knudsen') return;
  const reference = modelFromSpecies(table, 'VHS');
  const t = c.initial.temperatureK;
  const factor =
    viscosityPaS(mine, t) / Math.sqrt(mine.massKg) / (viscosityPaS(reference, t) / Math.sqrt(reference.massKg));
  if (!Number.isFinite(factor) || factor <= 0) return;
  const scaled = scalePressures(c as unknown as Case, factor);
  c.initial = scaled.initial;
  c.boundaries = scaled.boundaries;
  if (scaled.flowReport) c.flowReport = scaled.flowReport;
  const acceleration =
    preset.parameters.some((p) => p.name === 'acceleration') && !form.params.acceleration?.text.trim();
  if (acceleration && c.bodyAccelerationXMPerS2) c.bodyAccelerationXMPerS2 *= reference.massKg / mine.massKg;
}

const COORDINATE_FIELDS = [
  ['xMin', 'xMinM', 'x min'],
  ['xMax', 'xMaxM', 'x max'],
  ['yMin', 'yMinM', 'y min'],
  ['yMax', 'yMaxM', 'y max'],
] as const;

/**
 * A coordinate within a relative 1e-9 of the domain's far edge is that edge: the table shows six digits, so a preset's
 * block reaching the edge (3.0000000000000004e-6 m) reads back as 3 µm, which must not lie outside the domain.
 */
function onEdge(valueM: number, lengthM: number): number {
  return Math.abs(valueM - lengthM) <= 1e-9 * lengthM ? lengthM : valueM;
}

/** The block table in place of the preset's blocks; returns the table row of each case block. */
function applyBlocks(c: CaseInput, form: FormState, fieldErrors: Record<string, string>): number[] {
  const table = form.blocks;
  if (!table) return (c.blocks ?? []).map((_, i) => i);
  const blocks: NonNullable<CaseInput['blocks']> = [];
  const rows: number[] = [];
  table.rows.forEach((r: BlockEdit, i) => {
    const at = (field: string) => `block:${i}:${field}`;
    const before = Object.keys(fieldErrors).length;
    const coordinates: Record<string, number> = {};
    for (const [key, field, what] of COORDINATE_FIELDS) {
      const v = numberOf(r[key]);
      if (v === null) fieldErrors[at(field)] = `give ${what} in ${table.lengthUnit}`;
      else if (Number.isNaN(v)) fieldErrors[at(field)] = notANumber(r[key], `${what} in ${table.lengthUnit}`);
      else
        coordinates[field] = onEdge(
          toSI(v, table.lengthUnit, UNIT_API),
          field.startsWith('x') ? c.domain.lengthXM : c.domain.lengthYM,
        );
    }
    const t = numberOf(r.temperature);
    if (t === null) fieldErrors[at('temperatureK')] = `give the block's wall temperature in ${table.temperatureUnit}`;
    else if (Number.isNaN(t))
      fieldErrors[at('temperatureK')] = notANumber(r.temperature, `the wall temperature in ${table.temperatureUnit}`);
    const wall: Record<string, unknown> = {
      type: 'wall',
      model: r.model || 'diffuse',
      temperatureK: t === null || Number.isNaN(t) ? 0 : toSI(t, table.temperatureUnit, UNIT_API),
    };
    for (const f of ACCOMMODATIONS) {
      const v = numberOf(r[f]);
      if (v !== null && Number.isNaN(v)) fieldErrors[at(f)] = notANumber(r[f]!, 'a number between 0 and 1');
      else if (v !== null) wall[f] = v;
    }
    if (Object.keys(fieldErrors).length > before) return;
    blocks.push({
      name: r.name.trim(),
      ...coordinates,
      wall,
      ...(r.faces !== undefined ? { faces: r.faces } : {}),
    } as (typeof blocks)[number]);
    rows.push(i);
  });
  c.blocks = blocks;
  return rows;
}

interface Placement {
  readonly form: FormState;
  readonly blockRows: readonly number[];
  readonly fieldErrors: Record<string, string>;
  readonly caseErrors: string[];
}

const BLOCK_MESSAGE_FIELDS = new Set([
  'name',
  'xMinM',
  'xMaxM',
  'yMinM',
  'yMaxM',
  'temperatureK',
  'model',
  ...ACCOMMODATIONS,
]);

/** A block message's field: its own (xMaxM …), the wall's (temperatureK, model …), or `other` (faces). */
function blockField(rest: string[]): string {
  const field = rest[0] === 'wall' ? rest[1] : rest[0];
  return field !== undefined && BLOCK_MESSAGE_FIELDS.has(field) ? field : 'other';
}

/** The schema's lengths in metres ("(0.0005 m)") in the block table's unit ("(500 µm)"). */
function inUnit(text: string, unit: string): string {
  return text.replace(/([+-]?\d+(?:\.\d+)?(?:e[+-]?\d+)?) m\b/g, (_, n: string) =>
    lengthLabel(Number(n), unit, UNIT_API),
  );
}

/** Puts a validation message at its form field when its path names one, else in caseErrors. */
function placeMessage(message: string, p: Placement): void {
  const { form, fieldErrors } = p;
  const text = message.slice(message.indexOf(':') + 1).trim();
  const fromForm = form.source.kind === 'form';
  const m = /^boundaries\.(left|right|bottom|top)\.(\w+)(?:\.|:)/.exec(message);
  if (fromForm && m && (WALL_FIELDS as readonly string[]).includes(m[2])) {
    // A preset parameter of the same name (e.g. the ducts' accommodation) set the wall's value: mark it there too.
    if (
      !form.walls[m[1] as SideName]?.[m[2] as 'accommodation'] &&
      presetOf(form.presetName)?.parameters.some((q) => q.name === m[2])
    ) {
      fieldErrors[`param:${m[2]}`] ??= text;
    }
    fieldErrors[`wall:${m[1]}:${m[2]}`] ??= text;
    return;
  }
  const g = /^gas\.(?:custom\.)?(\w+)(?:\.|:)/.exec(message);
  if (fromForm && g) {
    fieldErrors[`gas:${g[1]}`] ??= text;
    return;
  }
  const k = /^blocks\.(\d+)\.([\w.]+):/.exec(message);
  if (fromForm && k && p.blockRows[Number(k[1])] !== undefined) {
    // The row names the block already: drop the schema's "block NAME: ".
    const own = text.replace(/^block [^:\s]+: /, '');
    const unit = form.blocks?.lengthUnit;
    fieldErrors[`block:${p.blockRows[Number(k[1])]}:${blockField(k[2].split('.'))}`] ??= unit ? inUnit(own, unit) : own;
    return;
  }
  const n = /^numerics\.(\w+):/.exec(message);
  if (fromForm && n && presetOf(form.presetName)?.parameters.some((q) => q.name === n[1])) {
    fieldErrors[`param:${n[1]}`] = text;
    return;
  }
  p.caseErrors.push(message);
}

export function deriveCase(form: FormState): CaseDerivation {
  const fieldErrors: Record<string, string> = {};
  const caseErrors: string[] = [];
  let draft: CaseInput | null;
  let blockRows: readonly number[] = [];
  let caseText = form.caseText;
  if (form.source.kind === 'form') {
    const built = buildFromForm(form, fieldErrors, caseErrors);
    draft = built?.c ?? null;
    blockRows = built?.blockRows ?? [];
    if (draft) caseText = `${JSON.stringify(draft, null, 2)}\n`;
  } else {
    try {
      draft = JSON.parse(form.caseText) as CaseInput;
    } catch (err) {
      return {
        caseInput: null,
        draft: null,
        caseText,
        fieldErrors,
        caseErrors: [`the case is not valid JSON: ${(err as Error).message}`],
        gasState: null,
      };
    }
  }
  if (!draft) return { caseInput: null, draft: null, caseText, fieldErrors, caseErrors, gasState: null };
  const placement: Placement = { form, blockRows, fieldErrors, caseErrors };
  const parsed = parseCase(draft);
  let gasState: DerivedGasState | null = null;
  if (!parsed.ok) for (const e of parsed.errors) placeMessage(e, placement);
  else {
    const planned = planFromInput(draft);
    if (!planned.ok) for (const e of planned.errors) placeMessage(e, placement);
    else gasState = gasStateOfPlan(planned.plan.reference, draft);
  }
  if (!gasState && form.source.kind === 'form' && form.gas?.source !== 'custom') gasState = gasStateOf(draft);
  const valid = Object.keys(fieldErrors).length === 0 && caseErrors.length === 0;
  return { caseInput: valid ? draft : null, draft, caseText, fieldErrors, caseErrors, gasState };
}

/** Knudsen number and pressure of the planned reference state (the initial state), the vessels' pressures beside. */
function gasStateOfPlan(ref: { knudsen: number; pressurePa: number }, c: CaseInput): DerivedGasState {
  const { left, right } = c.boundaries;
  return left.type === 'reservoir' && right.type === 'reservoir'
    ? {
        knudsen: ref.knudsen,
        pressurePa: ref.pressurePa,
        upstreamPressurePa: left.pressurePa,
        downstreamPressurePa: right.pressurePa,
      }
    : { knudsen: ref.knudsen, pressurePa: ref.pressurePa };
}

function gasStateOf(c: CaseInput): DerivedGasState | null {
  try {
    return gasStateOfPresetCase(c);
  } catch {
    return null; // a draft too broken to say (unknown gas …): its messages are shown already
  }
}

/** Checks a case file's text without changing anything: the parsed case, or every reason it was refused. */
export function checkCaseText(text: string): { ok: true; caseInput: CaseInput } | { ok: false; errors: string[] } {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    return { ok: false, errors: [`not valid JSON: ${(err as Error).message}`] };
  }
  const planned = planFromInput(json);
  return planned.ok ? { ok: true, caseInput: json as CaseInput } : { ok: false, errors: planned.errors };
}
