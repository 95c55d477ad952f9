import { toTemperatureScaleDifference, type Figures } from '../../science/units/index.ts';

/** Elapsed time as h:mm:ss (or m:ss under an hour). */
export function formatElapsed(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '–:––';
  const s = Math.floor(seconds);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const ss = String(s % 60).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}

/** A head temperature for the big display on the chemist's scale: one decimal, or dashes when there is no valid reading. */
export function formatHead(headC: number, figures: Figures): string {
  return Number.isFinite(headC) ? figures.temperatureNumber(headC) : '––.–';
}

/** A signed rate (degC/min in) on the chemist's scale with one decimal. */
export function formatRate(ratePerMin: number, figures: Figures): string {
  if (!Number.isFinite(ratePerMin)) return '–';
  const perMin = toTemperatureScaleDifference(ratePerMin, figures.style.temperature);
  const rounded = Math.round(perMin * 10) / 10;
  const value = rounded === 0 ? 0 : rounded; // no "-0.0"
  return `${value > 0 ? '+' : value < 0 ? '−' : '±'}${figures.number(Math.abs(value), 1)}`;
}
