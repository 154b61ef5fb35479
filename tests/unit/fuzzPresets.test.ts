/**
 * A seeded fuzz of the case file over every preset (issue 12): each preset's case is mutated — a number scaled by a
 * huge or tiny factor (or made 0 or negative), two sides swapped, a field deleted — and parse + plan must either
 * refuse it with messages that each name a field, or give a plan whose numbers are finite and within the memory
 * budget; never throw. A few accepted cases also run a few steps, which must end cleanly with every particle inside
 * the domain. Fixed seed, so a failure reproduces; TENUIS_FUZZ_SEED / TENUIS_FUZZ_RUNS explore further.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildPreset, presetNames } from '../../engine/case/presets';
import { planFromInput, type Plan } from '../../engine/plan/plan';
import { createSimulation, advance } from '../../engine/run/simulation';

const SEED = Number(process.env.TENUIS_FUZZ_SEED ?? 20261203);
const RUNS = Number(process.env.TENUIS_FUZZ_RUNS ?? 1000);
/** A budget small enough that no accepted case takes long to plan or to start (2e9 bytes ≈ 4.7e5 cells). */
const BUDGET_BYTES = 2e9;
/** A message names a field when it starts with the field's dotted path (or (case) for the whole file). */
const NAMES_A_FIELD =
  /^(\(case\)|schemaVersion|name|description|gas|initial|domain|boundaries|blocks|flowSections|flowReport|bodyAccelerationXMPerS2|bodyAccelerationZMPerS2|numerics|sampling|seed)\b/;
const FACTORS = [1e-300, 1e-30, 1e-9, 1e-3, 0, -1, 0.5, 2, 1e3, 1e9, 1e30, 1e154, 1e300];
const SIDES = ['left', 'right', 'bottom', 'top'] as const;

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
const BASES: { name: string; json: Json }[] = presetNames().map((name) => ({
  name,
  json: JSON.parse(JSON.stringify(buildPreset(name))) as Json,
}));

/** Every path to a leaf (numbers for scaling, anything for deleting). */
function leaves(v: Json, at: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  if (v !== null && typeof v === 'object') {
    const entries = Array.isArray(v) ? v.map((x, i) => [i, x] as const) : Object.entries(v);
    for (const [k, x] of entries) leaves(x, [...at, k], out);
  } else out.push(at);
  return out;
}
function parentOf(root: Json, path: (string | number)[]): Record<string | number, Json> {
  let o = root as Record<string | number, Json>;
  for (const k of path.slice(0, -1)) o = o[k] as Record<string | number, Json>;
  return o;
}

type Mutation =
  | { kind: 'scale'; leaf: number; factor: number }
  | { kind: 'swap'; a: number; b: number }
  | { kind: 'delete'; leaf: number };
const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  {
    weight: 6,
    arbitrary: fc.record({ kind: fc.constant('scale' as const), leaf: fc.nat(), factor: fc.constantFrom(...FACTORS) }),
  },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('swap' as const), a: fc.nat(3), b: fc.nat(3) }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('delete' as const), leaf: fc.nat() }) },
);

function mutate(base: Json, ms: Mutation[]): Json {
  const c = structuredClone(base) as Json;
  for (const m of ms) {
    if (m.kind === 'swap') {
      const b = (c as { boundaries: Record<string, Json> }).boundaries;
      [b[SIDES[m.a]], b[SIDES[m.b]]] = [b[SIDES[m.b]], b[SIDES[m.a]]];
      continue;
    }
    const all = leaves(c);
    const paths = m.kind === 'scale' ? all.filter((p) => typeof parentOf(c, p)[p.at(-1)!] === 'number') : all;
    if (paths.length === 0) continue;
    const path = paths[m.leaf % paths.length];
    const parent = parentOf(c, path);
    const key = path.at(-1)!;
    if (m.kind === 'scale') parent[key] = (parent[key] as number) * m.factor;
    else if (Array.isArray(parent)) parent.splice(key as number, 1);
    else delete parent[key];
  }
  return c;
}

function expectUsablePlan(p: Plan): void {
  for (const [what, v] of [
    ['timeStepS', p.timeStepS],
    ['moleculesPerParticle', p.moleculesPerParticle],
    ['initialParticles', p.initialParticles],
    ['memoryBytesEstimate', p.memoryBytesEstimate],
    ['transientSteps', p.transientSteps + 1],
    ['sampleSteps', p.sampleSteps],
    ['cellVolumeM3', p.grid.cellVolumeM3],
    ['meanFreePathM', p.reference.meanFreePathM],
    ['meanCollisionTimeS', p.reference.meanCollisionTimeS],
  ] as const)
    expect(Number.isFinite(v) && v > 0, `${what} = ${v}`).toBe(true);
  expect(p.initialParticles).toBeLessThanOrEqual(p.caseData.numerics.maxParticles);
  expect(p.memoryBytesEstimate).toBeLessThanOrEqual(BUDGET_BYTES);
}

describe('fuzz over every preset (seeded)', () => {
  it('parse + plan refuses with messages naming a field, or gives a finite plan within the budget', () => {
    const short: Plan[] = [];
    fc.assert(
      fc.property(fc.nat(BASES.length - 1), fc.array(mutation, { minLength: 1, maxLength: 3 }), (b, ms) => {
        const input = mutate(BASES[b].json, ms);
        const r = planFromInput(input, { memoryBudgetBytes: BUDGET_BYTES });
        if (!r.ok) {
          expect(r.errors.length).toBeGreaterThan(0);
          for (const e of r.errors) expect(e, `${BASES[b].name} ${JSON.stringify(ms)}`).toMatch(NAMES_A_FIELD);
          return;
        }
        expectUsablePlan(r.plan);
        if (short.length < 8 && r.plan.initialParticles <= 20_000 && r.plan.grid.cellsX * r.plan.grid.cellsY <= 20_000)
          short.push(r.plan);
      }),
      { seed: SEED, numRuns: RUNS, endOnFailure: true },
    );
    // A few accepted mutants run 20 steps: they end, with every particle finite and inside the domain.
    expect(short.length).toBeGreaterThan(2);
    for (const p of short) {
      const sim = createSimulation(p);
      advance(sim, 20);
      const st = sim.state;
      expect(st.count).toBeLessThanOrEqual(p.caseData.numerics.maxParticles);
      for (let i = 0; i < st.count; i++) {
        const inside = st.x[i] >= 0 && st.x[i] <= st.lengthX && st.y[i] >= 0 && st.y[i] <= st.lengthY;
        if (!inside)
          throw new Error(`${p.caseData.name}: particle ${i} at (${st.x[i]}, ${st.y[i]}) outside the domain`);
        if (!Number.isFinite(st.vx[i] + st.vy[i] + st.vz[i]))
          throw new Error(`${p.caseData.name}: particle ${i} speed not finite`);
      }
      expect(st.leaks).toBe(0);
    }
  });
});
