/** Reading a case file at the edge: file → JSON.parse (never eval) → parseCase → plan, with messages a user can act on. */
import { readFileSync } from 'node:fs';
import { parseCase, type Case } from '../engine/case/schema';
import { plan, type Plan } from '../engine/plan/plan';
import { CliError } from './errors';
import { jsonErrorOffset, locationOf } from './jsonErrorLocation';

/** Reads and parses a JSON file; throws CliError naming the file and, for bad JSON, the line and column. */
export function readJsonFile(path: string): unknown {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why =
      code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder, not a file' : (e as Error).message;
    throw new CliError(`cannot read ${path}: ${why}`);
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1); // byte-order mark some editors write
  try {
    return JSON.parse(text);
  } catch (e) {
    const offset = jsonErrorOffset(text);
    const where =
      offset >= 0 ? (({ line, column }) => ` at line ${line}, column ${column}`)(locationOf(text, offset)) : '';
    throw new CliError(`${path} is not valid JSON${where}: ${(e as Error).message}`);
  }
}

/** Parses an integer seed given on the command line (the schema checks its range). */
export function parseSeedOption(text: string): number {
  if (!/^\d+$/.test(text.trim())) throw new CliError(`--seed must be a whole number ≥ 0, not "${text}"`);
  return Number(text.trim());
}

/**
 * Validates and plans a case read from `source`. `seed` overrides the file's seed before validation (so its range
 * is checked like any other field). Throws CliError with one line per problem, each naming the field.
 */
export function validateAndPlan(
  raw: unknown,
  source: string,
  options: { seed?: number } = {},
): { caseData: Case; plan: Plan } {
  let input = raw;
  if (options.seed !== undefined && input !== null && typeof input === 'object' && !Array.isArray(input)) {
    input = { ...(input as Record<string, unknown>), seed: options.seed };
  }
  const parsed = parseCase(input);
  if (!parsed.ok)
    throw new CliError(`${source} is not a valid case:\n${parsed.errors.map((m) => `  ${m}`).join('\n')}`);
  const planned = plan(parsed.value);
  if (!planned.ok)
    throw new CliError(`${source} cannot run as set up:\n${planned.errors.map((m) => `  ${m}`).join('\n')}`);
  return { caseData: parsed.value, plan: planned.plan };
}

/** readJsonFile + validateAndPlan. */
export function loadCase(path: string, options: { seed?: number } = {}): { caseData: Case; plan: Plan } {
  return validateAndPlan(readJsonFile(path), path, options);
}
