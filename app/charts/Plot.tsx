/** One plotly chart: draws on every data change, purges on unmount, offers PNG and SVG downloads. */
import { useEffect, useRef, useState } from 'react';
import { downloadPlot, drawPlot, purgePlot, type Data, type Layout } from './plotly';

export interface PlotProps {
  readonly data: Data[];
  readonly layout: Partial<Layout>;
  /** File name (without extension) for image downloads. */
  readonly filename: string;
  readonly label: string;
  readonly testId?: string;
}

export function Plot({ data, layout, filename, label, testId }: PlotProps) {
  const ref = useRef<HTMLDivElement>(null);
  const [drawn, setDrawn] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  // Drawn once scrolled near the view: a results page with several plots then costs one draw at a time.
  const [visible, setVisible] = useState(false);
  useEffect(() => {
    const div = ref.current;
    if (!div || visible) return;
    if (typeof IntersectionObserver === 'undefined') return setVisible(true);
    const observer = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setVisible(true), {
      rootMargin: '100px',
    });
    observer.observe(div);
    return () => observer.disconnect();
  }, [visible]);
  useEffect(() => {
    const div = ref.current;
    if (!div || !visible) return;
    let cancelled = false;
    drawPlot(div, data, layout).then(
      () => !cancelled && setDrawn(true),
      (e: Error) => !cancelled && setFailure(e.message),
    );
    return () => {
      cancelled = true;
    };
  }, [data, layout, visible]);
  useEffect(() => {
    const div = ref.current;
    return () => {
      if (div) void purgePlot(div);
    };
  }, []);
  const save = (format: 'png' | 'svg') => ref.current && void downloadPlot(ref.current, format, filename);
  return (
    <figure className="plot" aria-label={label} data-testid={testId} data-drawn={drawn ? 'yes' : 'no'}>
      <div ref={ref} className="plot-area" />
      {failure && <p role="alert">The plot could not be drawn: {failure}</p>}
      <figcaption className="plot-actions">
        <button type="button" onClick={() => save('png')} disabled={!drawn}>
          Save plot as PNG
        </button>
        <button type="button" onClick={() => save('svg')} disabled={!drawn}>
          Save plot as SVG
        </button>
      </figcaption>
    </figure>
  );
}
