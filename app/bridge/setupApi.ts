/**
 * The part of the engine the set-up needs on the main thread: presets, case validation, the planner, units and the
 * expected-noise formulas. Loaded by dynamic import only (loadEngine.ts, as the SetupApi of types.ts), so it lands in
 * its own chunk and the page's main bundle holds no engine code.
 */
export { PRESETS, buildPreset, presetNames } from '../../engine/case/presets';
export { parseCase } from '../../engine/case/schema';
export { SIDE_NAMES, WALL_MODELS, COLLISION_MODELS } from '../../engine/case/caseConstants';
export { SPECIES, SPECIES_IDS } from '../../engine/gas/species';
export { AVOGADRO_PER_MOL } from '../../engine/physics/constants';
export { unitsOf, convertFromSI, convertToSI, formatQuantity } from '../../engine/units/engineeringUnits';
export { describePlan } from './planView';
export { deriveCase, checkCaseText } from './deriveCase';
