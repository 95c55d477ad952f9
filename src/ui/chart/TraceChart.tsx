import { useEffect, useRef } from 'preact/hooks';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import { downsampleMinMax, type ReadingBuffer } from '../../run/index.ts';
import { temperatureScaleLabel, toTemperatureScale, type TemperatureScale } from '../../science/units/index.ts';
import { nanGaps } from './nanGaps.ts';

export interface TemperatureBand {
  fromC: number;
  toC: number;
  label: string;
}

export interface TraceMarker {
  timeS: number;
  label: string;
}

interface TraceChartProps {
  readings: ReadingBuffer;
  /** Bumped by the owner whenever readings were appended. */
  version: number;
  /** Show only the last this many seconds; the whole run when absent. */
  windowS?: number;
  /** Planned receiver windows, shaded. */
  bands?: TemperatureBand[];
  /** Events and cuts, drawn as thin vertical lines. */
  markers?: TraceMarker[];
  /** The simulator's expected head temperature, drawn faintly behind the readings. */
  prediction?: { time_s: number[]; head_c: number[] } | undefined;
  height?: number;
  label: string;
  /** The chemist's temperature scale; readings, bands and prediction are degC and drawn on it. */
  scale?: TemperatureScale;
  /** Least time between redraws; setData rebuilds every path. Units: ms */
  minRedrawMs?: number;
}

function cssColour(name: string, fallback: string): string {
  const value = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  return value || fallback;
}

/**
 * Head temperature against time since heat on. Redrawn at most twice a second; the whole-run
 * view is decimated (min/max per pixel column) so an 8-hour run at 10 readings a second draws
 * as fast as a short one.
 */
export function TraceChart({ readings, version, windowS, bands = [], markers = [], prediction, height = 200, label, scale = 'degC', minRedrawMs = 500 }: TraceChartProps) {
  const host = useRef<HTMLDivElement>(null);
  const plot = useRef<uPlot | null>(null);
  const lastDraw = useRef(0);
  const pending = useRef<number | null>(null);
  const overlay = useRef({ bands, markers, prediction, scale });
  overlay.current = { bands, markers, prediction, scale };
  const scratch = useRef({ t: new Float64Array(0), h: new Float64Array(0), shown: new Float64Array(0) });

  useEffect(() => {
    const element = host.current;
    if (!element) return;
    const ink = cssColour('--ink-soft', '#666');
    const grid = cssColour('--grid', '#8884');
    const bandFill = cssColour('--band', '#0b728522');
    const markerStroke = cssColour('--marker', '#b45309');
    const onScale = (tC: number) => toTemperatureScale(tC, overlay.current.scale);
    const options: uPlot.Options = {
      width: element.clientWidth || 360,
      height,
      legend: { show: false },
      cursor: { show: false },
      scales: {
        x: { time: false },
        // From room temperature or below to above the highest reading, in steps of ten.
        y: { range: (_u, min, max) => [Math.floor((Math.min(min, onScale(100)) - 2) / 10) * 10, Math.ceil((max + 2) / 10) * 10] },
      },
      axes: [
        { stroke: ink, grid: { stroke: grid, width: 1 }, values: (_u, ticks) => ticks.map((s) => `${Math.round(s / 60)}`), size: 32 },
        { stroke: ink, grid: { stroke: grid, width: 1 }, size: 40 },
      ],
      series: [
        {},
        {
          stroke: cssColour('--trace', '#0b7285'),
          width: 2,
          points: { show: false },
          spanGaps: false,
          // A lost sensor leaves NaN readings: show the gap instead of a line across it.
          gaps: (u, seriesIndex, from, to, found) => [
            ...found,
            ...nanGaps(u.data[0], u.data[seriesIndex] as ArrayLike<number>, from, to, (t) => Math.round(u.valToPos(t, 'x', true))),
          ],
        },
      ],
      hooks: {
        drawAxes: [
          (u) => {
            const { ctx, bbox } = u;
            ctx.save();
            ctx.fillStyle = bandFill;
            for (const band of overlay.current.bands) {
              const top = u.valToPos(onScale(band.toC), 'y', true);
              const bottom = u.valToPos(onScale(band.fromC), 'y', true);
              ctx.fillRect(bbox.left, top, bbox.width, bottom - top);
            }
            const expected = overlay.current.prediction;
            if (expected && expected.time_s.length > 1) {
              const [xMin, xMax] = [u.scales.x!.min!, u.scales.x!.max!];
              ctx.beginPath();
              let isDrawing = false;
              for (let i = 0; i < expected.time_s.length; i++) {
                const t = expected.time_s[i]!;
                if (t < xMin || t > xMax) {
                  isDrawing = false;
                  continue;
                }
                const x = u.valToPos(t, 'x', true);
                const y = u.valToPos(onScale(expected.head_c[i]!), 'y', true);
                if (isDrawing) ctx.lineTo(x, y);
                else ctx.moveTo(x, y);
                isDrawing = true;
              }
              ctx.strokeStyle = ink;
              ctx.globalAlpha = 0.35;
              ctx.lineWidth = 2 * devicePixelRatio;
              ctx.stroke();
            }
            ctx.restore();
          },
        ],
        draw: [
          (u) => {
            const { ctx, bbox } = u;
            const [xMin, xMax] = [u.scales.x!.min!, u.scales.x!.max!];
            ctx.save();
            ctx.strokeStyle = markerStroke;
            ctx.lineWidth = 2 * devicePixelRatio;
            ctx.setLineDash([6, 4]);
            for (const marker of overlay.current.markers) {
              if (marker.timeS < xMin || marker.timeS > xMax) continue;
              const x = u.valToPos(marker.timeS, 'x', true);
              ctx.beginPath();
              ctx.moveTo(x, bbox.top);
              ctx.lineTo(x, bbox.top + bbox.height);
              ctx.stroke();
            }
            ctx.restore();
          },
        ],
      },
    };
    const chart = new uPlot(options, [new Float64Array(0), new Float64Array(0)], element);
    plot.current = chart;
    const resize = new ResizeObserver(() => chart.setSize({ width: element.clientWidth, height }));
    resize.observe(element);
    return () => {
      resize.disconnect();
      if (pending.current !== null) clearTimeout(pending.current);
      chart.destroy();
      plot.current = null;
    };
  }, [readings, height]);

  useEffect(() => {
    const draw = () => {
      pending.current = null;
      lastDraw.current = performance.now();
      const chart = plot.current;
      if (!chart) return;
      const n = readings.length;
      let t = readings.timeS;
      let h = readings.headC;
      if (windowS !== undefined && n > 0) {
        const start = readings.indexAtOrAfter(t[n - 1]! - windowS);
        t = t.subarray(start);
        h = h.subarray(start);
      }
      const buckets = Math.max(50, Math.round(chart.width));
      if (t.length > 4 * buckets) {
        const need = 2 * buckets + 2;
        if (scratch.current.t.length < need) scratch.current = { ...scratch.current, t: new Float64Array(need), h: new Float64Array(need) };
        const count = downsampleMinMax(t, h, buckets, scratch.current.t, scratch.current.h);
        t = scratch.current.t.subarray(0, count);
        h = scratch.current.h.subarray(0, count);
      }
      if (scale !== 'degC') {
        if (scratch.current.shown.length < h.length) scratch.current.shown = new Float64Array(Math.max(h.length, 2 * scratch.current.shown.length));
        const shown = scratch.current.shown.subarray(0, h.length);
        for (let i = 0; i < h.length; i++) shown[i] = toTemperatureScale(h[i]!, scale);
        h = shown;
      }
      chart.setData([t, h]);
      if (windowS !== undefined && t.length > 0) {
        const end = t[t.length - 1]!;
        chart.setScale('x', { min: Math.max(0, end - windowS), max: Math.max(end, windowS) });
      }
    };
    const wait = minRedrawMs - (performance.now() - lastDraw.current);
    if (wait <= 0) draw();
    else if (pending.current === null) pending.current = window.setTimeout(draw, wait);
  }, [readings, version, windowS, minRedrawMs, bands, markers, prediction, scale]);

  return (
    <figure class="trace">
      <figcaption>{label}</figcaption>
      <div class="trace-chart" ref={host} role="img" aria-label={`${label}: head temperature, ${temperatureScaleLabel[scale]}, against minutes since heat on`} />
    </figure>
  );
}
