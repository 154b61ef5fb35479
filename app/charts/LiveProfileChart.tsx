/**
 * The live profile while a run goes on, drawn as plain SVG by React: points with 95 % error bars on linear axes.
 * Cheap enough to redraw twice a second beside busy workers (a plotly redraw took 50–150 ms of the page's thread
 * on a two-core machine); the plotly plots take over once the result is final.
 */
import { sig } from '../format';

const W = 600;
const H = 320;
const M = { l: 70, r: 16, t: 12, b: 46 };

/** About five round tick values covering [lo, hi]. */
export function niceTicks(lo: number, hi: number, count = 5): number[] {
  if (!(Number.isFinite(lo) && Number.isFinite(hi))) return [];
  if (hi - lo < 1e-300) return [lo];
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((f) => f * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step)
    out.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return out;
}

export interface LiveProfileChartProps {
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly ci95: readonly number[];
  readonly xLabel: string;
  readonly yLabel: string;
}

export function LiveProfileChart({ x, y, ci95, xLabel, yLabel }: LiveProfileChartProps) {
  const pts = x
    .map((xv, k) => ({ x: xv, y: y[k], e: Number.isFinite(ci95[k]) ? ci95[k] : 0 }))
    .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  if (!pts.length) return <p className="hint">No samples yet.</p>;
  const x0 = Math.min(...pts.map((p) => p.x));
  const x1 = Math.max(...pts.map((p) => p.x));
  let y0 = Math.min(...pts.map((p) => p.y - p.e));
  let y1 = Math.max(...pts.map((p) => p.y + p.e));
  if (y1 - y0 < 1e-12 * Math.max(1, Math.abs(y1))) {
    y0 -= 1;
    y1 += 1;
  }
  const pad = 0.05 * (y1 - y0);
  y0 -= pad;
  y1 += pad;
  const sx = (v: number) => M.l + ((v - x0) / (x1 - x0 || 1)) * (W - M.l - M.r);
  const sy = (v: number) => H - M.b - ((v - y0) / (y1 - y0)) * (H - M.t - M.b);
  const path = pts.map((p, k) => `${k ? 'L' : 'M'}${sx(p.x).toFixed(1)},${sy(p.y).toFixed(1)}`).join('');
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className="live-chart"
      role="img"
      aria-label={`live profile: ${yLabel} against ${xLabel}`}
      data-testid="live-profile"
    >
      <rect x={M.l} y={M.t} width={W - M.l - M.r} height={H - M.t - M.b} fill="#fff" stroke="#c8ced3" />
      {niceTicks(y0, y1).map((t) => (
        <g key={`y${t}`}>
          <line x1={M.l} x2={W - M.r} y1={sy(t)} y2={sy(t)} stroke="#eceff1" />
          <text x={M.l - 6} y={sy(t) + 4} textAnchor="end" fontSize="11">
            {sig(t, 3)}
          </text>
        </g>
      ))}
      {niceTicks(x0, x1).map((t) => (
        <text key={`x${t}`} x={sx(t)} y={H - M.b + 16} textAnchor="middle" fontSize="11">
          {sig(t, 3)}
        </text>
      ))}
      <text x={(M.l + W - M.r) / 2} y={H - 8} textAnchor="middle" fontSize="12">
        {xLabel}
      </text>
      <text transform={`translate(14 ${(M.t + H - M.b) / 2}) rotate(-90)`} textAnchor="middle" fontSize="12">
        {yLabel}
      </text>
      <path d={path} fill="none" stroke="#1f5f8b" strokeWidth="1.5" />
      {pts.map((p, k) => (
        <g key={k} className="errorbar">
          <line x1={sx(p.x)} x2={sx(p.x)} y1={sy(p.y - p.e)} y2={sy(p.y + p.e)} stroke="#1f5f8b" />
          <circle cx={sx(p.x)} cy={sy(p.y)} r="2.5" fill="#1f5f8b" />
        </g>
      ))}
    </svg>
  );
}
