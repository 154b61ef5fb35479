/**
 * The walls and blocks of a case as plotly shapes and labels over a map of the domain (lengths in the shown unit):
 * walls as thick lines along the domain sides that are walls, named; blocks as grey rectangles with an outline,
 * named. Pure, so the counts the page reports can be tested without a browser.
 */
import type { Layout } from '../charts/plotly';
import type { ResultGeometry } from './resultGeometry';

type Shape = NonNullable<Layout['shapes']>[number];
type Annotation = NonNullable<Layout['annotations']>[number];

export interface GeometryOverlay {
  readonly shapes: Partial<Shape>[];
  readonly annotations: Partial<Annotation>[];
  readonly wallCount: number;
  readonly blockCount: number;
}

const WALL_COLOUR = '#111';
const BLOCK_FILL = '#a3a3a3';
const BLOCK_LINE = '#333';
const LABEL_BACKGROUND = 'rgba(255, 255, 255, 0.85)';

export function geometryOverlay(g: ResultGeometry | null, lengthFactor: number): GeometryOverlay {
  if (!g) return { shapes: [], annotations: [], wallCount: 0, blockCount: 0 };
  const s = (m: number) => m / lengthFactor;
  const shapes: Partial<Shape>[] = [];
  const annotations: Partial<Annotation>[] = [];
  for (const b of g.blocks) {
    shapes.push({
      type: 'rect',
      xref: 'x',
      yref: 'y',
      x0: s(b.x0),
      x1: s(b.x1),
      y0: s(b.y0),
      y1: s(b.y1),
      fillcolor: BLOCK_FILL,
      opacity: 1,
      line: { color: BLOCK_LINE, width: 1.5 },
      layer: 'above',
      name: `block ${b.name}`,
    });
    annotations.push({
      x: s((b.x0 + b.x1) / 2),
      y: s((b.y0 + b.y1) / 2),
      xref: 'x',
      yref: 'y',
      text: b.name,
      showarrow: false,
      font: { size: 11, color: '#111' },
    });
  }
  for (const w of g.walls) {
    const along = [s(w.fromM), s(w.toM)];
    const at = s(w.planeM);
    shapes.push(
      w.normalIsX
        ? {
            type: 'line',
            xref: 'x',
            yref: 'y',
            x0: at,
            x1: at,
            y0: along[0],
            y1: along[1],
            line: { color: WALL_COLOUR, width: 5 },
            layer: 'above',
            name: `wall ${w.name}`,
          }
        : {
            type: 'line',
            xref: 'x',
            yref: 'y',
            x0: along[0],
            x1: along[1],
            y0: at,
            y1: at,
            line: { color: WALL_COLOUR, width: 5 },
            layer: 'above',
            name: `wall ${w.name}`,
          },
    );
    const mid = (along[0] + along[1]) / 2;
    // Labels sit just inside the domain next to their wall, so they never cover the colour bar or the axes.
    annotations.push(
      w.normalIsX
        ? {
            x: at,
            y: mid,
            xref: 'x',
            yref: 'y',
            text: `wall ${w.name}`,
            showarrow: false,
            textangle: -90,
            xanchor: w.side === 'left' ? 'left' : 'right',
            xshift: w.side === 'left' ? 4 : -4,
            bgcolor: LABEL_BACKGROUND,
            font: { size: 11 },
          }
        : {
            x: mid,
            y: at,
            xref: 'x',
            yref: 'y',
            text: `wall ${w.name}`,
            showarrow: false,
            yanchor: w.side === 'bottom' ? 'bottom' : 'top',
            yshift: w.side === 'bottom' ? 4 : -4,
            bgcolor: LABEL_BACKGROUND,
            font: { size: 11 },
          },
    );
  }
  return { shapes, annotations, wallCount: g.walls.length, blockCount: g.blocks.length };
}
