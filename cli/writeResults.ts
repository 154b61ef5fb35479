/**
 * Writes result files so that a run leaves either all of them or none: everything goes into a temporary sibling
 * folder first, which is renamed into place at the end (same parent, hence same file system, so rename is atomic).
 * When the output folder already exists, each file is renamed into it one by one — files of other names in it are
 * left alone, and each replaced file is swapped atomically.
 */
import { existsSync, mkdirSync, mkdtempSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { CliError } from './errors';

/**
 * Checks, before a run starts, that `dir` can become the output folder: it is not a file, and no existing ancestor
 * is a file. Creates nothing.
 */
export function checkOutputDir(dir: string): void {
  let p = resolve(dir);
  if (existsSync(p) && !statSync(p).isDirectory()) throw new CliError(`--out ${dir}: exists and is not a folder`);
  for (;;) {
    const parent = dirname(p);
    if (parent === p) return;
    p = parent;
    if (existsSync(p)) {
      if (!statSync(p).isDirectory()) throw new CliError(`--out ${dir}: ${p} is a file, not a folder`);
      return;
    }
  }
}

/** Writes `files` (name → text, UTF-8) into `dir` all together or not at all. */
export function writeResultsAtomically(dir: string, files: Readonly<Record<string, string>>): void {
  const target = resolve(dir);
  const parent = dirname(target);
  mkdirSync(parent, { recursive: true });
  const staging = mkdtempSync(join(parent, `.${basename(target)}.partial-`));
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
    throw new CliError(`could not write the results into ${dir}: ${(e as Error).message}`);
  }
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
