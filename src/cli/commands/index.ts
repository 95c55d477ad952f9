import type { Command } from '../command.ts';
import { analyze } from './analyze.ts';

// One line per command; each lives in its own file in this folder.
export const commands: Command[] = [
  analyze,
];
