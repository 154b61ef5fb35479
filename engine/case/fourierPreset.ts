/**
 * Preset `fourier`: planar Fourier heat conduction, gas at rest between a cold bottom wall and a hot top wall
 * (gapCase.ts), its Knudsen number at the mean wall temperature.
 */
import { formatQuantity } from '../units/engineeringUnits';
import {
  type Preset,
  gasParameter,
  modelParameter,
  knudsenParameter,
  gapParameter,
  numericsParameters,
} from './presetParameters';
import { gapCase } from './gapCase';

export const fourier: Preset = {
  name: 'fourier',
  description: 'planar Fourier heat conduction: gas at rest between a cold bottom wall and a hot top wall',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, description: `${knudsenParameter.description}, at the mean wall temperature` },
    gapParameter,
    {
      name: 'hotTemperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 283,
      min: 0,
      exclusiveMin: true,
      description: 'top wall temperature',
    },
    {
      name: 'coldTemperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 263,
      min: 0,
      exclusiveMin: true,
      description: 'bottom wall temperature',
    },
    ...numericsParameters,
  ],
  build(v) {
    const hot = v.hotTemperature as number;
    const cold = v.coldTemperature as number;
    const mean = (hot + cold) / 2;
    return gapCase({
      name: `fourier ${v.gas} ${v.model} Kn ${v.knudsen}`,
      description: `Planar Fourier heat conduction in ${v.gas} (${v.model}), Kn = ${v.knudsen} at ${mean} K, gap ${formatQuantity(v.gap as number, 'mm')}, walls ${cold} K (bottom) and ${hot} K (top)`,
      values: v,
      gasTemperatureK: mean,
      bottom: { temperatureK: cold, velocityXMPerS: 0 },
      top: { temperatureK: hot, velocityXMPerS: 0 },
    });
  },
};
