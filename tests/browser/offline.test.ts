import { afterAll, beforeAll, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, phoneContext, untilServiceWorkerControls } from './support/browser.ts';
import { startDemoRun } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

it('starts and runs the simulated run with no network once the service worker controls the page', async () => {
  const context = await phoneContext(browser);
  const page = await context.newPage();
  await page.goto(inject('baseUrl'));
  await untilServiceWorkerControls(page);

  await context.setOffline(true);
  await page.reload();
  await page.getByRole('heading', { name: 'Watch' }).waitFor();
  await startDemoRun(page, 120);
  await page.waitForFunction(() => {
    const text = document.querySelector('[data-testid="elapsed"]')?.textContent;
    return text !== undefined && text !== '0:00';
  });
  // The network is really gone (Chromium 150 headless leaves navigator.onLine true under setOffline).
  expect(await page.evaluate(() => fetch(`/no-such-probe-${Date.now()}`, { cache: 'no-store' }).then(() => 'reached', () => 'offline'))).toBe('offline');
  await context.close();
});
