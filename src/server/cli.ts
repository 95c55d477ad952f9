// `npm run server -- token create "hood 3 phone"` (and token list, token revoke ID).
import { readFile } from 'node:fs/promises';
import { UsageError } from '../cli/command.ts';
import { runTokenCommand, tokenHelp } from './tokenCommand.ts';

const io = {
  out: (line: string) => console.log(line),
  err: (line: string) => console.error(line),
  readFile: (path: string) => readFile(path, 'utf8'),
};

const [command, ...args] = process.argv.slice(2);
try {
  if (command === 'token') {
    process.exitCode = runTokenCommand(args, io);
  } else if (command === undefined || command === '--help' || command === 'help') {
    io.out(tokenHelp);
    io.out('\nTo serve the app and the API: npm start -- [--port 8080] [--data DIR] [--allow-origin ORIGIN] [--proxy-address ADDR] (npm start -- --help)');
  } else {
    throw new UsageError(`unknown command "${command}": the server's command line has "token"`);
  }
} catch (error) {
  if (error instanceof UsageError || error instanceof RangeError) {
    io.err(`cutbell server: ${error.message}`);
    process.exitCode = 2;
  } else {
    throw error;
  }
}
