// The Watch screen through an 8-hour run at 10 readings a second, in Chromium with the CPU
// throttled 4x (a mid-range phone): frame rate, JavaScript heap by simulated hour, journal
// write time per flush, and time from opening the app to the first reading on screen.
// Usage: npm run build && npx tsx bench/watch-soak.bench.ts [--hours 8] [--speed 600] [--throttle 4]
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { startAppServer } from '../src/server/appServer.ts';
import { launchChromium, phoneContext } from '../tests/browser/support/browser.ts';
import { startDemoRun } from '../tests/browser/support/demoRun.ts';

const { values } = parseArgs({ options: { hours: { type: 'string', default: '8' }, speed: { type: 'string', default: '600' }, throttle: { type: 'string', default: '4' } } });
const hours = Number(values.hours);
const speed = Number(values.speed);
const throttle = Number(values.throttle);

const server = await startAppServer({ distDir: fileURLToPath(new URL('../dist/', import.meta.url)), port: 0, host: '127.0.0.1' });
const browser = await launchChromium();
const context = await phoneContext(browser);
const page = await context.newPage();
const cdp = await context.newCDPSession(page);
await cdp.send('Emulation.setCPUThrottlingRate', { rate: throttle });
await cdp.send('HeapProfiler.enable');

const url = `${server.url}#demo-interval=0.1`;
let t0 = Date.now();
await page.goto(url);
await page.getByRole('button', { name: 'Start demo run' }).waitFor();
const coldOpenMs = Date.now() - t0;

await startDemoRun(page, speed);
const elapsedS = () => page.evaluate(() => (document.querySelector('[data-testid="elapsed"]')?.textContent ?? '0:00').split(':').map(Number).reduce((t, p) => t * 60 + p, 0));

// Count animation frames in the page: a frame rate that holds means the page never stalls.
// (A string, not a function: tsx would wrap a named inner function in a helper the page lacks.)
await page.evaluate(`(() => {
  window.__frames = 0;
  const loop = () => { window.__frames += 1; requestAnimationFrame(loop); };
  requestAnimationFrame(loop);
})()`);

interface HourSample { hour: number; heapMB: number; fps: number }
const samples: HourSample[] = [];
let nextHour = 1;
let lastFrames = 0;
let lastFrameAt = Date.now();
const started = Date.now();
const deadline = started + ((hours * 3600) / speed) * 1000 * 3 + 60_000;
while (nextHour <= hours && Date.now() < deadline) {
  await page.waitForTimeout(500);
  if ((await elapsedS()) < nextHour * 3600) continue;
  await cdp.send('HeapProfiler.collectGarbage');
  const { usedSize } = (await cdp.send('Runtime.getHeapUsage')) as { usedSize: number };
  const frames = await page.evaluate(() => (window as unknown as { __frames: number }).__frames);
  const now = Date.now();
  samples.push({ hour: nextHour, heapMB: usedSize / 1048576, fps: ((frames - lastFrames) * 1000) / (now - lastFrameAt) });
  lastFrames = frames;
  lastFrameAt = now;
  nextHour += 1;
}
const readingsShown = await elapsedS();
const flushes = await page.evaluate(() =>
  performance.getEntriesByName('cutbell journal flush').map((e) => ({ ms: e.duration, readings: (e as PerformanceMeasure).detail?.readings as number })),
);

// Reopen mid-run: the time until the restored trace shows a reading.
t0 = Date.now();
await page.reload();
await page.waitForFunction(() => /\d/.test(document.querySelector('[data-testid="head-temp"]')?.textContent ?? ''));
const reopenMs = Date.now() - t0;

const sorted = flushes.map((f) => f.ms).sort((a, b) => a - b);
const pct = (p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? Number.NaN;
console.log(`Watch screen soak: ${hours} h simulated at ${speed}x, readings every 0.1 s, CPU throttled ${throttle}x`);
console.log(`  simulated time reached: ${(readingsShown / 3600).toFixed(2)} h in ${((Date.now() - started) / 1000).toFixed(0)} s`);
console.log('  hour   heap MB   frames/s');
for (const s of samples) console.log(`  ${String(s.hour).padStart(4)}   ${s.heapMB.toFixed(1).padStart(7)}   ${s.fps.toFixed(1).padStart(8)}`);
if (samples.length >= 2) {
  const growth = samples.at(-1)!.heapMB - samples[0]!.heapMB;
  console.log(`  heap growth after hour 1: ${growth.toFixed(1)} MB (target: under 150 MB in all, not growing)`);
  console.log('  (V8 heap; the readings\' typed-array backing stores, 16 B a reading, sit outside it)');
}
console.log(`  journal flushes: ${flushes.length}, median ${pct(0.5).toFixed(1)} ms, p90 ${pct(0.9).toFixed(1)} ms, max ${pct(1).toFixed(1)} ms; median ${flushes.map((f) => f.readings).sort((a, b) => a - b)[Math.floor(flushes.length / 2)] ?? 0} readings per flush`);
console.log(`  cold open to the start screen: ${coldOpenMs} ms`);
console.log(`  reopen mid-run to the first reading on screen: ${reopenMs} ms (target under 1500 ms)`);

await context.close();
await browser.close();
await server.close();
