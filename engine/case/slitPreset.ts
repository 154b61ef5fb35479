/**
 * Preset `slit`: a thin plate with a slit of width H between two vessels (planar; plates `lowerPlate`, `upperPlate`;
 * flow sections `upstream`, `opening`, `downstream`).
 */
import { type Preset, gasParameter, modelParameter, knudsenParameter } from './presetParameters';
import {
  accommodationParameter,
  ductNumerics,
  lengthParameter,
  pressureRatioParameter,
  temperatureParameter,
} from './ductPresetParts';
import { ductBetweenVessels } from './ductBetweenVessels';
import { vesselPressureParameters } from './pressurePresetParameters';

export const slit: Preset = {
  name: 'slit',
  description: 'thin plate with a slit of width H between two vessels (planar)',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      default: 0.5,
      description: 'Knudsen number λ/H on the slit width, at the mean of the two vessel pressures',
    },
    {
      name: 'gap',
      label: 'Slit width',
      kind: 'length',
      unitShown: 'µm',
      default: 10e-6,
      min: 0,
      exclusiveMin: true,
      description: 'slit width H',
    },
    pressureRatioParameter,
    ...vesselPressureParameters,
    lengthParameter('thicknessToGap', 'slit width', 0.1, 'plate thickness', 'Plate thickness / slit width'),
    lengthParameter('vesselLengthToGap', 'slit width', 3, 'length of each vessel region', 'Vessel length / slit width'),
    lengthParameter('vesselHeightToGap', 'slit width', 4, 'height of the vessel regions', 'Vessel height / slit width'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v, given) {
    const h = v.gap as number;
    return ductBetweenVessels(
      v,
      {
        planar: true,
        size: h,
        length: Math.max(1e-3, v.thicknessToGap as number) * h,
        vessel: Math.max(0.5, v.vesselLengthToGap as number) * h,
        vesselSize: Math.max(1.5, v.vesselHeightToGap as number) * h,
        blocks: 'slit',
      },
      given,
    );
  },
};
