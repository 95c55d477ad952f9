import { useEffect, useRef } from 'preact/hooks';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';

export interface PlotSeries {
  label: string;
  values: ArrayLike<number>;
  /** A CSS variable for the stroke, e.g. '--trace'. */
  colour: string;
  isDashed?: boolean;
}

interface PlotChartProps {
  xs: ArrayLike<number>;
  series: PlotSeries[];
  xLabel: string;
  yLabel: string;
  /** Fixed x range, when the data should not set it (mole fractions 0-1). */
  xRange?: [number, number];
  height?: number;
  title: string;
}

function cssColour(name: string, fallback: string): string {
  return getComputedStyle(document.documentElement).getPropertyValue(name).trim() || fallback;
}

/** A small line chart (uPlot) for the Prepare screen's diagrams; redrawn when its data change. */
export function PlotChart({ xs, series, xLabel, yLabel, xRange, height = 220, title }: PlotChartProps) {
  const host = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const element = host.current;
    if (!element) return;
    const ink = cssColour('--ink-soft', '#666');
    const grid = cssColour('--grid', '#8884');
    const options: uPlot.Options = {
      width: element.clientWidth || 340,
      height,
      legend: { show: false },
      cursor: { show: false },
      scales: { x: { time: false, ...(xRange ? { range: xRange } : {}) } },
      axes: [
        { stroke: ink, grid: { stroke: grid, width: 1 }, label: xLabel, size: 44 },
        { stroke: ink, grid: { stroke: grid, width: 1 }, label: yLabel, size: 52 },
      ],
      series: [{}, ...series.map((s) => ({ stroke: cssColour(s.colour, '#0b7285'), width: 2, points: { show: false }, ...(s.isDashed ? { dash: [6, 4] } : {}) }))],
    };
    const data = [Float64Array.from(xs), ...series.map((s) => Float64Array.from(s.values))] as uPlot.AlignedData;
    const chart = new uPlot(options, data, element);
    const resize = new ResizeObserver(() => chart.setSize({ width: element.clientWidth, height }));
    resize.observe(element);
    return () => {
      resize.disconnect();
      chart.destroy();
    };
  }, [xs, series, xLabel, yLabel, xRange, height]);

  return (
    <figure class="plan-chart">
      <figcaption>{title}</figcaption>
      <div class="plan-chart-plot" ref={host} role="img" aria-label={`${title}: ${yLabel} against ${xLabel}`} />
      <ul class="plan-chart-key">
        {series.map((s) => (
          <li key={s.label}>
            <span class="plan-chart-swatch" data-dashed={s.isDashed ? 'true' : undefined} style={{ borderColor: `var(${s.colour})` }} aria-hidden="true" />
            {s.label}
          </li>
        ))}
      </ul>
    </figure>
  );
}
