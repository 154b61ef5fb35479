/**
 * Preset `couette`: planar Couette flow, gas sheared between two parallel diffuse walls moving in opposite directions
 * (gapCase.ts: the walls report as `bottom` and `top`).
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

export const couette: Preset = {
  name: 'couette',
  description: 'planar Couette flow: gas sheared between two parallel diffuse walls moving in opposite directions',
  parameters: [
    gasParameter,
    modelParameter,
    knudsenParameter,
    gapParameter,
    pressureParameter,
    {
      name: 'temperature',
      label: 'Temperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 273,
      min: 0,
      exclusiveMin: true,
      description: 'gas and wall temperature',
    },
    {
      name: 'wallSpeed',
      label: 'Relative wall speed',
      kind: 'speed',
      unitShown: 'm/s',
      default: 100,
      description: 'relative speed U of the walls: bottom moves at −U/2, top at +U/2 along x',
    },
    ...numericsParameters,
  ],
  build(input, given) {
    const t = input.temperature as number;
    const { values: v, pressureNote } = gapValues(input, given, t, input.gap as number);
    const u = v.wallSpeed as number;
    return gapCase({
      name: `couette ${v.gas} ${v.model} Kn ${knudsenText(v)}`,
      description: `Planar Couette flow of ${v.gas} (${v.model}), Kn = ${knudsenText(v)}${pressureNote}, gap ${formatQuantity(v.gap as number, 'mm')}, ${t} K, walls ±${u / 2} m/s`,
      values: v,
      gasTemperatureK: t,
      bottom: { temperatureK: t, velocityXMPerS: -u / 2 },
      top: { temperatureK: t, velocityXMPerS: u / 2 },
    });
  },
};
