import type { RunWindow } from '../../run/index.ts';

/**
 * The planner's windows made fit for the run's detector, which needs windows that do not
 * overlap (a temperature belongs to one receiver): the planner widens each window by its
 * thermometer allowance, so neighbours can share a few tenths of a degree; split each shared
 * span at its middle. Returns new objects, sorted by temperature.
 */
export function tidyWindows(windows: readonly RunWindow[]): RunWindow[] {
  const sorted = windows.map((w) => ({ ...w })).sort((a, b) => a.fromC - b.fromC);
  for (let i = 1; i < sorted.length; i++) {
    const below = sorted[i - 1]!;
    const above = sorted[i]!;
    if (above.fromC < below.toC) {
      const middle = (above.fromC + below.toC) / 2;
      below.toC = middle;
      above.fromC = middle;
    }
  }
  return sorted.filter((w) => w.toC > w.fromC);
}
