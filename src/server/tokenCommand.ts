import { hostname } from 'node:os';
import { resolve } from 'node:path';
import { parseArgs } from '../cli/args.ts';
import { UsageError, type CommandIo } from '../cli/command.ts';
import { openLabDatabase } from './labDatabase.ts';
import { syncLink } from './syncLink.ts';
import { createToken, listTokens, revokeToken } from './tokens.ts';

export const tokenHelp = `Usage: npm run server -- token <create LABEL | list | revoke ID> [options]

Tokens let phones send runs to this lab server: one token per phone.
  token create "hood 3 phone"   makes a token and prints it once, with a link for the phone
  token list                    shows every token (never the token itself)
  token revoke 3                stops token 3 at once; the runs it sent stay

Options:
  --data DIR      the server's data folder (default ./data, as for npm start)
  --server URL    the address phones reach this server at (default http://<this host>:8080/)
  --app URL       where the phones open the app, if not from this server (default: --server)`;

/** `token ...` from `npm run server --`. Resolves to the exit code. */
export function runTokenCommand(args: string[], io: CommandIo): number {
  const parsed = parseArgs(args, { values: ['data', 'server', 'app'] });
  if (parsed.options.has('help')) {
    io.out(tokenHelp);
    return 0;
  }
  const [verb, ...rest] = parsed.positional;
  const dataDir = resolve(parsed.options.get('data') ?? 'data');
  if (verb !== 'create' && verb !== 'list' && verb !== 'revoke') {
    throw new UsageError(verb ? `unknown token command "${verb}": use create, list or revoke` : 'say create, list or revoke (see --help)');
  }
  const db = openLabDatabase(dataDir);
  try {
    if (verb === 'create') {
      const label = rest.join(' ').trim();
      if (!label) throw new UsageError('token create needs a label, e.g. token create "hood 3 phone"');
      const server = parsed.options.get('server') ?? `http://${hostname()}:8080/`;
      // Checked before the token is made, so a typo leaves no unused token behind.
      syncLink(server, parsed.options.get('app') ?? null, 'check');
      const { id, token } = createToken(db, label);
      io.out(`Token ${id} for "${label}" (shown once, keep it like a password):`);
      io.out(`  ${token}`);
      io.out('Open this link on the phone to set it up:');
      io.out(`  ${syncLink(server, parsed.options.get('app') ?? null, token)}`);
      return 0;
    }
    if (verb === 'list') {
      const tokens = listTokens(db);
      if (tokens.length === 0) io.out('No tokens yet: npm run server -- token create "hood 3 phone"');
      for (const t of tokens) {
        io.out(`${t.id}\t${t.revokedAt ? `revoked ${t.revokedAt}` : 'active'}\tcreated ${t.createdAt}\t${t.label}`);
      }
      return 0;
    }
    const id = Number(rest[0]);
    if (rest.length !== 1 || !Number.isInteger(id) || id < 1) throw new UsageError('token revoke needs one token number (see token list)');
    if (!revokeToken(db, id)) throw new UsageError(`there is no token ${id} (see token list)`);
    io.out(`Token ${id} is revoked.`);
    return 0;
  } finally {
    db.close();
  }
}
