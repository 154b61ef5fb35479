/**
 * Preset `tube`: a round tube of radius R and length L between two vessels held at different pressures
 * (axisymmetric; wall `wall`; flow sections `inlet`, `middle`, `outlet`).
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

export const tube: Preset = {
  name: 'tube',
  description:
    'round tube of radius R and length L between two vessels held at different pressures (axisymmetric; e.g. a pumping line)',
  parameters: [
    gasParameter,
    modelParameter,
    {
      ...knudsenParameter,
      default: 0.5,
      description: 'Knudsen number λ/R on the radius, at the mean of the two vessel pressures',
    },
    {
      name: 'radius',
      label: 'Tube radius',
      kind: 'length',
      unitShown: 'mm',
      default: 1e-3,
      min: 0,
      exclusiveMin: true,
      description: 'tube radius R',
    },
    pressureRatioParameter,
    ...vesselPressureParameters,
    lengthParameter('lengthToRadius', 'radius', 5, 'tube length L', 'Tube length / radius'),
    lengthParameter(
      'vesselLengthToRadius',
      'radius',
      2,
      'length of each vessel region; 0 puts the vessels right at the tube ends',
      'Vessel length / radius',
    ),
    lengthParameter('vesselRadiusToRadius', 'radius', 3, 'radius of the vessel regions', 'Vessel radius / tube radius'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v, given) {
    const r = v.radius as number;
    const vessel = (v.vesselLengthToRadius as number) * r;
    return ductBetweenVessels(
      v,
      {
        planar: false,
        size: r,
        length: (v.lengthToRadius as number) * r,
        vessel,
        vesselSize: vessel > 0 ? Math.max(1, v.vesselRadiusToRadius as number) * r : r,
        blocks: 'tube',
      },
      given,
    );
  },
};
