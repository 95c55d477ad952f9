// `npm test`: every check the project has, in order, ending with one plain line
// `N passed, N failed` that counts type checks, lint, unit tests and browser tests.
// Exits non-zero when anything failed or when no test ran.
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureChromium, ensureDependencies, run } from './lib/setup.mjs';

let passed = 0;
let failed = 0;
let testsRan = 0;
const failures = [];

function check(name, command, args) {
  console.log(`\n== ${name}`);
  const ok = run(command, args) === 0;
  if (ok) passed += 1;
  else {
    failed += 1;
    failures.push(name);
  }
  return ok;
}

/** Runs one Vitest project and adds its test counts (Vitest's own summary is not what CI reads). */
function vitestProject(project) {
  console.log(`\n== ${project} tests`);
  const dir = mkdtempSync(join(tmpdir(), 'cutbell-vitest-'));
  const report = join(dir, 'report.json');
  const status = run('npx', ['vitest', 'run', '--project', project, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`]);
  let counted = false;
  try {
    const summary = JSON.parse(readFileSync(report, 'utf8'));
    passed += summary.numPassedTests;
    failed += summary.numFailedTests;
    if (summary.numFailedTests > 0) failures.push(`${project}: ${summary.numFailedTests} failed`);
    counted = summary.numTotalTests > 0;
    testsRan += summary.numPassedTests + summary.numFailedTests;
    if (status !== 0 && summary.numFailedTests === 0) {
      // A suite that failed to load, or an error outside any test.
      failed += 1;
      failures.push(`${project}: run failed outside a test (exit ${status})`);
    }
  } catch {
    failed += 1;
    failures.push(`${project}: no report (exit ${status})`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  if (!counted) console.log(`(no ${project} tests ran)`);
}

try {
  ensureDependencies();
} catch (error) {
  console.error(String(error));
  console.log('0 passed, 1 failed');
  process.exit(1);
}

check('type check: app (DOM)', 'npx', ['tsc', '-p', 'tsconfig.json']);
check('type check: pure core (no DOM)', 'npx', ['tsc', '-p', 'tsconfig.core.json']);
check('type check: node side (server, cli, tests)', 'npx', ['tsc', '-p', 'tsconfig.node.json']);
check('type check: service worker (no DOM)', 'npx', ['tsc', '-p', 'tsconfig.sw.json']);
check('lint', 'npx', ['eslint', '.']);
vitestProject('unit');

const built = check('build', 'npx', ['vite', 'build']);
if (built) {
  check('first-load JavaScript within budget (bench/bundle-size.mjs)', 'node', ['bench/bundle-size.mjs']);
  if (ensureChromium()) {
    vitestProject('browser');
  } else {
    failed += 1;
    failures.push('browser tests: Chromium missing (apt-get install chromium)');
  }
} else {
  console.log('\n(browser tests skipped: the build failed)');
}

console.log('');
if (failures.length > 0) console.log(`Failed: ${failures.join('; ')}`);
if (testsRan === 0) {
  console.log('No test ran: that is a failure.');
  failed = Math.max(failed, 1);
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
