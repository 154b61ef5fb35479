/**
 * Flow numbers from a mass flow rate: each is a fixed multiple of ṁ (results/flowQuantities.ts), and flow.csv shows
 * them in SI and in the engineering units of vacuum practice, converted as engine/units/engineeringUnits.ts converts.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { flowResultOf } from '../../engine/results/flowQuantities';
import { flowCsv } from '../../engine/report/flowCsv';
import { convertFromSI, MOLECULES_PER_S_PER_SCCM } from '../../engine/units/engineeringUnits';
import type { IntegralEstimate } from '../../engine/stats/estimate';

const K_B = 1.380649e-23; // J/K, SI exact
const estimate = (mean: number, ci95: number): IntegralEstimate =>
  ({ mean, ci95, effectiveSamples: 100, correlationTimeSteps: 10, plateauFound: true }) as IntegralEstimate;

describe('flowResultOf()', () => {
  const plan = planOrThrow(
    buildPreset('tube', {
      gas: 'N2',
      radius: '2mm',
      knudsen: '0.5',
      pressureRatio: '3',
      lengthToRadius: '10',
      temperature: '300K',
    }),
  );
  const c = plan.caseData;
  const up = c.boundaries.left.type === 'reservoir' ? c.boundaries.left.pressurePa : NaN;
  const down = c.boundaries.right.type === 'reservoir' ? c.boundaries.right.pressurePa : NaN;
  const m = plan.gas.model.massKg;
  const mdot = 3e-9;
  const flow = flowResultOf(plan, {
    inlet: estimate(mdot, 1e-10),
    middle: estimate(mdot * 1.01, 1e-10),
    outlet: estimate(mdot, 1e-10),
  })!;
  const v = flow.values;

  it('uses the first section and the vessel pressures, with the ratio asked for', () => {
    expect(flow.section).toBe('inlet');
    expect(up / down).toBeCloseTo(3, 12);
  });
  it('throughput = ṁkT/m, conductance = throughput/Δp, sccm from the standard state (pV-flow definitions, common practice)', () => {
    expect(v.throughput!.mean).toBeCloseTo((mdot * K_B * 300) / m, 18);
    expect(v.conductance!.mean).toBeCloseTo((mdot * K_B * 300) / m / (up - down), 18);
    expect(v.molarFlow!.mean).toBeCloseTo(mdot / m / MOLECULES_PER_S_PER_SCCM, 12);
    expect(v.throughput!.ci95 / v.throughput!.mean).toBeCloseTo(1e-10 / mdot, 12);
  });
  it('transmission probability = ṁ over the free-molecular flow πR²Δp sqrt(m/(2πkT)); G_P = ṁ v0 L/(πR³ Δp)', () => {
    const fm = Math.PI * 2e-3 ** 2 * (up - down) * Math.sqrt(m / (2 * Math.PI * K_B * 300));
    expect(v.transmissionProbability!.mean).toBeCloseTo(mdot / fm, 12);
    const v0 = Math.sqrt((2 * K_B * 300) / m);
    expect(v.reducedFlowRate!.mean).toBeCloseTo((mdot * v0 * 20e-3) / (Math.PI * 2e-3 ** 3 * (up - down)), 12);
  });
  it("flow.csv: SI rows, then mbar L/s and L/s equal to the units module's conversion, and every section", () => {
    const lines = flowCsv(flow, false).trimEnd().split('\n');
    expect(lines[0]).toBe('quantity,unit,mean,ci95');
    const row = (q: string, unit: string) =>
      lines
        .find((l) => l.startsWith(`${q},${unit},`))!
        .split(',')
        .map((x, k) => (k > 1 ? Number(x) : x));
    expect(row('throughput', 'mbar L/s')[2]).toBeCloseTo(convertFromSI(v.throughput!.mean, 'mbar·L/s'), 15);
    expect(row('conductance', 'L/s')[2]).toBeCloseTo(convertFromSI(v.conductance!.mean, 'L/s'), 12);
    expect(row('sections.middle.massFlowRate', 'kg/s')[2]).toBeCloseTo(mdot * 1.01, 20);
  });
});
