/**
 * Pressure-driven ducts between reservoirs: in a steady run every cross-section carries the same mass flow within
 * the error bars (mass conservation: common practice, no source), for a planar channel cut out of two blocks
 * between two vessel regions and for an axisymmetric tube; and a pressure outlet (Wang & Li 2004 characteristic
 * relations, kernel/pressureOutlet.ts) holds the pressure at the duct's end.
 * Differences between sections are checked against the combined 95 % half-widths (the sections' errors are
 * positively correlated, so that bound is conservative).
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { runToEnd } from '../support/planOrThrow';
import { summarize } from '../../engine/run/simulationSamples';
import type { IntegralEstimate } from '../../engine/stats/estimate';
import { field } from './runGapPreset';

function expectSameFlow(sections: Readonly<Record<string, IntegralEstimate>>): void {
  const all = Object.values(sections);
  expect(all.length).toBeGreaterThanOrEqual(3);
  for (const a of all) {
    expect(a.mean).toBeGreaterThan(0);
    expect(a.ci95 / a.mean).toBeLessThan(0.1);
    for (const b of all) expect(Math.abs(a.mean - b.mean)).toBeLessThanOrEqual(Math.hypot(a.ci95, b.ci95));
  }
}

describe('pressure-driven ducts', () => {
  it('planar channel between vessels: the same mass flow through inlet, middle and outlet; no leaks', () => {
    const sim = runToEnd(
      buildPreset('channel', {
        knudsen: '1',
        lengthToGap: '3',
        gap: '1um',
        particlesPerCell: '15',
        sampleSteps: '3000',
        seed: '7',
      }),
    );
    expectSameFlow(summarize(sim).flow!.sections);
    expect(sim.state.leaks).toBe(0);
  });

  it('round tube between vessels (axisymmetric): the same mass flow through every section', () => {
    const sim = runToEnd(
      buildPreset('tube', {
        knudsen: '1',
        lengthToRadius: '3',
        radius: '1mm',
        particlesPerCell: '20',
        sampleSteps: '8000',
        seed: '7',
      }),
    );
    expectSameFlow(summarize(sim).flow!.sections);
    expect(sim.state.leaks).toBe(0);
  });

  it('a pressure outlet holds the pressure of the last cells at its value, where a reservoir end leaves a jump', () => {
    const c = buildPreset('channel', {
      knudsen: '0.5',
      lengthToGap: '4',
      vesselLengthToGap: '0',
      gap: '1um',
      cellsY: '10',
      particlesPerCell: '30',
      sampleSteps: '4000',
      seed: '2',
    });
    const right = c.boundaries.right;
    if (right.type !== 'reservoir') throw new Error('the channel preset ends in reservoirs');
    const target = right.pressurePa;
    c.boundaries.right = { type: 'pressureOutlet', pressurePa: target };
    const sim = runToEnd(c);
    const result = summarize(sim);
    expectSameFlow(result.flow!.sections);
    // The last column of cells, averaged over the gap: its pressure with its half-width.
    const nx = sim.state.cellsX;
    let p = 0;
    let ci = 0;
    for (let j = 0; j < sim.state.cellsY; j++) {
      const f = field(result.cells, 'pressure', j * nx + nx - 1);
      p += f.mean / sim.state.cellsY;
      ci += (f.ci95 / sim.state.cellsY) ** 2;
    }
    // Half a cell from the end the pressure still falls along the duct (about 0.4 % per cell here): 1 % allowance.
    expect(Math.abs(p - target)).toBeLessThan(Math.sqrt(ci) + 0.01 * target);
  });
});
