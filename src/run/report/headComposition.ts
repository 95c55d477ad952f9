import { prepareMixture, type Compound, type ThermoModel } from '../../science/index.ts';

/** Points on the dew-temperature curve tabulated for the inversion. */
const gridSize = 201;

/**
 * The model's reading of the head temperature: the bulb sits in vapour at its dew point, and
 * that vapour condenses to the distillate, so the distillate's composition is the vapour
 * composition whose dew temperature at the run's pressure equals the head temperature. The dew
 * curve of the binary is tabulated once and inverted by interpolation.
 *
 * Returns a function from head temperature (degC) to the first compound's mole fraction in the
 * distillate; temperatures beyond a pure boiling point give that pure compound. Throws when
 * the dew curve is not monotonic (an azeotrope: one temperature, two compositions).
 */
export function headCompositionModel(compounds: readonly [Compound, Compound], pressurePa: number, model: ThermoModel = 'ideal'): (headC: number) => number {
  if (!(pressurePa > 0) || !Number.isFinite(pressurePa)) throw new RangeError(`pressure must be > 0 Pa (got ${pressurePa})`);
  const mixture = prepareMixture(compounds, model);
  const y = new Float64Array(2);
  const x = new Float64Array(2);
  const firstFraction = new Float64Array(gridSize);
  const dewC = new Float64Array(gridSize);
  for (let i = 0; i < gridSize; i++) {
    const yFirst = i / (gridSize - 1);
    y[0] = yFirst;
    y[1] = 1 - yFirst;
    firstFraction[i] = yFirst;
    dewC[i] = mixture.dewTInto(y, pressurePa, x) - 273.15;
  }
  const isFalling = dewC[gridSize - 1]! < dewC[0]!;
  for (let i = 1; i < gridSize; i++) {
    const step = dewC[i]! - dewC[i - 1]!;
    if (isFalling ? !(step < 0) : !(step > 0)) {
      throw new RangeError(`${compounds[0].name} and ${compounds[1].name} have an azeotrope or a flat dew curve here: the head temperature does not fix the composition`);
    }
  }
  // Ascending temperature order for the search.
  const order = (k: number) => (isFalling ? gridSize - 1 - k : k);
  return (headC: number) => {
    if (!Number.isFinite(headC)) return NaN;
    if (headC <= dewC[order(0)]!) return firstFraction[order(0)]!;
    if (headC >= dewC[order(gridSize - 1)]!) return firstFraction[order(gridSize - 1)]!;
    let lo = 0;
    let hi = gridSize - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (dewC[order(mid)]! <= headC) lo = mid; else hi = mid;
    }
    const t0 = dewC[order(lo)]!;
    const t1 = dewC[order(hi)]!;
    const f = (headC - t0) / (t1 - t0);
    return firstFraction[order(lo)]! + f * (firstFraction[order(hi)]! - firstFraction[order(lo)]!);
  };
}

/**
 * Time-weighted mean of the distillate composition over a cut (a steady take-off rate makes
 * time a fair stand-in for volume). Each valid reading stands for half the interval to each
 * neighbour. Returns NaN when the cut has no valid reading.
 */
export function meanOverCut(
  readings: { time_s: ArrayLike<number>; head_c: ArrayLike<number | null> },
  fromS: number,
  toS: number,
  headToFraction: (headC: number) => number,
): number {
  const { time_s: times, head_c: heads } = readings;
  let sum = 0;
  let weight = 0;
  let count = 0;
  let plain = 0;
  for (let i = 0; i < times.length; i++) {
    const t = times[i]!;
    if (t < fromS || t > toS) continue;
    const h = heads[i];
    if (h == null || !Number.isFinite(h)) continue;
    const before = i > 0 ? Math.max(times[i - 1]!, fromS) : t;
    const after = i + 1 < times.length ? Math.min(times[i + 1]!, toS) : t;
    const w = Math.max(0, (after - before) / 2);
    const value = headToFraction(h);
    sum += w * value;
    weight += w;
    plain += value;
    count++;
  }
  if (count === 0) return NaN;
  return weight > 0 ? sum / weight : plain / count;
}
