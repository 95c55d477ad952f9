/**
 * The reading of a probe with a first-order response (time constant `tauS`, s) to `valueC`
 * sampled at `timeS`. The input is taken as linear between samples and the step is solved
 * exactly, so irregular spacing and steps longer than tau are handled without error.
 * Returns a new array; the probe starts in equilibrium with the first value.
 */
export function firstOrderLag(timeS: Float64Array, valueC: Float64Array, tauS: number): Float64Array {
  if (timeS.length !== valueC.length) throw new RangeError('time and value arrays differ in length');
  if (!(tauS >= 0)) throw new RangeError('lag time constant must be >= 0 s');
  const out = new Float64Array(valueC.length);
  if (valueC.length === 0) return out;
  out[0] = valueC[0]!;
  for (let i = 1; i < valueC.length; i++) {
    const h = timeS[i]! - timeS[i - 1]!;
    const x0 = valueC[i - 1]!, x1 = valueC[i]!, y0 = out[i - 1]!;
    if (tauS === 0 || !(h > 0)) {
      out[i] = tauS === 0 ? x1 : y0;
      continue;
    }
    // dy/dt = (x - y)/tau with x = x0 + s t: y(h) = x1 - s tau + (y0 - x0 + s tau) e^(-h/tau).
    const s = (x1 - x0) / h;
    out[i] = x1 - s * tauS + (y0 - x0 + s * tauS) * Math.exp(-h / tauS);
  }
  return out;
}
