/**
 * Preset `channel`: a planar channel of gap H and length L between two vessels held at different pressures (walls
 * `lowerWall`, `upperWall`; flow sections `inlet`, `middle`, `outlet`).
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

export const channel: Preset = {
  name: 'channel',
  description:
    'planar channel of gap H and length L between two vessels held at different pressures (e.g. a MEMS microchannel)',
  parameters: [
    gasParameter,
    modelParameter,
    { ...knudsenParameter, default: 0.5, description: 'Knudsen number λ/H at the mean of the two vessel pressures' },
    {
      name: 'gap',
      label: 'Channel gap',
      kind: 'length',
      unitShown: 'µm',
      default: 1e-6,
      min: 0,
      exclusiveMin: true,
      description: 'channel gap H',
    },
    pressureRatioParameter,
    ...vesselPressureParameters,
    lengthParameter('lengthToGap', 'gap', 5, 'channel length L', 'Channel length / gap'),
    lengthParameter(
      'vesselLengthToGap',
      'gap',
      2,
      'length of each vessel region; 0 puts the vessels right at the channel ends',
      'Vessel length / gap',
    ),
    lengthParameter('vesselHeightToGap', 'gap', 3, 'height of the vessel regions', 'Vessel height / gap'),
    temperatureParameter,
    accommodationParameter,
    ...ductNumerics,
  ],
  build(v, given) {
    const h = v.gap as number;
    const vessel = (v.vesselLengthToGap as number) * h;
    return ductBetweenVessels(
      v,
      {
        planar: true,
        size: h,
        length: (v.lengthToGap as number) * h,
        vessel,
        vesselSize: vessel > 0 ? Math.max(1, v.vesselHeightToGap as number) * h : h,
        blocks: 'channel',
      },
      given,
    );
  },
};
