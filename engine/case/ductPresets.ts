/**
 * The presets for sizing flows through ducts, one module each: a force-driven periodic channel (poiseuillePreset.ts)
 * and round tube (forceDrivenTubePreset.ts), the cross-section of a rectangular duct (rectangularDuctPreset.ts),
 * a planar channel and a round tube between two vessels (channelPreset.ts, tubePreset.ts), a thin plate with a slit
 * (planar, slitPreset.ts) and with a circular orifice (axisymmetric, orificePreset.ts); what they share is in
 * ductPresetParts.ts and ductBetweenVessels.ts.
 *
 * Names that results use, stable from one version to the next:
 * - sides `left` (upstream vessel, a reservoir at the upstream pressure) and `right` (downstream vessel);
 * - solid walls as blocks: `lowerWall` / `upperWall` (channel), `wall` (tube), `lowerPlate` / `upperPlate` (slit),
 *   `plate` (orifice); their faces report as BLOCK.left, BLOCK.right, BLOCK.bottom, BLOCK.top (e.g. the channel's
 *   wetted surfaces are `lowerWall.top` and `upperWall.bottom`, the tube's `wall.bottom`);
 * - flow sections `inlet` (duct entrance), `middle` and `outlet` (duct exit); the orifice and slit have `upstream`,
 *   `opening` (in the plate) and `downstream`; the force-driven channel and tube have `middle`.
 * Knudsen numbers use the viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m)) at the mean of the two vessel
 * pressures and the duct's gap H or radius R (the force-driven channel: at its pressure and gap).
 */
import { poiseuille } from './poiseuillePreset';
import { forceDrivenTube } from './forceDrivenTubePreset';
import { rectangularDuct } from './rectangularDuctPreset';
import { channel } from './channelPreset';
import { tube } from './tubePreset';
import { slit } from './slitPreset';
import { orifice } from './orificePreset';

export const DUCT_PRESETS = { poiseuille, forceDrivenTube, rectangularDuct, channel, tube, slit, orifice } as const;
