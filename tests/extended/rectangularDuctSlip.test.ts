// Rectangular ducts near the slip regime (δ = 10, Kn = 0.0886), by the cross-section mode run as a user runs it
// (`tenuis preset rectangularDuct …`, `tenuis run … --replicas 2`): a square and an aspect ratio of 1/4. Minutes
// each, so outside npm test (`npm run validate:extended`).
//
// Reference: first-order slip on every wall (the project's finite-difference solution of the rectangle, checked in
// tests/validation/rectangularDuct.test.ts against the no-slip series and the planar limit), with the kinetic slip
// coefficient σ_P = 1.0162 ℓ (linearized BGK, diffuse walls; reference notes §6). The tolerance: the DSMC
// half-width plus the second-order slip term. Stated here: a second-order slip u_s = σ1 ℓ ∂u/∂n − σ2 ℓ² ∂²u/∂n², with
// ∂²u/∂n² ≈ −(−dp/dx)/μ on a straight wall, adds the same speed σ2 ℓ² (−dp/dx)/μ everywhere, i.e. 2σ2/δ to G_P; with
// Hadjiconstantinou's σ2 = 0.61 λ² = 0.479 ℓ² for hard spheres (Phys. Fluids 15:2352, 2003; reference notes §6, from
// memory) that is 0.096 at δ = 10. Hard spheres also differ from the BGK slip coefficient by about 2.5 % of σ_P
// (about 0.99 ℓ against 1.016 ℓ, notes §2, from memory), counted in the same bound.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const cli = join(repoRoot, 'dist-cli', 'tenuis.mjs');
const keep = process.env.TENUIS_EXTENDED_OUT;
const work = keep ?? mkdtempSync(join(tmpdir(), 'tenuis-extended-rect-'));
afterAll(() => {
  if (!keep) rmSync(work, { recursive: true, force: true });
});

const DELTA = 10;
const KNUDSEN = Math.sqrt(Math.PI) / (2 * DELTA);
const SECOND_ORDER = (2 * 0.479) / DELTA;
const SLIP_COEFFICIENT_SPREAD = 0.025 * 1.0162;

interface Summary {
  readonly flow: Record<string, { mean: number; ci95: number }>;
  readonly continuum: Record<string, Record<string, number>>;
}

function run(name: string, aspect: number, steps: number): Summary {
  const sets = ['gas=Ar', 'model=HS', `knudsen=${KNUDSEN}`, `aspectRatio=${aspect}`, `sampleSteps=${steps}`, 'seed=11'];
  const preset = spawnSync(process.execPath, [cli, 'preset', 'rectangularDuct', ...sets.flatMap((s) => ['--set', s])], {
    encoding: 'utf8',
  });
  if (preset.status !== 0) throw new Error(preset.stderr);
  mkdirSync(work, { recursive: true });
  const file = join(work, `${name}.json`);
  writeFileSync(file, preset.stdout);
  const out = join(work, name);
  const r = spawnSync(process.execPath, [cli, 'run', file, '--out', out, '--replicas', '2', '--quiet'], {
    encoding: 'utf8',
  });
  if (r.status !== 0) throw new Error(r.stderr);
  return JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8')) as Summary;
}

describe('rectangular duct at δ = 10: DSMC G_P against first-order slip', () => {
  for (const [name, aspect, steps] of [
    ['square', 1, 20_000],
    ['aspect-1-4', 0.25, 12_000],
  ] as const) {
    it(`${name}: within the half-width plus the second-order slip term and the slip-coefficient spread`, () => {
      const s = run(name, aspect, steps);
      const gp = s.flow.reducedFlowRate;
      const slip = s.continuum.firstOrder['flow.reducedFlowRate'];
      expect(gp.ci95 / gp.mean).toBeLessThan(0.03);
      expect(Math.abs(gp.mean - slip)).toBeLessThan(gp.ci95 + SECOND_ORDER + SLIP_COEFFICIENT_SPREAD);
      // And the no-slip series is far off: the data can tell the two apart.
      const noSlip = s.continuum.noSlip['flow.reducedFlowRate'];
      expect(gp.mean - noSlip).toBeGreaterThan(3 * gp.ci95);
    });
  }
});
