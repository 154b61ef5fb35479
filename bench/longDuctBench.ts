/**
 * Long-duct solver timings for `npm run bench` (issue 14's goals: one solve with a table under 10 ms, a 50-point
 * conductance curve under 0.5 s): medians over repeats of the isothermal solve, the thermal-creep ODE solve and the
 * conductance curve on a linearized BGK channel table (the project's reference notes §2) and a free-molecular tube.
 */
import { modelFromSpecies } from '../engine/gas/molecularModel';
import type { CoefficientTable } from '../engine/longDuct/coefficientTable';
import { solveIsothermalDuct } from '../engine/longDuct/isothermalDuct';
import { solveDuctFlow } from '../engine/longDuct/ductFlow';
import { conductanceCurve } from '../engine/longDuct/conductanceCurve';

const BGK_CHANNEL: CoefficientTable = {
  shape: 'channel',
  source: 'linearized BGK (reference notes §2)',
  gasAndWall: 'BGK model, diffuse walls',
  points: [
    [0.01, 3.04965],
    [0.1, 2.03271],
    [1, 1.53868],
    [10, 2.76864],
    [100, 17.6933],
  ].map(([rarefaction, reducedFlowRate]) => ({ rarefaction, reducedFlowRate, reducedFlowRateCi95: 0.01 })),
};

export interface LongDuctTimings {
  readonly isothermalSolveMs: number;
  readonly odeSolveMs: number;
  readonly conductanceCurve50Ms: number;
}

function medianMs(run: () => void, repeats: number): number {
  run();
  const times: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[times.length >> 1];
}

export function measureLongDuct(repeats = 5): LongDuctTimings {
  const gas = modelFromSpecies('N2', 'VHS');
  const geometry = { shape: 'channel' as const, gapM: 1e-6, widthM: 1, lengthM: 1e-3 };
  const common = { geometry, gas, table: BGK_CHANNEL };
  return {
    isothermalSolveMs: medianMs(
      () => solveIsothermalDuct({ ...common, temperatureK: 300, upstreamPressurePa: 3e5, downstreamPressurePa: 1e4 }),
      repeats,
    ),
    odeSolveMs: medianMs(
      () =>
        solveDuctFlow({
          ...common,
          upstreamTemperatureK: 300,
          downstreamTemperatureK: 300,
          upstreamPressurePa: 3e5,
          downstreamPressurePa: 1e4,
        }),
      repeats,
    ),
    conductanceCurve50Ms: medianMs(
      () =>
        conductanceCurve({
          ...common,
          temperatureK: 300,
          upstreamPressuresPa: Array.from({ length: 50 }, (_, k) => 100 * 1e4 ** (k / 49)),
          ratio: 0.5,
        }),
      repeats,
    ),
  };
}
