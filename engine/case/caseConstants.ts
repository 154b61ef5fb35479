/**
 * The fixed words of the case file — its schema version, the collision and wall models, the side, block-face and duct
 * names — in a leaf module, so the schema's parts (gasSchema.ts, boundarySchema.ts, blockSchema.ts, caseShape.ts)
 * and every reader of a case can name them without importing the whole schema.
 */

export const CASE_SCHEMA_VERSION = 1;

export const COLLISION_MODELS = ['HS', 'VHS', 'VSS'] as const;
export const WALL_MODELS = ['diffuse', 'specular', 'maxwell', 'cercignaniLampis'] as const;
export const SIDE_NAMES = ['left', 'right', 'bottom', 'top'] as const;
export type SideName = (typeof SIDE_NAMES)[number];

export const BLOCK_FACES = ['left', 'right', 'bottom', 'top'] as const;
export type BlockFace = (typeof BLOCK_FACES)[number];

export const DUCT_KINDS = ['channel', 'tube', 'slit', 'orifice'] as const;
export type DuctKind = (typeof DUCT_KINDS)[number];
