// The verdict's tolerance from the case (comparison.tolerance): every comparison honours it, the schema names the
// field when it is out of range. Issue 13: "with the user's tolerance ε (default 2 %)".
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { parseCase } from '../../engine/case/schema';
import { planFromInput } from '../../engine/plan/plan';
import { createSimulation, runToCompletion } from '../../engine/run/simulation';
import { summarize } from '../../engine/run/simulationSamples';
import { continuumComparisonOf } from '../../engine/report/comparison';

function shortCouette(tolerance?: number) {
  const c = buildPreset('couette', { knudsen: '1', particlesPerCell: '20', transientSteps: '100', sampleSteps: '400' });
  const input = tolerance === undefined ? c : { ...c, comparison: { tolerance } };
  const p = planFromInput(input);
  if (!p.ok) throw new Error(p.errors.join('\n'));
  const sim = createSimulation(p.plan);
  runToCompletion(sim);
  const comparison = continuumComparisonOf(p.plan, summarize(sim));
  if (!comparison.recognised) throw new Error(comparison.reason);
  return comparison;
}

describe('comparison.tolerance', () => {
  it('sets the tolerance of every verdict; without it the default 2 % holds', () => {
    const wide = shortCouette(0.5);
    const plain = shortCouette();
    for (const v of Object.values(wide.verdict)) if (v.status !== 'noData') expect(v.tolerance).toBe(0.5);
    for (const v of Object.values(plain.verdict)) if (v.status !== 'noData') expect(v.tolerance).toBe(0.02);
  });

  it('is refused outside (0, 1], naming the field', () => {
    const base = buildPreset('couette', {});
    for (const tolerance of [0, -0.1, 2]) {
      const r = parseCase({ ...base, comparison: { tolerance } });
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.errors.join('\n')).toMatch(/comparison\.tolerance/);
    }
  });
});
