import type { Figures } from '../../science/index.ts';
import { isOutsideExpected, type ExpectedPlateau } from '../../signal/index.ts';

/**
 * The watcher's state in words for the Watch screen (DESIGN.md detector states); a plateau
 * outside the plan's expected plateaus is named a mixed fraction, as the watcher takes it.
 */
export function stateWords(state: string, plateauC: number | null, hasVapour: boolean, figures: Figures, expected: readonly ExpectedPlateau[] = []): string {
  switch (state) {
    case 'cold':
      return hasVapour ? 'Waiting for vapour' : 'Heating';
    case 'rising':
      return 'Vapour rising';
    case 'plateau':
      if (plateauC === null || !Number.isFinite(plateauC)) return 'Steady';
      return `Steady at ${figures.temperature(plateauC)}${isOutsideExpected(expected, plateauC) ? ': a mixed fraction' : ''}`;
    case 'leaving':
      return 'Rising: next fraction coming';
    case 'stalled':
      return 'Stalled: check the heat';
    case 'fault':
      return 'Sensor problem';
    default:
      return state;
  }
}
