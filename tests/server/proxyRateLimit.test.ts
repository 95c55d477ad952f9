// Failed-token limiting behind a lab's reverse proxy, against real servers on 127.0.0.1: the
// test's own connections come from 127.0.0.1, which plays the proxy when it is configured.
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { openLabDatabase } from '../../src/server/labDatabase.ts';
import { createToken } from '../../src/server/tokens.ts';
import { startTestLab, type TestLab } from './support/testLab.ts';

const labs: TestLab[] = [];
afterAll(async () => {
  for (const lab of labs) await lab.close();
});

async function lab(options: { proxyAddresses?: string[]; proxyHeader?: 'x-forwarded-for' | 'forwarded' }) {
  const started = await startTestLab({ failureLimit: 3, failureWindowMs: 60_000, ...options });
  labs.push(started);
  return started;
}

/** GET /api/runs as a phone: `token` (null: none) and the headers a proxy would add. */
function list(target: TestLab, token: string | null, headers: Record<string, string> = {}): Promise<number> {
  const all = new Headers(headers);
  if (token !== null) all.set('authorization', `Bearer ${token}`);
  return fetch(new URL('api/runs', target.url), { headers: all }).then((r) => r.status);
}

/** Three wrong tokens from one phone: its limit. */
async function guessThrice(target: TestLab, headers: Record<string, string>) {
  for (let i = 0; i < 3; i++) expect(await list(target, `cb1.guess-${i}`, headers)).toBe(401);
}

describe('failed-token limit behind a configured proxy', () => {
  it('limits each phone behind the proxy on its own: one guessing phone does not lock out another', async () => {
    const proxied = await lab({ proxyAddresses: ['127.0.0.1'] });
    await guessThrice(proxied, { 'x-forwarded-for': '192.0.2.10' });
    expect(await list(proxied, proxied.token, { 'x-forwarded-for': '192.0.2.10' })).toBe(429);
    expect(await list(proxied, proxied.token, { 'x-forwarded-for': '192.0.2.11' })).toBe(200);
  });

  it('a phone cannot escape its limit by putting an address of its choice before its own', async () => {
    const proxied = await lab({ proxyAddresses: ['127.0.0.1'] });
    await guessThrice(proxied, { 'x-forwarded-for': '192.0.2.20' });
    // The proxy appends the address it was reached from; what the phone sent stays to the left.
    expect(await list(proxied, proxied.token, { 'x-forwarded-for': '198.51.100.99, 192.0.2.20' })).toBe(429);
  });

  it('looks past a second listed proxy to the phone', async () => {
    const proxied = await lab({ proxyAddresses: ['127.0.0.1', '10.20.0.0/16'] });
    await guessThrice(proxied, { 'x-forwarded-for': '192.0.2.30, 10.20.1.1' });
    expect(await list(proxied, proxied.token, { 'x-forwarded-for': '192.0.2.30, 10.20.9.9' })).toBe(429);
    expect(await list(proxied, proxied.token, { 'x-forwarded-for': '192.0.2.31, 10.20.1.1' })).toBe(200);
  });

  it('reads RFC 7239 Forwarded when configured so, and then not X-Forwarded-For', async () => {
    const proxied = await lab({ proxyAddresses: ['127.0.0.1'], proxyHeader: 'forwarded' });
    await guessThrice(proxied, { forwarded: 'for="[2001:db8:cafe::17]:4711";proto=https' });
    expect(await list(proxied, proxied.token, { forwarded: 'for="[2001:db8:cafe::17]"' })).toBe(429);
    expect(await list(proxied, proxied.token, { forwarded: 'for=192.0.2.40' })).toBe(200);
    // No Forwarded: the request is the proxy's own, and X-Forwarded-For does not move it elsewhere.
    await guessThrice(proxied, { 'x-forwarded-for': '192.0.2.41' });
    expect(await list(proxied, proxied.token, { 'x-forwarded-for': '192.0.2.42' })).toBe(429);
  });
});

describe('failed-token limit without a configured proxy', () => {
  it('never trusts X-Forwarded-For: rotating it does not give a guesser a fresh limit', async () => {
    const direct = await lab({});
    for (let i = 0; i < 3; i++) expect(await list(direct, `cb1.guess-${i}`, { 'x-forwarded-for': `192.0.2.${50 + i}` })).toBe(401);
    expect(await list(direct, direct.token, { 'x-forwarded-for': '192.0.2.99' })).toBe(429);
  });

  it('ignores the header when the peer is not one of the configured proxies', async () => {
    const elsewhere = await lab({ proxyAddresses: ['10.0.0.2'] });
    for (let i = 0; i < 3; i++) expect(await list(elsewhere, `cb1.guess-${i}`, { 'x-forwarded-for': `192.0.2.${60 + i}` })).toBe(401);
    expect(await list(elsewhere, elsewhere.token, { 'x-forwarded-for': '192.0.2.99' })).toBe(429);
  });
});

describe('npm start options for the proxy', () => {
  const root = fileURLToPath(new URL('../../', import.meta.url));
  const temp = mkdtempSync(join(tmpdir(), 'cutbell-proxy-'));
  afterAll(() => rmSync(temp, { recursive: true, force: true }));

  /** Runs src/server/main.ts; resolves with its address once it serves, or with its exit and output. */
  function main(args: string[], env: Record<string, string> = {}) {
    const child = spawn(process.execPath, ['--import', 'tsx', 'src/server/main.ts', ...args], {
      cwd: root,
      env: { ...process.env, ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    return new Promise<{ url: string | null; code: number | null; output: string; stop: () => void }>((resolve) => {
      let output = '';
      const stop = () => child.kill('SIGTERM');
      const onData = (chunk: Buffer) => {
        output += chunk.toString();
        const match = /served at (http:\/\/127\.0\.0\.1:\d+\/)/.exec(output);
        if (match) resolve({ url: match[1]!, code: null, output, stop });
      };
      child.stdout.on('data', onData);
      child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
      child.once('exit', (code) => resolve({ url: null, code, output, stop }));
    });
  }

  function dataWithToken(name: string) {
    const dataDir = join(temp, name, 'data');
    const distDir = join(temp, name, 'dist');
    mkdirSync(distDir, { recursive: true });
    writeFileSync(join(distDir, 'index.html'), '<!doctype html>');
    const db = openLabDatabase(dataDir);
    const { token } = createToken(db, 'proxy test phone');
    db.close();
    return { token, args: ['--host', '127.0.0.1', '--port', '0', '--data', dataDir, '--dist', distDir] };
  }

  async function expectPerPhoneLimit(url: string, token: string) {
    const status = (t: string, phone: string) => fetch(new URL('api/runs', url), { headers: { authorization: `Bearer ${t}`, 'x-forwarded-for': phone } }).then((r) => r.status);
    for (let i = 0; i < 10; i++) expect(await status(`cb1.guess-${i}`, '192.0.2.70')).toBe(401);
    expect(await status(token, '192.0.2.70')).toBe(429);
    expect(await status(token, '192.0.2.71')).toBe(200);
  }

  it('--proxy-address makes the server tell phones behind the proxy apart', async () => {
    const { token, args } = dataWithToken('flag');
    const server = await main([...args, '--proxy-address', '127.0.0.1']);
    try {
      expect(server.url, server.output).not.toBeNull();
      expect(server.output).toMatch(/told apart by x-forwarded-for on requests from 127\.0\.0\.1/);
      await expectPerPhoneLimit(server.url!, token);
    } finally {
      server.stop();
    }
  });

  it('CUTBELL_PROXY_ADDRESSES does the same from the environment', async () => {
    const { token, args } = dataWithToken('env');
    const server = await main(args, { CUTBELL_PROXY_ADDRESSES: '10.9.9.9, 127.0.0.1' });
    try {
      expect(server.url, server.output).not.toBeNull();
      await expectPerPhoneLimit(server.url!, token);
    } finally {
      server.stop();
    }
  });

  it('refuses a proxy that is not an address with a one-line error and exit code 2, and --help describes the option', async () => {
    const { args } = dataWithToken('bad');
    const bad = await main([...args, '--proxy-address', 'lab-proxy.local']);
    expect(bad.code).toBe(2);
    expect(bad.output.trim()).toBe('cutbell server: --proxy-address: "lab-proxy.local" is not a proxy address such as 10.0.0.2, fd00::2 or 10.0.0.0/24');
    const help = await main(['--help']);
    expect(help.code).toBe(0);
    expect(help.output).toMatch(/--proxy-address ADDR/);
    expect(help.output).toMatch(/--proxy-header NAME/);
  });
});
