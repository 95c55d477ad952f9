import { appendFileSync, cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { startAppServer, type RunningServer } from '../../src/server/appServer.ts';
import { launchChromium, phoneContext, untilServiceWorkerControls } from './support/browser.ts';
import { startDemoRun } from './support/demoRun.ts';

// A copy of the built app of its own, so that this test can publish a "new version" (the
// service worker's bytes change) without touching the one the other tests use.
let browser: Browser;
let server: RunningServer;
let distDir: string;
beforeAll(async () => {
  distDir = mkdtempSync(join(tmpdir(), 'cutbell-update-'));
  cpSync(fileURLToPath(new URL('../../dist/', import.meta.url)), distDir, { recursive: true });
  server = await startAppServer({ distDir, port: 0, host: '127.0.0.1' });
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
  rmSync(distDir, { recursive: true, force: true });
});

it('a new version waits while a run goes on, and is applied with one tap between runs', async () => {
  const context = await phoneContext(browser);
  const page = await context.newPage();
  await page.goto(server.url);
  await untilServiceWorkerControls(page);

  // A run is going when the new version comes: the app must not reload under it.
  await startDemoRun(page, 10);
  appendFileSync(join(distDir, 'sw.js'), '\n// a new version\n');
  await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())!.update());
  const notice = page.getByRole('status').filter({ hasText: 'A new version of Cutbell is ready' });
  await notice.waitFor();
  expect(await notice.textContent()).toMatch(/wait until this run has ended/);
  expect(await page.getByRole('button', { name: 'Update now' }).isDisabled()).toBe(true);
  expect(await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())!.waiting !== null)).toBe(true);

  // The run ends; the update is then one tap, and the new worker takes over after the reload.
  await page.getByRole('button', { name: 'End run' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'End run' }).click();
  await page.getByRole('heading', { name: 'Run ended' }).waitFor();
  await page.evaluate(() => ((window as unknown as { beforeUpdate: boolean }).beforeUpdate = true));
  await page.getByRole('button', { name: 'Update now' }).click();
  // The new worker reloads the page (the marker is gone) and controls it; none is left waiting.
  await page.waitForFunction(() => (window as unknown as { beforeUpdate?: boolean }).beforeUpdate === undefined && navigator.serviceWorker.controller !== null);
  await page.getByRole('heading', { name: 'Watch' }).waitFor();
  expect(await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())!.waiting)).toBeNull();
  expect(await page.getByText('A new version of Cutbell is ready').count()).toBe(0);
  await context.close();
});
