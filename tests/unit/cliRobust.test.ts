/**
 * The command line's edges against hostile or mistaken input (issue 12): a case file read with a size limit, an
 * output folder checked before the run, results kept when writing them fails, user text printed safely, a
 * 10⁷-cell case refused at once. Each spawns the built CLI (dist-cli/, built by tests/setup) or calls its module.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { writeResultsAtomically } from '../../cli/writeResults';
import { printable } from '../../cli/printable';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');
const work = mkdtempSync(join(tmpdir(), 'tenuis-robust-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function tenuis(args: string[], timeout = 30_000) {
  const r = spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', timeout });
  return { code: r.status, signal: r.signal, stdout: r.stdout ?? '', stderr: r.stderr ?? '' };
}
function caseFile(name: string, input: unknown): string {
  const path = join(work, name);
  writeFileSync(path, JSON.stringify(input));
  return path;
}

describe('tenuis at its edges', () => {
  it('finding 7: /dev/zero as the case file is refused, saying the 64 MB limit', () => {
    const r = tenuis(['check', '/dev/zero']);
    expect(r.signal).toBeNull();
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/cannot read \/dev\/zero: it is larger than 64 MB, the limit for a case file/);
  });

  it('finding 8: --out /proc/x is refused before the run starts', () => {
    const path = caseFile('couette.json', buildPreset('couette'));
    const t0 = Date.now();
    const r = tenuis(['run', path, '--out', '/proc/x', '--quiet']);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/--out \/proc\/x: cannot create or write a folder in \/proc/);
    expect(r.stderr).not.toMatch(/internal error/);
    expect(Date.now() - t0).toBeLessThan(10_000);
  });

  it('finding 8: results that cannot be written are kept in a temporary folder, and the message says where', () => {
    const blocker = join(work, 'a-file');
    writeFileSync(blocker, '');
    let message = '';
    try {
      writeResultsAtomically(join(blocker, 'out'), { 'summary.json': '{}\n' });
    } catch (e) {
      message = (e as Error).message;
    }
    const kept = /they are kept in (\S+)$/.exec(message)?.[1];
    expect(kept, message).toBeDefined();
    expect(readdirSync(kept!)).toEqual(['summary.json']);
    rmSync(kept!, { recursive: true, force: true });
  });

  it('finding 9: escape sequences in the case name are printed escaped by check and run', () => {
    const name = 'evil \u001b[2J\u001b]0;title\u0007 case';
    const path = caseFile('evil.json', { ...buildPreset('couette'), name });
    const check = tenuis(['check', path]);
    expect(check.code, check.stderr).toBe(0);
    expect(check.stdout).toContain('case "evil \\x1b[2J\\x1b]0;title\\x07 case": valid');
    expect(check.stdout.includes(String.fromCharCode(27))).toBe(false);
    const bad = caseFile('evil-bad.json', { ...buildPreset('couette'), name, initial: { pressurePa: -1 } });
    const run = tenuis(['run', bad, '--out', join(work, 'never')]);
    expect(run.code).toBe(1);
    expect(run.stderr.includes(String.fromCharCode(27))).toBe(false);
    expect(printable('a\u001bb\u009bc\nd')).toBe('a\\x1bb\\x9bc\nd');
  });

  it('finding 6: check of a 10⁷-cell case is refused quickly, naming the limit', () => {
    const path = caseFile('huge.json', {
      ...buildPreset('cavity'),
      numerics: { cellsX: 4000, cellsY: 2500, particlesPerCell: 1 },
    });
    const t0 = Date.now();
    const r = tenuis(['check', path]);
    const ms = Date.now() - t0;
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/numerics\.cellsX\/cellsY: 4000 × 2500 cells, more than the limit of 2000000 cells/);
    expect(ms).toBeLessThan(5_000); // was 19 s, "valid", "memory about 102 GB" (issue 12)
    expect(existsSync(path)).toBe(true);
  });
});
