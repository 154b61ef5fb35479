/**
 * The surfaces of a case, in the order of the side table's rows: the four sides of the domain (left, right, bottom,
 * top), then the four faces of each block (left, right, bottom, top). Each is a line in the (x, y) plane with the
 * axis of its normal, the direction of that normal into the gas, its position and extent, and its wall bins.
 *
 *        top (y = Ly, inward −y)                 block faces: left  x = x0, inward −x
 *   ┌──────────────────────────┐                              right x = x1, inward +x
 *   │        ┌──────┐          │ right (x = Lx,               bottom y = y0, inward −y
 *   │ left   │block │          │  inward −x)                  top    y = y1, inward +y
 *   │ (x = 0,└──────┘          │
 *   │  inward +x)              │
 *   └──────────────────────────┘
 *        bottom (y = 0, inward +y; the axis when axisymmetric)
 */
import type { Case, BoundarySpec, WallSpec } from '../case/schema';
import { SIDE_NAMES, BLOCK_FACES } from '../case/caseConstants';

export interface SurfacePlan {
  /** Side name (left …, or the wall's own `name`) or BLOCK.FACE for block faces; walls report under this name. */
  readonly name: string;
  readonly spec: BoundarySpec;
  /** Block index for block faces, −1 for the domain's sides. */
  readonly block: number;
  /** True when the surface is normal to x (a vertical line x = plane). */
  readonly normalIsX: boolean;
  /** +1 or −1: the direction along the normal axis that points into the gas. */
  readonly inward: number;
  /** Position of the surface's line (x for normalIsX, else y), m. */
  readonly planeM: number;
  /** Extent along the surface (y for normalIsX, else x), m. */
  readonly fromM: number;
  readonly toM: number;
  readonly bins: number;
}

/** Full wall spec of a block face: its own entry in faces, or the block's common wall. */
function faceSpec(c: Case, b: number, face: (typeof BLOCK_FACES)[number]): WallSpec {
  const block = c.blocks[b];
  return block.faces?.[face] ?? block.wall;
}

/** Bins along a surface of length `length`: the case's wallBins, or one per cell it spans (at least 1). */
function binsAlong(c: Case, length: number, cellSize: number): number {
  return c.sampling.wallBins ?? Math.max(1, Math.round(length / cellSize));
}

export function surfacesOf(c: Case, cellSizeXM: number, cellSizeYM: number): SurfacePlan[] {
  const { lengthXM: lx, lengthYM: ly } = c.domain;
  const out: SurfacePlan[] = SIDE_NAMES.map((side) => {
    const normalIsX = side === 'left' || side === 'right';
    const spec = c.boundaries[side];
    return {
      name: spec.type === 'wall' && spec.name !== undefined ? spec.name : side,
      spec,
      block: -1,
      normalIsX,
      inward: side === 'left' || side === 'bottom' ? 1 : -1,
      planeM: side === 'left' || side === 'bottom' ? 0 : normalIsX ? lx : ly,
      fromM: 0,
      toM: normalIsX ? ly : lx,
      bins: binsAlong(c, normalIsX ? ly : lx, normalIsX ? cellSizeYM : cellSizeXM),
    };
  });
  c.blocks.forEach((k, b) => {
    for (const face of BLOCK_FACES) {
      const normalIsX = face === 'left' || face === 'right';
      out.push({
        name: `${k.name}.${face}`,
        spec: faceSpec(c, b, face),
        block: b,
        normalIsX,
        inward: face === 'right' || face === 'top' ? 1 : -1,
        planeM: face === 'left' ? k.xMinM : face === 'right' ? k.xMaxM : face === 'bottom' ? k.yMinM : k.yMaxM,
        fromM: normalIsX ? k.yMinM : k.xMinM,
        toM: normalIsX ? k.yMaxM : k.xMaxM,
        bins: binsAlong(c, normalIsX ? k.yMaxM - k.yMinM : k.xMaxM - k.xMinM, normalIsX ? cellSizeYM : cellSizeXM),
      });
    }
  });
  return out;
}

/**
 * Area of the part [a, b] (m, along the surface) of a surface: planar, per metre of depth; axisymmetric, a ring
 * (π (b² − a²)) for surfaces normal to the axis, a cylinder (2π r (b − a)) for surfaces at radius r.
 */
export function surfaceAreaM2(normalIsX: boolean, planeM: number, a: number, b: number, axisymmetric: boolean): number {
  if (!axisymmetric) return b - a;
  return normalIsX ? Math.PI * (b * b - a * a) : 2 * Math.PI * planeM * (b - a);
}
