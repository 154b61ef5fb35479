/**
 * Preset `orifice`: a thin plate with a circular orifice of radius R between two vessels (axisymmetric; plate
 * `plate`; flow sections `upstream`, `opening`, `downstream`).
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

export const orifice: Preset = {
  name: 'orifice',
  description: 'thin plate with a circular orifice of radius R between two vessels (axisymmetric)',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      default: 0.5,
      description: 'Knudsen number λ/R on the orifice radius, at the mean of the two vessel pressures',
    },
    {
      name: 'radius',
      label: 'Orifice radius',
      kind: 'length',
      unitShown: 'mm',
      default: 0.5e-3,
      min: 0,
      exclusiveMin: true,
      description: 'orifice radius R',
    },
    pressureRatioParameter,
    ...vesselPressureParameters,
    lengthParameter('thicknessToRadius', 'radius', 0.1, 'plate thickness', 'Plate thickness / orifice radius'),
    lengthParameter(
      'vesselLengthToRadius',
      'radius',
      3,
      'length of each vessel region',
      'Vessel length / orifice radius',
    ),
    lengthParameter(
      'vesselRadiusToRadius',
      'radius',
      4,
      'radius of the vessel regions',
      'Vessel radius / orifice radius',
    ),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v, given) {
    const r = v.radius as number;
    return ductBetweenVessels(
      v,
      {
        planar: false,
        size: r,
        length: Math.max(1e-3, v.thicknessToRadius as number) * r,
        vessel: Math.max(0.5, v.vesselLengthToRadius as number) * r,
        vesselSize: Math.max(1.5, v.vesselRadiusToRadius as number) * r,
        blocks: 'orifice',
      },
      given,
    );
  },
};
