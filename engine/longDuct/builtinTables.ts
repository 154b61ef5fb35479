/**
 * Coefficient tables shipped with Tenuis, each computed by Tenuis's own DSMC with `tenuis coefficients` (the table's
 * `source` names the case and command; `npm run coefficients` computes them again, DEVELOPERS.md says how). Used by `tenuis duct` when no
 * table is given. A table holds for its gas model and wall; for another gas G_P(δ) differs in the transition regime
 * by a few per cent (hard spheres against the BGK model: up to 3–4 %, the project's reference notes §2), which the
 * caller states.
 */
import type { CoefficientTable, DuctShapeKind } from './coefficientTable';
import channelArgonHardSphere from './tables/channel-argon-hard-sphere.json';
import tubeArgonHardSphere from './tables/tube-argon-hard-sphere.json';

export const BUILTIN_TABLES: readonly CoefficientTable[] = [
  channelArgonHardSphere as CoefficientTable,
  tubeArgonHardSphere as CoefficientTable,
];

/** The shipped table for a shape, or null when there is none yet. */
export function builtinTableFor(shape: DuctShapeKind): CoefficientTable | null {
  return BUILTIN_TABLES.find((t) => t.shape === shape) ?? null;
}
