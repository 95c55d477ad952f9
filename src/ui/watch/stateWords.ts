import type { Figures } from '../../science/index.ts';

/** The watcher's state in words for the Watch screen (DESIGN.md detector states). */
export function stateWords(state: string, plateauC: number | null, hasVapour: boolean, figures: Figures): string {
  switch (state) {
    case 'cold':
      return hasVapour ? 'Waiting for vapour' : 'Heating';
    case 'rising':
      return 'Vapour rising';
    case 'plateau':
      return plateauC !== null && Number.isFinite(plateauC) ? `Steady at ${figures.temperature(plateauC)}` : 'Steady';
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
