import type { Compound } from '../compounds/compound.ts';
import { tSatK } from '../compounds/vapourPressure.ts';
import { ConvergenceError } from '../vle/convergenceError.ts';
import { dewT } from '../vle/equilibrium.ts';
import type { PairAzeotropes } from '../vle/findAzeotropes.ts';
import type { ThermoModel } from '../vle/thermoModel.ts';

/** Where the head temperature may hold while one component, or an azeotrope, comes over. */
export interface ExpectedPlateau {
  /** The compound, or "a + b azeotrope". */
  label: string;
  /** Units: K */
  fromTK: number;
  toTK: number;
  /**
   * Whether the column can bring this component's top vapour to 90 % (an azeotrope, or a
   * component of one: always).
   * False for a column too short for it: at the most it can do, total reflux, its vapour stays
   * mixed, so a steady head in this band is a mixed stretch the head is passing through.
   */
  reachesPurity: boolean;
}

/** Top vapour still counted as one component (the run watcher's benchmark truth: 90 %). */
const PURITY = 0.9;
/** A thermometer bulb set a little high, or a draught, reads a degree or two low (common
 * practice); and a plateau's level is told within 1.5 degC (the benchmark's plateau rule). */
const BELOW_K = 2.5;
const ABOVE_K = 1.5;

/**
 * The head temperatures a plateau of each component can have at the lab's pressure: the dew
 * points of its vapour with a tenth of any lighter component (the lowest) to those with a tenth of
 * any heavier one (the highest), the pure boiling point for none, widened for the thermometer; each
 * azeotrope of a pair is a plateau of its own about its temperature. A steady head outside all of
 * them is a mixed stretch: no component is coming over nearly pure. Where a dew point will not
 * converge (a strongly associating pair, such as an acid with a base), nothing is expected: the
 * watcher then takes every plateau as a component's, as with no charge known, rather than call
 * a component's plateau mixed.
 *
 * `peakHeadFraction`, if given, is the most of each compound (in `compounds` order) the head's
 * vapour holds at any point of the run at total reflux (the planner's estimate, simulateTotalReflux):
 * a finite reflux separates less than total reflux with the same plates (Fenske's minimum stages
 * are those at total reflux; Seader & Henley, Separation Process Principles, from memory), so a
 * compound short of 90 % there is short of it in any run of this column.
 */
export function expectedPlateaus(compounds: readonly Compound[], pPa: number, model: ThermoModel, azeotropes: readonly PairAzeotropes[], peakHeadFraction?: readonly number[]): ExpectedPlateau[] {
  if (!(pPa > 0)) throw new RangeError(`pressure must be > 0 Pa (got ${pPa})`);
  const order = compounds.map((c, i) => ({ c, i, tK: tSatK(c, pPa).tK })).sort((a, b) => a.tK - b.tK);
  const withTenthOf = (main: number, other: number): number => {
    const y = compounds.map(() => 0);
    y[order[main]!.i] = PURITY;
    y[order[other]!.i] = 1 - PURITY;
    return dewT(compounds, y, pPa, model).tK;
  };
  let bands: ExpectedPlateau[];
  try {
    bands = order.map((o, k) => {
      const dews = order.map((_, j) => (j === k ? o.tK : withTenthOf(k, j)));
      // A compound in an azeotrope of the charge comes over as the constant-boiling mixture, which
      // holds the head as steady as a pure vapour would: its top vapour need not reach 90 %.
      const peak = peakHeadFraction?.[o.i];
      const formsAzeotrope = azeotropes.some((pair) => pair.azeotropes.length > 0 && pair.pair.includes(o.c.name));
      const reachesPurity = peak === undefined || peak >= PURITY || formsAzeotrope;
      return { label: o.c.name, fromTK: Math.min(...dews) - BELOW_K, toTK: Math.max(...dews) + ABOVE_K, reachesPurity };
    });
  } catch (error) {
    if (error instanceof ConvergenceError) return [];
    throw error;
  }
  for (const pair of azeotropes) {
    for (const azeotrope of pair.azeotropes) {
      bands.push({ label: `${pair.pair[0]} + ${pair.pair[1]} azeotrope`, fromTK: azeotrope.tK - BELOW_K, toTK: azeotrope.tK + ABOVE_K, reachesPurity: true });
    }
  }
  return bands;
}
