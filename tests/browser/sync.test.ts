import { afterAll, beforeAll, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, phoneContext, untilServiceWorkerControls } from './support/browser.ts';
import { finishDemoRunUnsent } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

it('a run finished offline is sent to the lab server when the network returns and shows in the lab view', async () => {
  const context = await phoneContext(browser);
  const page = await context.newPage();
  // The set-up link the server prints: the app and the server share one address.
  await page.goto(`${inject('baseUrl')}#sync=${encodeURIComponent(inject('syncToken'))}`);
  await untilServiceWorkerControls(page);
  expect(new URL(page.url()).hash).toBe('');

  await context.setOffline(true);
  await finishDemoRunUnsent(page);
  const line = page.getByTestId('sync-state');
  expect(await line.textContent()).toMatch(/not sent yet.*could not be reached/);

  await context.setOffline(false);
  await page.waitForFunction(() => document.querySelector('[data-testid="sync-state"]')?.getAttribute('data-state') === 'synced', null, { timeout: 30_000 });

  await page.getByRole('button', { name: 'Lab' }).click();
  const run = page.getByRole('button', { name: /Demo:/ });
  await run.first().waitFor();
  expect(await run.count()).toBe(1);
  expect(await run.textContent()).toMatch(/from browser test phone/);
  await run.click();
  await page.getByRole('heading', { name: /^Demo:/ }).waitFor();
  // The lab view shows the run's report, read-only.
  await page.getByTestId('fraction-table').waitFor();
  expect(await page.getByRole('button', { name: 'All lab runs' }).count()).toBe(1);
  expect(await page.getByRole('button', { name: 'Fractions' }).count()).toBe(0);
  await context.close();
});
