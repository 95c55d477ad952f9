import { useEffect, useRef } from 'preact/hooks';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import { temperatureScaleLabel, toTemperatureScale, type TemperatureScale } from '../../science/units/index.ts';

/** Head temperature against cumulative distilled volume (a distillation curve), drawn once. */
export function VolumeChart({ volumeMl, headC, height = 200, scale = 'degC' }: { volumeMl: Float64Array; headC: Float64Array; height?: number; scale?: TemperatureScale }) {
  const host = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const element = host.current;
    if (!element || volumeMl.length === 0) return;
    const ink = getComputedStyle(document.documentElement).getPropertyValue('--ink-soft').trim() || '#555';
    const chart = new uPlot(
      {
        width: element.clientWidth || 360,
        height,
        legend: { show: false },
        cursor: { show: false },
        scales: { x: { time: false } },
        axes: [{ stroke: ink, label: 'distilled, mL', size: 40 }, { stroke: ink, label: temperatureScaleLabel[scale], size: 44 }],
        series: [{}, { stroke: getComputedStyle(document.documentElement).getPropertyValue('--trace').trim() || '#0b7285', width: 2, points: { show: false } }],
      },
      [volumeMl, scale === 'degC' ? headC : headC.map((c) => toTemperatureScale(c, scale))],
      element,
    );
    const resize = new ResizeObserver(() => chart.setSize({ width: element.clientWidth, height }));
    resize.observe(element);
    return () => {
      resize.disconnect();
      chart.destroy();
    };
  }, [volumeMl, headC, height, scale]);
  return <div class="trace-chart volume-chart" ref={host} role="img" aria-label={`Head temperature, ${temperatureScaleLabel[scale]}, against distilled volume, mL`} />;
}
