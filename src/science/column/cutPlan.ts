/** One receiver's head-temperature window: it collects while fromC <= head < toC. Units: degC. */
export interface HeadTemperatureWindow {
  readonly receiver: number;
  readonly fromC: number;
  readonly toC: number;
}

/** One receiver in a plan cut by time or by distilled volume: it collects until the limit. */
export interface TimeCut {
  readonly receiver: number;
  /** Time since heat on when the receiver is changed. Units: s. */
  readonly untilS: number;
}
export interface VolumeCut {
  readonly receiver: number;
  /** Distilled volume (from the start) at which the receiver is changed. Units: m^3. */
  readonly untilM3: number;
}

/**
 * How distillate is shared among receivers. Windows are taken in plan order and never revisited,
 * as at the bench: once the head has moved on to a later window, a dip does not send distillate
 * back to an earlier receiver. Distillate outside every remaining window (or after the last cut)
 * is reported as unassigned.
 */
export type CutPlan =
  | { readonly by: 'head-temperature'; readonly windows: readonly HeadTemperatureWindow[] }
  | { readonly by: 'time'; readonly cuts: readonly TimeCut[] }
  | { readonly by: 'volume'; readonly cuts: readonly VolumeCut[] };
