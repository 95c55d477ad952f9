#!/usr/bin/env node
// The command line: the same pure core as the app, from a terminal.
import { readFile } from 'node:fs/promises';
import { UsageError, type CommandIo } from './command.ts';
import { commands } from './commands/index.ts';

const io: CommandIo = {
  out: (line) => process.stdout.write(`${line}\n`),
  err: (line) => process.stderr.write(`${line}\n`),
  readFile: (path) => readFile(path, 'utf8'),
};

function usage(): string {
  const width = Math.max(...commands.map((c) => c.name.length), 4);
  return [
    'usage: cutbell <command> [options]   (npm run --silent cutbell -- <command> ...)',
    '',
    'commands:',
    ...commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    'Each command has --help. Quantities carry their units: 101.3kPa, 745mmHg, 60mL, 3s.',
  ].join('\n');
}

export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === 'help' || name === '-h') {
    io.out(usage());
    return name === undefined ? 2 : 0;
  }
  const command = commands.find((c) => c.name === name);
  if (!command) {
    io.err(`cutbell: unknown command "${name}" (try --help)`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.out(command.help);
    return 0;
  }
  try {
    return await command.run(rest, io);
  } catch (error) {
    if (error instanceof UsageError || error instanceof RangeError) {
      io.err(`cutbell ${name}: ${error.message}`);
      return 2;
    }
    io.err(`cutbell ${name}: ${error instanceof Error ? error.message : String(error)}`);
    return 1;
  }
}

process.exitCode = await main(process.argv.slice(2));
