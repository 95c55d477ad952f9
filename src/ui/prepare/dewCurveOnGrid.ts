/**
 * The dew line of a T-x-y diagram on the bubble line's x grid, so both share one x axis:
 * the points (y_i, T_i) sorted by y, and T read off by linear interpolation at each grid x
 * (NaN outside the range the sweep covered).
 */
export function dewCurveOnGrid(grid: ArrayLike<number>, y: ArrayLike<number>, tC: ArrayLike<number>): Float64Array {
  const order = Array.from({ length: y.length }, (_, i) => i).sort((a, b) => y[a]! - y[b]!);
  const ys = order.map((i) => y[i]!);
  const ts = order.map((i) => tC[i]!);
  const out = new Float64Array(grid.length);
  for (let g = 0; g < grid.length; g++) {
    const at = grid[g]!;
    if (ys.length === 0 || at < ys[0]! || at > ys[ys.length - 1]!) {
      out[g] = Number.NaN;
      continue;
    }
    let hi = 1;
    while (hi < ys.length - 1 && ys[hi]! < at) hi++;
    const lo = Math.max(0, hi - 1);
    const span = ys[hi]! - ys[lo]!;
    out[g] = span > 0 ? ts[lo]! + ((at - ys[lo]!) / span) * (ts[hi]! - ts[lo]!) : ts[lo]!;
  }
  return out;
}
