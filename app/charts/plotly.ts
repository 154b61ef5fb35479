/**
 * Our own thin wrapper around plotly: loaded lazily into its own chunk, and only react/purge/downloadImage used.
 */
import type { Config, Data, Layout } from 'plotly.js-dist-min';

export type { Data, Layout };
type PlotlyModule = typeof import('plotly.js-dist-min').default;

let loading: Promise<PlotlyModule> | null = null;

export function loadPlotly(): Promise<PlotlyModule> {
  loading ??= import('plotly.js-dist-min').then((m) => m.default);
  return loading;
}

// No mode bar: the page has its own image buttons, and rebuilding the bar made every live redraw a full replot.
const CONFIG: Partial<Config> = { displayModeBar: false, responsive: true };

/** One macrotask per draw, so several plots updating together never make one long main-thread task. */
const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

export async function drawPlot(div: HTMLDivElement, data: Data[], layout: Partial<Layout>): Promise<void> {
  const Plotly = await loadPlotly();
  await nextTask();
  if (!div.isConnected) return;
  await Plotly.react(
    div,
    data,
    { margin: { l: 70, r: 20, t: 30, b: 55 }, font: { family: 'system-ui, sans-serif', size: 12 }, ...layout },
    CONFIG,
  );
}

/**
 * Loads plotly and draws one throw-away plot off-screen while the page is idle: its first drawing sets up styles and
 * measures fonts, which would otherwise land in the middle of a run.
 */
export async function warmPlotly(): Promise<void> {
  const Plotly = await loadPlotly();
  const div = document.createElement('div');
  div.style.cssText = 'position:absolute;left:-10000px;top:0;width:400px;height:300px';
  document.body.appendChild(div);
  try {
    await Plotly.newPlot(
      div,
      [
        { type: 'scatter', x: [0, 1], y: [0, 1], error_y: { type: 'data', array: [0.1, 0.1] } },
        { type: 'heatmap', z: [[0, 1]] },
      ],
      { margin: { t: 10 } },
      { staticPlot: true },
    );
  } finally {
    Plotly.purge(div);
    div.remove();
  }
}

export async function purgePlot(div: HTMLDivElement): Promise<void> {
  const Plotly = await loadPlotly();
  Plotly.purge(div);
}

export async function downloadPlot(div: HTMLDivElement, format: 'png' | 'svg', filename: string): Promise<void> {
  const Plotly = await loadPlotly();
  await Plotly.downloadImage(div, { format, filename, width: 900, height: 520 });
}
