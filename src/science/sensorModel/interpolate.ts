/**
 * Linear interpolation of the series (`timeS`, `valueC`) at `atS`, held flat beyond its ends.
 * `timeS` must be ascending. Walks both series once: `atS` must be ascending too.
 */
export function interpolateSorted(timeS: Float64Array, valueC: Float64Array, atS: Float64Array): Float64Array {
  if (timeS.length !== valueC.length) throw new RangeError('time and value arrays differ in length');
  if (timeS.length === 0) throw new RangeError('cannot interpolate an empty series');
  const out = new Float64Array(atS.length);
  const last = timeS.length - 1;
  let j = 0;
  for (let i = 0; i < atS.length; i++) {
    const t = atS[i]!;
    while (j < last && timeS[j + 1]! <= t) j++;
    if (t <= timeS[0]!) out[i] = valueC[0]!;
    else if (j >= last) out[i] = valueC[last]!;
    else {
      const t0 = timeS[j]!, t1 = timeS[j + 1]!;
      const f = (t - t0) / (t1 - t0);
      out[i] = valueC[j]! + f * (valueC[j + 1]! - valueC[j]!);
    }
  }
  return out;
}
