import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { databaseFileName, openLabDatabase } from '../../src/server/labDatabase.ts';
import { runTokenCommand } from '../../src/server/tokenCommand.ts';
import { createToken, findToken, hashToken, listTokens, revokeToken } from '../../src/server/tokens.ts';

const dirs: string[] = [];
const tempDir = () => {
  const dir = mkdtempSync(join(tmpdir(), 'cutbell-tokens-'));
  dirs.push(dir);
  return dir;
};
afterEach(() => {
  for (const dir of dirs.splice(0)) rmSync(dir, { recursive: true, force: true });
});

function fakeIo() {
  const out: string[] = [];
  return { out, io: { out: (l: string) => out.push(l), err: (l: string) => out.push(l), readFile: async () => '' } };
}

describe('tokens', () => {
  it('createToken keeps only the SHA-256 of the token, and findToken knows it until revokeToken', () => {
    const dir = tempDir();
    const db = openLabDatabase(dir);
    const { id, token } = createToken(db, 'hood 3 phone');
    // 32 random bytes in base64url are 43 characters.
    expect(token).toMatch(/^cb1\.[A-Za-z0-9_-]{43}$/);
    expect(findToken(db, token)?.label).toBe('hood 3 phone');
    expect(findToken(db, `${token}x`)).toBeNull();
    expect(revokeToken(db, id)).toBe(true);
    expect(findToken(db, token)).toBeNull();
    expect(listTokens(db)[0]?.revokedAt).not.toBeNull();
    expect(revokeToken(db, 999)).toBe(false);
    db.pragma('wal_checkpoint(TRUNCATE)');
    db.close();
    const file = readFileSync(join(dir, databaseFileName));
    expect(file.includes(Buffer.from(token))).toBe(false);
    expect(file.includes(Buffer.from(hashToken(token)))).toBe(true);
  });

  it('createToken refuses an empty label', () => {
    const db = openLabDatabase(tempDir());
    expect(() => createToken(db, '  ')).toThrow(RangeError);
    db.close();
  });
});

describe('npm run server -- token', () => {
  it('token create prints the token once and a set-up link; list shows it without the token; revoke stops it', () => {
    const dir = tempDir();
    const created = fakeIo();
    expect(runTokenCommand(['create', 'hood 3 phone', '--data', dir, '--server', 'https://lab-pc:8443/'], created.io)).toBe(0);
    const token = created.out[1]!.trim();
    expect(created.out[3]!.trim()).toBe(`https://lab-pc:8443/#sync=${encodeURIComponent(token)}`);

    const listed = fakeIo();
    runTokenCommand(['list', '--data', dir], listed.io);
    expect(listed.out).toHaveLength(1);
    expect(listed.out[0]).toMatch(/^1\tactive\t.*hood 3 phone$/);
    expect(listed.out.join('\n')).not.toContain(token);

    expect(runTokenCommand(['revoke', '1', '--data', dir], fakeIo().io)).toBe(0);
    const db = openLabDatabase(dir);
    expect(findToken(db, token)).toBeNull();
    db.close();
  });

  it('token create with --app puts the server in the link', () => {
    const made = fakeIo();
    runTokenCommand(['create', 'bench', '--data', tempDir(), '--server', 'http://lab-pc:8080', '--app', 'https://app.example/cutbell/'], made.io);
    expect(made.out[3]!.trim()).toMatch(/^https:\/\/app\.example\/cutbell\/#server=http%3A%2F%2Flab-pc%3A8080&sync=cb1\./);
  });

  it('refuses a missing label, an unknown verb and a bad id with a usage error', () => {
    const dir = tempDir();
    expect(() => runTokenCommand(['create', '--data', dir], fakeIo().io)).toThrow(/label/);
    expect(() => runTokenCommand(['mint', '--data', dir], fakeIo().io)).toThrow(/unknown token command/);
    expect(() => runTokenCommand(['revoke', 'x', '--data', dir], fakeIo().io)).toThrow(/token number/);
    expect(() => runTokenCommand(['revoke', '7', '--data', dir], fakeIo().io)).toThrow(/no token 7/);
  });
});
