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
import { gapCase } from './gapCase';

export const couette: Preset = {
  name: 'couette',
  description: 'planar Couette flow: gas sheared between two parallel diffuse walls moving in opposite directions',
  parameters: [
    gasParameter,
    modelParameter,
    knudsenParameter,
    gapParameter,
    {
      name: 'temperature',
      kind: 'temperature',
      unitShown: 'K',
      default: 273,
      min: 0,
      exclusiveMin: true,
      description: 'gas and wall temperature',
    },
    {
      name: 'wallSpeed',
      kind: 'speed',
      unitShown: 'm/s',
      default: 100,
      description: 'relative speed U of the walls: bottom moves at −U/2, top at +U/2 along x',
    },
    ...numericsParameters,
  ],
  build(v) {
    const t = v.temperature as number;
    const u = v.wallSpeed as number;
    return gapCase({
      name: `couette ${v.gas} ${v.model} Kn ${v.knudsen}`,
      description: `Planar Couette flow of ${v.gas} (${v.model}), Kn = ${v.knudsen}, gap ${formatQuantity(v.gap as number, 'mm')}, ${t} K, walls ±${u / 2} m/s`,
      values: v,
      gasTemperatureK: t,
      bottom: { temperatureK: t, velocityXMPerS: -u / 2 },
      top: { temperatureK: t, velocityXMPerS: u / 2 },
    });
  },
};
