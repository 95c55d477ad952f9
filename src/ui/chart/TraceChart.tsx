import { useEffect, useRef } from 'preact/hooks';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { ReadingBuffer } from '../../run/index.ts';

interface TraceChartProps {
  readings: ReadingBuffer;
  /** Bumped by the owner whenever readings were appended. */
  version: number;
  /** Least time between redraws; setData rebuilds every path. Units: ms */
  minRedrawMs?: number;
}

function themeColour(name: string, fallback: string): string {
  const value = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  return value || fallback;
}

/** Head temperature against elapsed time, redrawn at most twice a second. */
export function TraceChart({ readings, version, minRedrawMs = 500 }: TraceChartProps) {
  const host = useRef<HTMLDivElement>(null);
  const plot = useRef<uPlot | null>(null);
  const lastDraw = useRef(0);
  const pending = useRef<number | null>(null);

  useEffect(() => {
    const element = host.current;
    if (!element) return;
    const options: uPlot.Options = {
      width: element.clientWidth || 360,
      height: 220,
      legend: { show: false },
      cursor: { show: false },
      scales: {
        x: { time: false },
        y: {
          // A steady range keeps the trace readable: whole 10 degC steps around the data.
          range: (_u, min, max) => [Math.floor((min - 2) / 10) * 10, Math.ceil((max + 2) / 10) * 10],
        },
      },
      axes: [
        {
          stroke: themeColour('--ink-soft', '#666'),
          grid: { stroke: themeColour('--grid', '#8884'), width: 1 },
          values: (_u, ticks) => ticks.map((s) => `${Math.round(s / 60)}`),
          label: 'minutes since heat on',
          labelSize: 18,
        },
        {
          stroke: themeColour('--ink-soft', '#666'),
          grid: { stroke: themeColour('--grid', '#8884'), width: 1 },
          size: 44,
          label: 'head °C',
          labelSize: 18,
        },
      ],
      series: [
        {},
        { stroke: themeColour('--trace', '#0b7285'), width: 2, points: { show: false }, spanGaps: false },
      ],
    };
    const chart = new uPlot(options, [readings.timeS, readings.headC], element);
    plot.current = chart;
    const resize = new ResizeObserver(() => chart.setSize({ width: element.clientWidth, height: 220 }));
    resize.observe(element);
    return () => {
      resize.disconnect();
      if (pending.current !== null) clearTimeout(pending.current);
      chart.destroy();
      plot.current = null;
    };
  }, [readings]);

  useEffect(() => {
    const draw = () => {
      pending.current = null;
      lastDraw.current = performance.now();
      plot.current?.setData([readings.timeS, readings.headC]);
    };
    const wait = minRedrawMs - (performance.now() - lastDraw.current);
    if (wait <= 0) draw();
    else if (pending.current === null) pending.current = window.setTimeout(draw, wait);
  }, [readings, version, minRedrawMs]);

  return <div class="trace-chart" ref={host} role="img" aria-label="Head temperature trace" />;
}
