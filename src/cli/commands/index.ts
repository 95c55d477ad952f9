import type { Command } from '../command.ts';
import { tc } from './tc.ts';

// One line per command; each lives in its own file in this folder.
export const commands: Command[] = [
  tc,
];
