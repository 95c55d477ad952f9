import type { Command } from '../command.ts';

// One line per command; each lives in its own file in this folder.
export const commands: Command[] = [
];
