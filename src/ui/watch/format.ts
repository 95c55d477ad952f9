/** Elapsed time as h:mm:ss (or m:ss under an hour). */
export function formatElapsed(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '–:––';
  const s = Math.floor(seconds);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const ss = String(s % 60).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}

/** A temperature for the big display: one decimal, or a dash when there is no valid reading. */
export function formatHeadC(headC: number): string {
  return Number.isFinite(headC) ? headC.toFixed(1) : '––.–';
}

/** A signed rate in degC/min with one decimal. */
export function formatRate(ratePerMin: number): string {
  if (!Number.isFinite(ratePerMin)) return '–';
  const rounded = Math.round(ratePerMin * 10) / 10;
  const value = rounded === 0 ? 0 : rounded; // no "-0.0"
  return `${value > 0 ? '+' : value < 0 ? '−' : '±'}${Math.abs(value).toFixed(1)}`;
}
