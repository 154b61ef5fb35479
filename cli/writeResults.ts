/**
 * Writes result files so that a run leaves either all of them or none: everything goes into a temporary sibling
 * folder first, which is renamed into place at the end (same parent, hence same file system, so rename is atomic).
 * When the output folder already exists, each file is renamed into it one by one — files of other names in it are
 * left alone, and each replaced file is swapped atomically.
 */
import { existsSync, mkdirSync, mkdtempSync, renameSync, rmSync, rmdirSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, dirname, join, resolve } from 'node:path';
import { CliError } from './errors';

/**
 * Checks, before a run starts, that `dir` can become the output folder: it is not a file, no existing ancestor is a
 * file, and a folder can be created in the nearest existing one (tried with an empty folder, removed at once), so
 * that `--out /proc/x` or a read-only disk is refused before hours of computing, not after.
 */
export function checkOutputDir(dir: string): void {
  const p = resolve(dir);
  if (existsSync(p) && !statSync(p).isDirectory()) throw new CliError(`--out ${dir}: exists and is not a folder`);
  let existing = p;
  while (!existsSync(existing)) {
    const parent = dirname(existing);
    if (parent === existing) break;
    existing = parent;
  }
  if (existsSync(existing) && !statSync(existing).isDirectory())
    throw new CliError(`--out ${dir}: ${existing} is a file, not a folder`);
  try {
    rmdirSync(mkdtempSync(join(existing, '.tenuis-write-test-')));
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code ?? (e as Error).message;
    throw new CliError(`--out ${dir}: cannot create or write a folder in ${existing} (${code}); choose another folder`);
  }
}

/**
 * Keeps files that could not be written where asked in a new folder under the system's temporary folder; returns
 * its path, or null when even that fails.
 */
function keepElsewhere(files: Readonly<Record<string, string>>): string | null {
  try {
    const rescue = mkdtempSync(join(tmpdir(), 'tenuis-results-'));
    for (const [name, text] of Object.entries(files)) writeFileSync(join(rescue, name), text, 'utf8');
    return rescue;
  } catch {
    return null;
  }
}

/** Writes `files` (name → text, UTF-8) into `dir` all together or not at all. */
export function writeResultsAtomically(dir: string, files: Readonly<Record<string, string>>): void {
  const target = resolve(dir);
  const parent = dirname(target);
  let staging: string;
  try {
    mkdirSync(parent, { recursive: true });
    staging = mkdtempSync(join(parent, `.${basename(target)}.partial-`));
  } catch (e) {
    throw notWritten(dir, e, files);
  }
  try {
    for (const [name, text] of Object.entries(files)) writeFileSync(join(staging, name), text, 'utf8');
    if (!existsSync(target)) {
      renameSync(staging, target);
      return;
    }
    for (const name of Object.keys(files)) renameSync(join(staging, name), join(target, name));
    rmSync(staging, { recursive: true, force: true });
  } catch (e) {
    rmSync(staging, { recursive: true, force: true });
    throw notWritten(dir, e, files);
  }
}

/** The error of results that could not be written: they are kept in a temporary folder, and the message says where. */
function notWritten(dir: string, e: unknown, files: Readonly<Record<string, string>>): CliError {
  const rescue = keepElsewhere(files);
  return new CliError(
    `could not write the results into ${dir}: ${(e as Error).message}; ${rescue ? `they are kept in ${rescue}` : 'nor into the temporary folder: they are lost'}`,
  );
}

/** Writes one binary file via a temporary sibling and a rename, so it is either complete or absent. */
export function writeBinaryAtomically(path: string, data: ArrayBuffer): void {
  const target = resolve(path);
  mkdirSync(dirname(target), { recursive: true });
  const temp = `${target}.partial-${process.pid}`;
  try {
    writeFileSync(temp, new Uint8Array(data));
    renameSync(temp, target);
  } catch (e) {
    rmSync(temp, { force: true });
    throw new CliError(`could not write ${path}: ${(e as Error).message}`);
  }
}
