/**
 * The domain as a plain SVG: its four sides drawn and labelled by boundary type, the planned grid faintly, the solid
 * blocks, and a rectangle dragged with the mouse (or a pen) that becomes a new block. Corners snap to the cell edges
 * of the planned grid, so a drawn block cuts whole cells.
 */
import { useRef, useState, type PointerEvent } from 'react';
import type { CaseInput } from '../../engine/case/schema';
import type { SideName } from '../../engine/case/caseConstants';
import { setupApi } from '../bridge/loadEngine';
import { sig } from '../format';
import { lengthLabel, snapToGrid, type RectSI } from './blockEdits';

export interface PreviewBlock {
  readonly name: string;
  /** Null while its coordinates cannot be read (it is not drawn). */
  readonly rect: RectSI | null;
  readonly invalid: boolean;
}

export interface DomainPreviewProps {
  readonly domain: CaseInput['domain'];
  readonly boundaries: CaseInput['boundaries'];
  readonly blocks: readonly PreviewBlock[];
  readonly grid: { readonly cellsX: number; readonly cellsY: number } | null;
  readonly lengthUnit: string;
  /** Called with a dragged rectangle; absent = drawing is off (e.g. the case comes from JSON). */
  readonly onDraw?: (rect: RectSI) => void;
}

const WIDTH = 640;
const MARGIN = { left: 44, right: 44, top: 30, bottom: 50 } as const;
const MAX_HEIGHT = 300;
/** Thinner than this on screen (px of the view box) and a side is stretched: the preview is then not to scale. */
const MIN_EXTENT = 80;
const GRID_LINES_MAX = 120;

type Boundary = CaseInput['boundaries'][SideName];

function sideLabel(side: SideName, b: Boundary): string {
  const api = setupApi();
  switch (b.type) {
    case 'wall': {
      const v = b.velocityMPerS ?? [0, 0, 0];
      const speed = Math.hypot(v[0], v[1]);
      return `${side}: wall ${sig(b.temperatureK, 5)} K${speed ? `, moving ${sig(v[0] || v[1], 3)} m/s` : ''}`;
    }
    case 'reservoir':
      return `${side}: reservoir ${api.formatQuantity(b.pressurePa, 'Pa', 4)}, ${sig(b.temperatureK, 5)} K`;
    case 'pressureOutlet':
      return `${side}: pressure outlet ${api.formatQuantity(b.pressurePa, 'Pa', 4)}`;
    case 'axis':
      return `${side}: axis of symmetry`;
    default:
      return `${side}: ${b.type}`;
  }
}

interface Frame {
  readonly sx: number;
  readonly sy: number;
  readonly w: number;
  readonly h: number;
  readonly toScale: boolean;
}

function frameOf(lx: number, ly: number): Frame {
  const s = Math.min((WIDTH - MARGIN.left - MARGIN.right) / lx, MAX_HEIGHT / ly);
  const w = Math.max(MIN_EXTENT, s * lx);
  const h = Math.max(MIN_EXTENT, s * ly);
  return { sx: w / lx, sy: h / ly, w, h, toScale: w === s * lx && h === s * ly };
}

export function DomainPreview(p: DomainPreviewProps) {
  const { lengthXM: lx, lengthYM: ly } = p.domain;
  const f = frameOf(lx, ly);
  const height = MARGIN.top + f.h + MARGIN.bottom;
  // Centred, so that a narrow domain (a one-cell Couette gap) keeps room for the labels of its bottom and top.
  const left = (WIDTH - f.w) / 2;
  const X = (x: number) => left + x * f.sx;
  const Y = (y: number) => MARGIN.top + f.h - y * f.sy;
  const svg = useRef<SVGSVGElement>(null);
  const [drag, setDrag] = useState<{ x0: number; y0: number; x1: number; y1: number } | null>(null);
  const api = setupApi();
  const radial = p.domain.geometry === 'axisymmetric';

  const pointAt = (e: PointerEvent): { x: number; y: number } => {
    const r = svg.current!.getBoundingClientRect();
    const vx = ((e.clientX - r.left) * WIDTH) / r.width;
    const vy = ((e.clientY - r.top) * height) / r.height;
    return {
      x: snapToGrid((vx - left) / f.sx, lx, p.grid?.cellsX ?? null),
      y: snapToGrid((MARGIN.top + f.h - vy) / f.sy, ly, p.grid?.cellsY ?? null),
    };
  };
  const down = (e: PointerEvent) => {
    if (!p.onDraw || e.button !== 0) return;
    (e.target as Element).setPointerCapture?.(e.pointerId);
    const q = pointAt(e);
    setDrag({ x0: q.x, y0: q.y, x1: q.x, y1: q.y });
  };
  const move = (e: PointerEvent) => {
    if (!drag) return;
    const q = pointAt(e);
    setDrag({ ...drag, x1: q.x, y1: q.y });
  };
  const up = (e: PointerEvent) => {
    if (!drag) return;
    const q = pointAt(e);
    setDrag(null);
    const rect = {
      xMinM: Math.min(drag.x0, q.x),
      xMaxM: Math.max(drag.x0, q.x),
      yMinM: Math.min(drag.y0, q.y),
      yMaxM: Math.max(drag.y0, q.y),
    };
    if (rect.xMaxM > rect.xMinM && rect.yMaxM > rect.yMinM) p.onDraw?.(rect);
  };

  const sides: {
    side: SideName;
    x1: number;
    y1: number;
    x2: number;
    y2: number;
    lx: number;
    ly: number;
    rotate: number;
  }[] = [
    { side: 'bottom', x1: X(0), y1: Y(0), x2: X(lx), y2: Y(0), lx: X(lx / 2), ly: Y(0) + 16, rotate: 0 },
    { side: 'top', x1: X(0), y1: Y(ly), x2: X(lx), y2: Y(ly), lx: X(lx / 2), ly: Y(ly) - 8, rotate: 0 },
    { side: 'left', x1: X(0), y1: Y(0), x2: X(0), y2: Y(ly), lx: X(0) - 10, ly: Y(ly / 2), rotate: -90 },
    { side: 'right', x1: X(lx), y1: Y(0), x2: X(lx), y2: Y(ly), lx: X(lx) + 10, ly: Y(ly / 2), rotate: 90 },
  ];
  const grid = p.grid && p.grid.cellsX <= GRID_LINES_MAX && p.grid.cellsY <= GRID_LINES_MAX ? p.grid : null;
  const shown = drag && {
    x: X(Math.min(drag.x0, drag.x1)),
    y: Y(Math.max(drag.y0, drag.y1)),
    w: Math.abs(drag.x1 - drag.x0) * f.sx,
    h: Math.abs(drag.y1 - drag.y0) * f.sy,
  };
  return (
    <figure className="domain-preview">
      <svg
        ref={svg}
        viewBox={`0 0 ${WIDTH} ${height}`}
        role="img"
        aria-label="domain preview: sides, grid and solid blocks"
        data-testid="domain-preview"
      >
        <rect className="domain-gas" x={X(0)} y={Y(ly)} width={f.w} height={f.h} />
        {grid && (
          <g className="domain-grid">
            {Array.from({ length: grid.cellsX - 1 }, (_, i) => (
              <line
                key={`x${i}`}
                x1={X(((i + 1) * lx) / grid.cellsX)}
                x2={X(((i + 1) * lx) / grid.cellsX)}
                y1={Y(0)}
                y2={Y(ly)}
              />
            ))}
            {Array.from({ length: grid.cellsY - 1 }, (_, i) => (
              <line
                key={`y${i}`}
                y1={Y(((i + 1) * ly) / grid.cellsY)}
                y2={Y(((i + 1) * ly) / grid.cellsY)}
                x1={X(0)}
                x2={X(lx)}
              />
            ))}
          </g>
        )}
        {p.blocks.map(
          (b, i) =>
            b.rect && (
              <g
                key={`${i}:${b.name}`}
                className={`domain-block${b.invalid ? ' domain-block-invalid' : ''}`}
                data-testid={`preview-block-${i}`}
              >
                <rect
                  x={X(Math.max(0, b.rect.xMinM))}
                  y={Y(Math.min(ly, b.rect.yMaxM))}
                  width={Math.max(1, (Math.min(lx, b.rect.xMaxM) - Math.max(0, b.rect.xMinM)) * f.sx)}
                  height={Math.max(1, (Math.min(ly, b.rect.yMaxM) - Math.max(0, b.rect.yMinM)) * f.sy)}
                />
                <text
                  x={X((Math.max(0, b.rect.xMinM) + Math.min(lx, b.rect.xMaxM)) / 2)}
                  y={Y((Math.max(0, b.rect.yMinM) + Math.min(ly, b.rect.yMaxM)) / 2) + 4}
                >
                  {b.name}
                </text>
              </g>
            ),
        )}
        {sides.map((s) => (
          <g
            key={s.side}
            className={`domain-side side-${p.boundaries[s.side].type}`}
            data-testid={`preview-side-${s.side}`}
          >
            <line x1={s.x1} y1={s.y1} x2={s.x2} y2={s.y2} />
            <text x={s.lx} y={s.ly} transform={s.rotate ? `rotate(${s.rotate} ${s.lx} ${s.ly})` : undefined}>
              {sideLabel(s.side, p.boundaries[s.side])}
            </text>
          </g>
        ))}
        {shown && (
          <rect
            className="domain-drag"
            x={shown.x}
            y={shown.y}
            width={shown.w}
            height={shown.h}
            data-testid="preview-drag"
          />
        )}
        <rect
          className={`domain-area${p.onDraw ? ' domain-area-draw' : ''}`}
          x={X(0)}
          y={Y(ly)}
          width={f.w}
          height={f.h}
          data-testid="domain-area"
          onPointerDown={down}
          onPointerMove={move}
          onPointerUp={up}
          onPointerCancel={() => setDrag(null)}
        />
        <text className="domain-extent" x={WIDTH / 2} y={height - 8}>
          x 0 … {lengthLabel(lx, p.lengthUnit, api)}
          {radial ? ' (axis)' : ''}, {radial ? 'r' : 'y'} 0 … {lengthLabel(ly, p.lengthUnit, api)}
          {p.grid ? `; grid ${p.grid.cellsX} × ${p.grid.cellsY} cells` : ''}
          {f.toScale ? '' : '; not to scale'}
        </text>
      </svg>
      <figcaption className="hint">
        {p.onDraw
          ? `Drag a rectangle on the domain to add a block${p.grid ? '; its corners snap to the cell edges of the planned grid' : ''}.`
          : 'The case comes from JSON: blocks are edited there.'}
        {radial ? ' Axisymmetric: y is the radius and a block is a ring (a disc when it touches the axis).' : ''}
      </figcaption>
    </figure>
  );
}
