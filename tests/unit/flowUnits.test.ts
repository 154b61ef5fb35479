/**
 * The units a flow number can be shown in (engine/units/flowUnits.ts), checked against their exact definitions, and
 * the browser's flow CSV with the chosen units as extra columns (engine/report/flowCsv.ts), which must leave the
 * command line's file as it was when no units are chosen.
 */
import { describe, expect, it } from 'vitest';
import { FLOW_UNIT_CHOICES, flowUnitLabel, flowValueIn, FLOW_UNIT_QUANTITIES } from '../../engine/units/flowUnits';
import { convertFromSI, parseQuantity } from '../../engine/units/engineeringUnits';
import { flowCsv } from '../../engine/report/flowCsv';
import type { FlowResult } from '../../engine/results/flowQuantities';
import type { IntegralEstimate } from '../../engine/stats/estimate';

const rel = (a: number, b: number, tol = 1e-12) => expect(Math.abs(a - b) / Math.abs(b)).toBeLessThan(tol);

describe('flow units', () => {
  it('throughput: 1 mbar·L/s = 0.1 Pa·m³/s, 1 Torr·L/s = 101325/760 × 1e-3 Pa·m³/s, 1 Pa·L/s = 1e-3 Pa·m³/s (SI brochure, NIST SP 811 B.8: exact)', () => {
    rel(flowValueIn('throughput', 0.1, 'mbar·L/s'), 1);
    rel(flowValueIn('throughput', (101325 / 760) * 1e-3, 'Torr·L/s'), 1);
    rel(flowValueIn('throughput', 1e-3, 'Pa·L/s'), 1);
    rel(flowValueIn('throughput', 2.5, 'Pa·m³/s'), 2.5);
  });
  it('conductance: 1 L/s = 1e-3 m³/s, 1 m³/h = 1/3600 m³/s (exact by definition)', () => {
    rel(flowValueIn('conductance', 1e-3, 'L/s'), 1);
    rel(flowValueIn('conductance', 1 / 3600, 'm³/h'), 1);
  });
  it('molar flow: 1 slm = 1000 sccm; 1 sccm = 101325 Pa × 1 cm³ /(R × 273.15 K) per minute (sccm at 0 °C and 101 325 Pa, the project’s reference; common practice)', () => {
    rel(flowValueIn('molarFlow', 1000, 'slm'), 1);
    // R = k N_A = 8.314462618 J/(mol K) (SI 2019, exact product); molar volume at 0 °C, 1 atm = 22.413969 L/mol (CODATA 2018).
    const molPerSecondPerSccm = (101325 * 1e-6) / (8.314462618 * 273.15) / 60;
    rel(flowValueIn('molarFlow', 1, 'mol/s'), molPerSecondPerSccm, 1e-9);
    rel(1 / flowValueIn('molarFlow', 1, 'mol/s'), (22.413969e-3 * 1e6 * 60) / 1, 1e-7);
  });
  it('mass flow: 1 mg/s = 1e-6 kg/s, 1 g/h = 1e-3/3600 kg/s (exact)', () => {
    rel(flowValueIn('massFlowRate', 1e-6, 'mg/s'), 1);
    rel(flowValueIn('massFlowRate', 1e-3 / 3600, 'g/h'), 1);
  });
  it('every choice except sccm, slm and mol/s agrees with the parser of engineeringUnits.ts', () => {
    for (const q of FLOW_UNIT_QUANTITIES)
      for (const c of FLOW_UNIT_CHOICES[q]) {
        if (q === 'molarFlow') continue;
        rel(flowValueIn(q, 1, c.unit), convertFromSI(1, c.unit));
        rel(parseQuantity(`1 ${c.unit}`, q === 'massFlowRate' ? 'massFlow' : q), c.engineUnitsPerUnit);
      }
  });
  it('refuses a unit of another quantity, naming the allowed ones; planar units are per metre', () => {
    expect(() => flowValueIn('conductance', 1, 'sccm')).toThrow(/allowed: m³\/s, L\/s, m³\/h/);
    expect(flowUnitLabel('L/s', true)).toBe('L/s/m');
  });
});

describe('flowCsv() with chosen units', () => {
  const estimate = (mean: number, ci95: number) =>
    ({ mean, ci95, effectiveSamples: 100, correlationTimeSteps: 10, plateauFound: true }) as IntegralEstimate;
  const flow: FlowResult = {
    section: 'inlet',
    sections: { inlet: estimate(3e-9, 1e-10) },
    values: {
      massFlowRate: { mean: 3e-9, ci95: 1e-10 },
      throughput: { mean: 2e-4, ci95: 1e-5 },
      molarFlow: { mean: 0.15, ci95: 0.01 },
      conductance: { mean: 4e-4, ci95: 2e-5 },
      transmissionProbability: { mean: 0.4, ci95: 0.01 },
    },
    upstreamPressurePa: 1,
    downstreamPressurePa: 0.5,
    temperatureK: 300,
    perDepth: false,
  };
  it('without the option the file is the command line’s (four columns)', () => {
    const lines = flowCsv(flow, false).trimEnd().split('\n');
    expect(lines[0]).toBe('quantity,unit,mean,ci95');
    expect(lines.every((l) => l.split(',').length === 4)).toBe(true);
  });
  it('with chosen units each SI row carries them beside SI, the other rows leave them empty', () => {
    const text = flowCsv(flow, false, { chosenUnits: { throughput: 'mbar·L/s', conductance: 'L/s' } });
    const lines = text.trimEnd().split('\n');
    expect(lines[0]).toBe('quantity,unit,mean,ci95,chosen unit,chosen mean,chosen ci95');
    const cells = (prefix: string) => lines.find((l) => l.startsWith(prefix))!.split(',');
    const t = cells('throughput,Pa m^3/s,');
    expect(t[4]).toBe('mbar·L/s');
    rel(Number(t[5]), 2e-3);
    rel(Number(t[6]), 1e-4);
    const c = cells('conductance,m^3/s,');
    expect(c[4]).toBe('L/s');
    rel(Number(c[5]), 0.4);
    expect(cells('massFlowRate,').slice(4)).toEqual(['', '', '']);
    expect(lines.every((l) => l.split(',').length === 7)).toBe(true);
    // The SI columns are unchanged by the option.
    const plain = flowCsv(flow, false).trimEnd().split('\n');
    expect(lines.slice(1).map((l) => l.split(',').slice(0, 4).join(','))).toEqual(plain.slice(1));
  });
});
