#!/usr/bin/env node
// `npm run coefficients [-- --only channel|tube] [--time-cap S] [--replicas R]`: computes the built-in coefficient tables of
// engine/longDuct/tables/ again with Tenuis's own DSMC (tenuis coefficients: a sweep of force-driven runs over the
// rarefaction), hard-sphere argon, diffuse walls, δ from 0.01 to 10 at 7 points. Not part of npm test: each table
// takes a quarter to half an hour on one core. DEVELOPERS.md ("Built-in coefficient tables") says what they hold.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';

const root = fileURLToPath(new URL('..', import.meta.url));
const tenuis = join(root, 'bin', 'tenuis.mjs');
const TABLES = [
  { shape: 'channel', preset: 'poiseuille', file: 'channel-argon-hard-sphere.json' },
  { shape: 'tube', preset: 'forceDrivenTube', file: 'tube-argon-hard-sphere.json' },
];
const { values } = parseArgs({
  options: { only: { type: 'string' }, 'time-cap': { type: 'string' }, replicas: { type: 'string' } },
});
const cap = values['time-cap'] ?? '1200';
const replicas = values.replicas ?? '1';
const wanted = TABLES.filter((t) => !values.only || t.shape === values.only);
if (!wanted.length) {
  process.stderr.write(`--only ${values.only}: give one of ${TABLES.map((t) => t.shape).join(', ')}\n`);
  process.exit(2);
}
const [from, to, points] = ['0.01', '10', '7'];
for (const t of wanted) {
  const work = mkdtempSync(join(tmpdir(), 'tenuis-coefficients-'));
  try {
    const preset = JSON.parse(
      execFileSync(
        process.execPath,
        [tenuis, 'preset', t.preset, '--set', 'gas=Ar', '--set', 'model=HS', '--set', 'seed=2026'],
        {
          encoding: 'utf8',
        },
      ),
    );
    // Each point's cells are left to the planner (λ/3), so that the dense end is resolved as well as the thin one.
    delete preset.numerics.cellsX;
    delete preset.numerics.cellsY;
    preset.name = `${t.shape} Ar HS diffuse (built-in coefficient table)`;
    const casePath = join(work, `${t.shape}.json`);
    writeFileSync(casePath, `${JSON.stringify(preset, null, 2)}\n`);
    const out = join(work, t.file);
    execFileSync(
      process.execPath,
      [
        tenuis,
        'coefficients',
        casePath,
        '--from',
        from,
        '--to',
        to,
        '--points',
        points,
        '--time-cap',
        cap,
        '--out',
        out,
      ],
      { stdio: 'inherit' },
    );
    const table = JSON.parse(readFileSync(out, 'utf8'));
    table.source = `${table.source.replace(/ \(every point in .*\)$/, '')} (${points} points, δ ${from}–${to}, time cap ${cap} s, ${replicas} replica${replicas === '1' ? '' : 's'} per point; npm run coefficients)`;
    writeFileSync(join(root, 'engine', 'longDuct', 'tables', t.file), `${JSON.stringify(table, null, 2)}\n`);
    process.stderr.write(`written engine/longDuct/tables/${t.file}\n`);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}
