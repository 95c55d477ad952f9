import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';
import { startDemoRun } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('Watch screen on a phone', () => {
  it('shows the Watch screen and a head temperature that moves during a simulated run', async () => {
    const context = await phoneContext(browser);
    const page = await context.newPage();
    await page.goto(inject('baseUrl'));
    await page.getByRole('heading', { name: 'Watch' }).waitFor();
    expect(page.viewportSize()?.width).toBeLessThanOrEqual(412);
    await startDemoRun(page, 120);
    const elapsed = page.getByTestId('elapsed');
    await page.waitForFunction(() => document.querySelector('[data-testid="elapsed"]')?.textContent !== '0:00');
    const first = await elapsed.textContent();
    await page.waitForTimeout(1500);
    expect(await elapsed.textContent()).not.toBe(first);
    expect(await page.getByTestId('head-temp').textContent()).toMatch(/^\d+\.\d°C$/);
    expect(await page.locator('.trace-chart canvas').count()).toBe(2);
    await context.close();
  });

  it('keeps every control inside a 412 px wide screen (no sideways scrolling)', async () => {
    const context = await phoneContext(browser);
    const page = await context.newPage();
    await page.setViewportSize({ width: 412, height: 915 });
    await page.goto(inject('baseUrl'));
    await startDemoRun(page, 10);
    const scrollWidth = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(scrollWidth).toBeLessThanOrEqual(412);
    const box = await page.getByRole('button', { name: /Receiver changed/ }).boundingBox();
    // Large enough to hit with a gloved thumb (common practice: at least 48 px).
    expect(box?.height).toBeGreaterThanOrEqual(48);
    await context.close();
  });
});
