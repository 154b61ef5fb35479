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
import { gapCase, gapValues } from './gapCase';
import { knudsenText, pressureParameter } from './pressurePresetParameters';

export const fourier: Preset = {
  name: 'fourier',
  description: 'planar Fourier heat conduction: gas at rest between a cold bottom wall and a hot top wall',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, description: `${knudsenParameter.description}, at the mean wall temperature` },
    gapParameter,
    pressureParameter,
    {
      name: 'hotTemperature',
      label: 'Hot (top) wall temperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 283,
      min: 0,
      exclusiveMin: true,
      description: 'top wall temperature',
    },
    {
      name: 'coldTemperature',
      label: 'Cold (bottom) wall temperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 263,
      min: 0,
      exclusiveMin: true,
      description: 'bottom wall temperature',
    },
    ...numericsParameters,
  ],
  build(input, given) {
    const hot = input.hotTemperature as number;
    const cold = input.coldTemperature as number;
    const mean = (hot + cold) / 2;
    const { values: v, pressureNote } = gapValues(input, given, mean, input.gap as number);
    return gapCase({
      name: `fourier ${v.gas} ${v.model} Kn ${knudsenText(v)}`,
      description: `Planar Fourier heat conduction in ${v.gas} (${v.model}), Kn = ${knudsenText(v)}${pressureNote} at ${mean} K, gap ${formatQuantity(v.gap as number, 'mm')}, walls ${cold} K (bottom) and ${hot} K (top)`,
      values: v,
      gasTemperatureK: mean,
      bottom: { temperatureK: cold, velocityXMPerS: 0 },
      top: { temperatureK: hot, velocityXMPerS: 0 },
    });
  },
};
