/**
 * Delay before the next try after `attempts` failures in a row: 10 s, 20 s, 40 s ... up to
 * 15 min, so a phone out of reach for an afternoon keeps trying without draining its battery.
 * Units: ms
 */
export function retryDelayMs(attempts: number): number {
  if (!(attempts >= 1)) return 0;
  return Math.min(15 * 60_000, 10_000 * 2 ** Math.min(attempts - 1, 20));
}
