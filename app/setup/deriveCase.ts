/**
 * From the set-up form (or the user's own JSON) to a case: the case object, its JSON text, and every message placed
 * at the field it concerns. Part of the lazily loaded set-up chunk.
 *
 * Field keys: `param:NAME` for a preset parameter, `wall:SIDE:FIELD` for a wall edit; messages that belong to no
 * field of the form (e.g. from JSON typed by the user) go to caseErrors.
 */
import { PRESETS, buildPreset, type Preset } from '../../engine/case/presets';
import { parseCase, SIDE_NAMES, type CaseInput, type SideName } from '../../engine/case/schema';
import { planFromInput } from '../../engine/case/plan';
import type { FormState, ParamEntry } from './formModel';

export interface CaseDerivation {
  /** The valid case, or null while anything is wrong. */
  readonly caseInput: CaseInput | null;
  /** The case as built (possibly invalid), for showing wall settings; null when JSON did not parse. */
  readonly draft: CaseInput | null;
  readonly caseText: string;
  readonly fieldErrors: Readonly<Record<string, string>>;
  readonly caseErrors: readonly string[];
}

const WALL_FIELDS = ['accommodation', 'normalAccommodation', 'tangentialAccommodation'] as const;

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

function buildFromForm(form: FormState, fieldErrors: Record<string, string>, caseErrors: string[]): CaseInput | null {
  const preset = presetOf(form.presetName);
  if (!preset) {
    caseErrors.push(`unknown starting geometry "${form.presetName}"`);
    return null;
  }
  const overrides: Record<string, string> = {};
  for (const p of preset.parameters) {
    const e = form.params[p.name];
    if (!e || e.text.trim() === '') continue;
    const text = overrideText(e);
    try {
      buildPreset(preset.name, { [p.name]: text });
      overrides[p.name] = text;
    } catch (err) {
      fieldErrors[`param:${p.name}`] = fieldMessage((err as Error).message);
    }
  }
  let built: CaseInput;
  try {
    built = buildPreset(preset.name, overrides);
  } catch (err) {
    caseErrors.push((err as Error).message);
    return null;
  }
  for (const side of SIDE_NAMES) applyWallEdit(built, side, form, fieldErrors);
  return built;
}

function applyWallEdit(c: CaseInput, side: SideName, form: FormState, fieldErrors: Record<string, string>): void {
  const edit = form.walls[side];
  const b = c.boundaries[side];
  if (!edit || b.type !== 'wall') return;
  const wall = b as Record<string, unknown>;
  if (edit.model) wall.model = edit.model;
  for (const f of WALL_FIELDS) {
    const text = edit[f];
    if (text === undefined || text.trim() === '') continue;
    const v = Number(text.replace('\u2212', '-'));
    if (!Number.isFinite(v)) fieldErrors[`wall:${side}:${f}`] = `"${text}" is not a number; give a number between 0 and 1`;
    else wall[f] = v;
  }
}

/** Puts a validation message at its form field when its path names one, else in caseErrors. */
function placeMessage(message: string, form: FormState, fieldErrors: Record<string, string>, caseErrors: string[]): void {
  const m = /^boundaries\.(left|right|bottom|top)\.(\w+)(?:\.|:)/.exec(message);
  if (form.source.kind === 'form' && m && (m[2] === 'model' || (WALL_FIELDS as readonly string[]).includes(m[2]))) {
    const text = message.slice(message.indexOf(':') + 1).trim();
    // A preset parameter of the same name (e.g. the ducts' accommodation) set the wall's value: mark it there too.
    if (!form.walls[m[1] as SideName]?.[m[2] as 'accommodation'] && presetOf(form.presetName)?.parameters.some((p) => p.name === m[2])) {
      fieldErrors[`param:${m[2]}`] ??= text;
    }
    fieldErrors[`wall:${m[1]}:${m[2]}`] = text;
    return;
  }
  const n = /^numerics\.(\w+):/.exec(message);
  if (form.source.kind === 'form' && n && presetOf(form.presetName)?.parameters.some((p) => p.name === n[1])) {
    fieldErrors[`param:${n[1]}`] = message.slice(message.indexOf(':') + 1).trim();
    return;
  }
  caseErrors.push(message);
}

export function deriveCase(form: FormState): CaseDerivation {
  const fieldErrors: Record<string, string> = {};
  const caseErrors: string[] = [];
  let draft: CaseInput | null;
  let caseText = form.caseText;
  if (form.source.kind === 'form') {
    draft = buildFromForm(form, fieldErrors, caseErrors);
    if (draft) caseText = `${JSON.stringify(draft, null, 2)}\n`;
  } else {
    try {
      draft = JSON.parse(form.caseText) as CaseInput;
    } catch (err) {
      return { caseInput: null, draft: null, caseText, fieldErrors, caseErrors: [`the case is not valid JSON: ${(err as Error).message}`] };
    }
  }
  if (!draft) return { caseInput: null, draft: null, caseText, fieldErrors, caseErrors };
  const parsed = parseCase(draft);
  if (!parsed.ok) for (const e of parsed.errors) placeMessage(e, form, fieldErrors, caseErrors);
  else {
    const planned = planFromInput(draft);
    if (!planned.ok) for (const e of planned.errors) placeMessage(e, form, fieldErrors, caseErrors);
  }
  const valid = Object.keys(fieldErrors).length === 0 && caseErrors.length === 0;
  return { caseInput: valid ? draft : null, draft, caseText, fieldErrors, caseErrors };
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
