// 50 phones at once, each sending 8-hour runs (288,000 readings, one every 0.1 s) to a lab
// server on 127.0.0.1 through the real outbox. Prints runs per second, the server's largest
// resident memory and the failed uploads (there should be none).
// Run: npx tsx bench/sync-load.bench.ts [clients=50] [runsPerClient=2]
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { openLabDatabase } from '../src/server/labDatabase.ts';
import { createToken } from '../src/server/tokens.ts';
import { MemoryStore } from '../src/store/index.ts';
import { Outbox } from '../src/sync/index.ts';
import { demoRunRecord } from '../tests/support/demoRunRecord.ts';

const clients = Number(process.argv[2] ?? 50);
const runsPerClient = Number(process.argv[3] ?? 2);
const readingsPerRun = 288_000; // 8 h at one reading every 0.1 s
const root = fileURLToPath(new URL('../', import.meta.url));
const temp = mkdtempSync(join(tmpdir(), 'cutbell-sync-bench-'));

/** Resident memory now and at its peak (Linux /proc). Units: bytes */
function memoryOf(pid: number): { rss: number; peak: number } {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (field: string) => Number(new RegExp(`${field}:\\s+(\\d+) kB`).exec(status)?.[1] ?? NaN) * 1024;
  return { rss: kb('VmRSS'), peak: kb('VmHWM') };
}

const dataDir = join(temp, 'data');
const distDir = join(temp, 'dist');
mkdirSync(distDir);
writeFileSync(join(distDir, 'index.html'), '<!doctype html>');
const setup = openLabDatabase(dataDir);
const tokens = Array.from({ length: clients }, (_, i) => createToken(setup, `bench phone ${i + 1}`).token);
setup.close();

const server = spawn(process.execPath, ['--import', 'tsx', 'src/server/main.ts', '--host', '127.0.0.1', '--port', '0', '--data', dataDir, '--dist', distDir], {
  cwd: root,
  stdio: ['ignore', 'pipe', 'inherit'],
});
const url = await new Promise<string>((resolve, reject) => {
  let out = '';
  server.stdout!.on('data', (chunk: Buffer) => {
    out += chunk.toString();
    const match = /served at (http:\/\/127\.0\.0\.1:\d+\/)/.exec(out);
    if (match) resolve(match[1]!);
  });
  server.once('exit', (code) => reject(new Error(`server exited (${code})`)));
});
const idleMemory = memoryOf(server.pid!);

// One 8-hour record, re-labelled per run: building 100 of them would time the generator.
const template = JSON.stringify(demoRunRecord('RUNID', readingsPerRun, { stepS: 0.1 }));
const bodyBytes = Buffer.byteLength(template);

let peakRss = idleMemory.rss;
const sampler = setInterval(() => {
  peakRss = Math.max(peakRss, memoryOf(server.pid!).rss);
}, 20);

const latenciesMs: number[] = [];
const started = performance.now();
const outcomes = await Promise.all(
  tokens.map(async (token, c) => {
    const ids = Array.from({ length: runsPerClient }, (_, r) => `bench-${c}-${r}`);
    const outbox = new Outbox({
      store: new MemoryStore(),
      fetch: async (input, init) => {
        const t0 = performance.now();
        const response = await fetch(input, init);
        latenciesMs.push(performance.now() - t0);
        return response;
      },
      target: async () => ({ serverUrl: url, token }),
      runJson: async (id) => template.replace('"id":"RUNID"', `"id":"${id}"`),
      nowMs: () => Date.now(),
    });
    for (const id of ids) await outbox.queueRun(id);
    await outbox.flush();
    return outbox.list();
  }),
);
const elapsedS = (performance.now() - started) / 1000;
clearInterval(sampler);
const finalMemory = memoryOf(server.pid!);
peakRss = Math.max(peakRss, finalMemory.rss);

const statuses = outcomes.flat();
const failed = statuses.filter((s) => s.state !== 'synced');
server.kill('SIGTERM');
await new Promise((resolve) => server.once('exit', resolve));
const check = openLabDatabase(dataDir);
const stored = (check.prepare('SELECT COUNT(*) AS n FROM run_revisions').get() as { n: number }).n;
const integrity = check.pragma('integrity_check', { simple: true });
check.close();
rmSync(temp, { recursive: true, force: true });

latenciesMs.sort((a, b) => a - b);
const at = (q: number) => latenciesMs[Math.min(latenciesMs.length - 1, Math.floor(q * latenciesMs.length))] ?? NaN;
const mib = (bytes: number) => (bytes / 1024 / 1024).toFixed(0);
console.log(`sync load: ${clients} clients x ${runsPerClient} runs of ${readingsPerRun} readings (${(bodyBytes / 1e6).toFixed(1)} MB JSON each)`);
console.log(`  uploads: ${statuses.length}, stored rows: ${stored}, failed: ${failed.length}${failed[0] ? ` (first: ${failed[0].reason})` : ''}`);
console.log(`  elapsed: ${elapsedS.toFixed(2)} s, ${(statuses.length / elapsedS).toFixed(2)} runs/s, ${((statuses.length * bodyBytes) / 1e6 / elapsedS).toFixed(1)} MB/s`);
console.log(`  upload latency: median ${at(0.5).toFixed(0)} ms, p95 ${at(0.95).toFixed(0)} ms, max ${at(1).toFixed(0)} ms`);
console.log(`  server RSS: idle ${mib(idleMemory.rss)} MiB, largest ${mib(Math.max(peakRss, finalMemory.peak))} MiB (kernel high-water mark ${mib(finalMemory.peak)} MiB)`);
console.log(`  integrity_check: ${integrity}`);
if (failed.length > 0 || stored !== statuses.length || integrity !== 'ok') process.exitCode = 1;
