// The server killed with SIGKILL in the middle of uploads, then restarted on the same port:
// the phone's outbox retries, every run arrives once, and SQLite's integrity check passes.
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, expect, it } from 'vitest';
import { openLabDatabase } from '../../src/server/labDatabase.ts';
import { createToken } from '../../src/server/tokens.ts';
import { MemoryStore } from '../../src/store/index.ts';
import { Outbox } from '../../src/sync/index.ts';
import { demoRunRecord } from '../support/demoRunRecord.ts';

const root = fileURLToPath(new URL('../../', import.meta.url));
const temp = mkdtempSync(join(tmpdir(), 'cutbell-crash-'));
const children: ChildProcess[] = [];

afterAll(() => {
  for (const child of children) if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
  rmSync(temp, { recursive: true, force: true });
});

/** Starts `src/server/main.ts` as its own process; resolves with it and its address. */
function startServer(dataDir: string, distDir: string, port: number): Promise<{ child: ChildProcess; url: string }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/server/main.ts', '--host', '127.0.0.1', '--port', String(port), '--data', dataDir, '--dist', distDir], {
    cwd: root,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  return new Promise((resolve, reject) => {
    let output = '';
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      const match = /served at (http:\/\/127\.0\.0\.1:\d+\/)/.exec(output);
      if (match) {
        child.stdout!.off('data', onData);
        resolve({ child, url: match[1]! });
      }
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.once('exit', (code) => reject(new Error(`server exited (${code}) before it was ready: ${output}`)));
  });
}

const exited = (child: ChildProcess) => new Promise<void>((resolve) => (child.exitCode !== null || child.signalCode !== null ? resolve() : child.once('exit', () => resolve())));

it('every run arrives once after the server is SIGKILLed mid-upload and restarted, and the database checks ok', async () => {
  const dataDir = join(temp, 'data');
  const distDir = join(temp, 'dist');
  mkdirSync(distDir);
  writeFileSync(join(distDir, 'index.html'), '<!doctype html>');
  const setup = openLabDatabase(dataDir);
  const { token } = createToken(setup, 'crash phone');
  setup.close();

  const first = await startServer(dataDir, distDir, 0);
  const port = Number(new URL(first.url).port);
  const runCount = 12;
  const bodies = new Map<string, string>();
  for (let i = 0; i < runCount; i++) {
    const id = `crash-${i}`;
    bodies.set(id, JSON.stringify(demoRunRecord(id, 20_000, { startedAt: `2026-05-0${1 + (i % 9)}T10:00:00.000Z` })));
  }

  let puts = 0;
  let killed = false;
  const fetchFn: typeof fetch = (input, init) => {
    puts += 1;
    const sent = fetch(input, init);
    // The fifth upload is on its way when the server dies.
    if (puts === 5 && !killed) {
      killed = true;
      setTimeout(() => first.child.kill('SIGKILL'), 3);
    }
    return sent;
  };
  const outbox = new Outbox({
    store: new MemoryStore(),
    fetch: fetchFn,
    target: async () => ({ serverUrl: first.url, token }),
    runJson: async (id) => bodies.get(id) ?? null,
    nowMs: () => Date.now(),
  });
  for (const id of bodies.keys()) await outbox.queueRun(id);

  await outbox.flush();
  await exited(first.child);
  expect(first.child.signalCode).toBe('SIGKILL');
  const crashed = openLabDatabase(dataDir);
  const storedBeforeRestart = (crashed.prepare('SELECT COUNT(*) AS n FROM run_revisions').get() as { n: number }).n;
  crashed.close();
  // Killed part-way: the first four had answered, the rest had not been stored.
  expect(storedBeforeRestart).toBeGreaterThanOrEqual(4);
  expect(storedBeforeRestart).toBeLessThan(runCount);
  const afterCrash = await outbox.list();
  expect(afterCrash.some((s) => s.state === 'failed' && s.willRetry)).toBe(true);

  const second = await startServer(dataDir, distDir, port);
  for (let round = 0; round < 5 && (await outbox.list()).some((s) => s.state !== 'synced'); round++) await outbox.flush(true);
  const states = await outbox.list();
  expect(states.map((s) => s.state)).toEqual(Array(runCount).fill('synced'));

  second.child.kill('SIGTERM');
  await exited(second.child);
  const db = openLabDatabase(dataDir);
  try {
    expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    const rows = db.prepare('SELECT run_id, revision, body FROM run_revisions ORDER BY run_id').all() as { run_id: string; revision: number; body: Buffer }[];
    expect(rows.map((r) => r.run_id).sort()).toEqual([...bodies.keys()].sort());
    for (const row of rows) {
      expect(row.revision).toBe(1);
      expect(row.body.toString('utf8')).toBe(bodies.get(row.run_id));
    }
  } finally {
    db.close();
  }
}, 60_000);
