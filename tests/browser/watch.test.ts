import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';

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
    await expect(page.getByRole('heading', { name: 'Watch' }).isVisible()).resolves.toBe(true);
    expect(page.viewportSize()?.width).toBeLessThanOrEqual(412);

    await page.getByRole('radio', { name: '120×' }).check({ force: true });
    await page.getByRole('button', { name: 'Start demo run' }).click();
    const head = page.getByTestId('head-temp');
    const elapsed = page.getByTestId('elapsed');
    await page.waitForFunction(() => document.querySelector('[data-testid="elapsed"]')?.textContent !== '0:00');
    const first = { head: await head.textContent(), elapsed: await elapsed.textContent() };
    // At 120x, two real seconds are four simulated minutes: the pot warms, the clock moves on.
    await page.waitForTimeout(2000);
    const later = { head: await head.textContent(), elapsed: await elapsed.textContent() };
    expect(later.elapsed).not.toBe(first.elapsed);
    expect(later.head).toMatch(/^\d+\.\d°C$/);
    // The uPlot canvas is drawn.
    expect(await page.locator('.trace-chart canvas').count()).toBeGreaterThan(0);
    await context.close();
  });

  it('keeps every control inside a 412 px wide screen (no sideways scrolling)', async () => {
    const context = await phoneContext(browser);
    const page = await context.newPage();
    await page.setViewportSize({ width: 412, height: 915 });
    await page.goto(inject('baseUrl'));
    const scrollWidth = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(scrollWidth).toBeLessThanOrEqual(412);
    const box = await page.getByRole('button', { name: 'Start demo run' }).boundingBox();
    // Large enough to hit with a gloved thumb (common practice: at least 48 px).
    expect(box?.height).toBeGreaterThanOrEqual(48);
    await context.close();
  });
});
