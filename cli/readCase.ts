/**
 * Reading a case file at the edge: file → JSON.parse (never eval) → parseCase → plan, with messages a user can act on.
 * The file is read with a size limit (a case file is a few kilobytes; `/dev/zero` or a log file passed by mistake must
 * not grow the process without end), and the plan is checked against the machine's memory, which only the command
 * line knows (os.totalmem()); the engine takes it as a plain number.
 */
import { closeSync, openSync, readSync } from 'node:fs';
import { totalmem } from 'node:os';
import { parseCase, type Case } from '../engine/case/schema';
import { plan, type Plan } from '../engine/plan/plan';
import { CliError } from './errors';
import { jsonErrorOffset, locationOf } from './jsonErrorLocation';

/** Largest case, sample or checkpoint file read as JSON (bytes). */
export const MAX_JSON_FILE_BYTES = 64 * 1024 * 1024;

/** Reads at most limitBytes + 1 bytes (so it sees the file is larger), from files, pipes and devices alike. */
function readLimited(path: string, limitBytes: number): string {
  const fd = openSync(path, 'r');
  try {
    const chunks: Buffer[] = [];
    let total = 0;
    const chunk = Buffer.allocUnsafe(1 << 20);
    for (;;) {
      const n = readSync(fd, chunk, 0, chunk.length, null);
      if (n === 0) break;
      chunks.push(Buffer.from(chunk.subarray(0, n)));
      total += n;
      if (total > limitBytes)
        throw new CliError(
          `cannot read ${path}: it is larger than ${limitBytes / (1024 * 1024)} MB, the limit for a case file (a case file is a few kilobytes of JSON)`,
        );
    }
    return Buffer.concat(chunks).toString('utf8');
  } finally {
    closeSync(fd);
  }
}

/** Reads and parses a JSON file; throws CliError naming the file and, for bad JSON, the line and column. */
export function readJsonFile(path: string): unknown {
  let text: string;
  try {
    text = readLimited(path, MAX_JSON_FILE_BYTES);
  } catch (e) {
    if (e instanceof CliError) throw e;
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
  // The machine's memory, less a share for the system and the process itself.
  const planned = plan(parsed.value, { memoryBudgetBytes: 0.8 * totalmem() });
  if (!planned.ok)
    throw new CliError(`${source} cannot run as set up:\n${planned.errors.map((m) => `  ${m}`).join('\n')}`);
  return { caseData: parsed.value, plan: planned.plan };
}

/** readJsonFile + validateAndPlan. */
export function loadCase(path: string, options: { seed?: number } = {}): { caseData: Case; plan: Plan } {
  return validateAndPlan(readJsonFile(path), path, options);
}
