import { afterAll, beforeAll, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';

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
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  // The first load is not yet controlled; a reload is.
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);

  await context.setOffline(true);
  await page.reload();
  await expect(page.getByRole('heading', { name: 'Watch' }).isVisible()).resolves.toBe(true);
  await page.getByRole('button', { name: 'Start demo run' }).click();
  await page.waitForFunction(() => {
    const text = document.querySelector('[data-testid="elapsed"]')?.textContent;
    return text !== undefined && text !== '0:00';
  });
  expect(await page.evaluate(() => navigator.onLine)).toBe(false);
  await context.close();
});
