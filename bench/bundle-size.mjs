// First-load JavaScript of the built app, gzipped: what a phone downloads before the Watch
// screen can show a reading. Reads Vite's build manifest (dist/.vite/manifest.json).
// Usage: npm run build && node bench/bundle-size.mjs [--budget-kb 120]
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';

const dist = new URL('../dist/', import.meta.url);
const budgetArg = process.argv.indexOf('--budget-kb');
const budgetKb = budgetArg > 0 ? Number(process.argv[budgetArg + 1]) : 120;

let manifest;
try {
  manifest = JSON.parse(readFileSync(new URL('.vite/manifest.json', dist), 'utf8'));
} catch {
  console.error('bundle-size: no build manifest; run "npm run build" first');
  process.exit(2);
}

const entry = Object.values(manifest).find((chunk) => chunk.isEntry);
const firstLoad = new Set();
const lazy = new Set();
(function walk(key) {
  const chunk = manifest[key] ?? Object.values(manifest).find((c) => c.file === key);
  if (!chunk || firstLoad.has(chunk.file)) return;
  firstLoad.add(chunk.file);
  for (const imported of chunk.imports ?? []) walk(imported);
  for (const dynamic of chunk.dynamicImports ?? []) {
    const target = manifest[dynamic];
    // The service-worker helper is imported as soon as the app registers, so it is first-load too.
    if (target && /workbox-window/.test(target.file)) walk(dynamic);
    else if (target) lazy.add(target.file);
  }
})(Object.keys(manifest).find((k) => manifest[k] === entry));

const sizeOf = (file) => {
  const bytes = readFileSync(new URL(file, dist));
  return { raw: bytes.length, gzip: gzipSync(bytes, { level: 9 }).length };
};

let total = 0;
console.log('first-load JavaScript (gzip -9):');
for (const file of firstLoad) {
  const { raw, gzip } = sizeOf(file);
  total += gzip;
  console.log(`  ${file.padEnd(48)} ${String(raw).padStart(8)} B  ${String(gzip).padStart(7)} B gz`);
}
for (const file of lazy) {
  const { gzip } = sizeOf(file);
  console.log(`  (loaded later) ${file.padEnd(33)} ${String(gzip).padStart(18)} B gz`);
}
const kb = total / 1000;
console.log(`first-load total: ${total} B gzipped (${kb.toFixed(1)} kB; budget ${budgetKb} kB, ${((kb / budgetKb) * 100).toFixed(0)} % used)`);
if (kb > budgetKb) {
  console.error(`bundle-size: over budget by ${(kb - budgetKb).toFixed(1)} kB`);
  process.exit(1);
}
