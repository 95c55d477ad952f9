import { afterAll, beforeAll, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, phoneContext, untilServiceWorkerControls } from './support/browser.ts';
import { recordAlertsScript, startDemoRun } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

const spoken = (page: Page) => page.evaluate(() => (window as unknown as { __spoken: string[] }).__spoken);

it('goes through vapour, plateau, a breakthrough alarm, receiver 2 and the end, offline, without chattering', async () => {
  const context = await phoneContext(browser);
  await context.addInitScript(recordAlertsScript);
  const page = await context.newPage();
  await page.goto(inject('baseUrl'));
  await untilServiceWorkerControls(page);
  await context.setOffline(true);
  await page.reload();

  await startDemoRun(page, 600);
  await page.waitForFunction(() => /Steady at/.test(document.querySelector('[data-testid="watch-state"]')?.textContent ?? ''), null, { timeout: 30_000 });
  expect(await spoken(page)).toEqual(expect.arrayContaining(['Vapour has reached the thermometer']));
  expect((await spoken(page)).some((s) => s.startsWith('Steady at 77'))).toBe(true);

  // The cut: a full-screen alarm in words and a symbol, spoken and sounded through its adapters.
  const banner = page.getByRole('alertdialog');
  await banner.waitFor({ timeout: 30_000 });
  expect(await banner.textContent()).toMatch(/Change to receiver 2/);
  // The banner shows on the raise; the alarm is said on the session's next tick (250 ms).
  await page.waitForFunction(() => (window as unknown as { __spoken: string[] }).__spoken.some((s) => /Change to receiver 2/.test(s)), null, { timeout: 5000 });
  expect((await spoken(page)).filter((s) => /Change to receiver 2/.test(s)).length).toBeGreaterThanOrEqual(1);
  expect(await page.evaluate(() => (window as unknown as { __tones: number }).__tones)).toBeGreaterThan(0);

  await banner.getByRole('button', { name: 'Receiver changed → 2' }).click();
  // At 600x the next planned cut may follow within seconds: the alarm for receiver 2 is gone,
  // and any alarm now standing is for the receiver after it.
  await page.waitForFunction(() => !/Change to receiver 2/.test(document.querySelector('[role="alertdialog"]')?.textContent ?? ''));
  if ((await banner.count()) > 0) expect(await banner.textContent()).toMatch(/Change to receiver 3/);
  expect((await page.getByTestId('receiver').textContent())?.startsWith('2')).toBe(true);

  // No alarm chatters: a kind is never said three times within a minute of real time.
  const alarmsSaid = (await spoken(page)).filter((s) => /Change to receiver/.test(s));
  expect(alarmsSaid.length).toBeLessThan(3);

  await page.getByRole('button', { name: 'End run' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'End run' }).click();
  await page.getByRole('heading', { name: 'Run ended' }).waitFor();
  // The network is really gone (Chromium 150 headless leaves navigator.onLine true under setOffline).
  expect(await page.evaluate(() => fetch(`/no-such-probe-${Date.now()}`, { cache: 'no-store' }).then(() => 'reached', () => 'offline'))).toBe('offline');
  // A new run starts from the choices again (plan, sensor or demo), not straight into a demo.
  await page.getByRole('button', { name: 'New run' }).click();
  await page.getByRole('heading', { name: 'Start a run' }).waitFor();
  expect(await page.getByRole('button', { name: 'Connect a sensor' }).count()).toBe(1);
  await context.close();
});
