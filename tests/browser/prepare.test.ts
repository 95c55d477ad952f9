import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';
import { heatOnThroughChecklist } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('Prepare screen on a phone', () => {
  it('plans a charge in the worker, takes an edited window through the checklist to the Watch screen', async () => {
    const context = await phoneContext(browser);
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (error) => errors.push(error.message));
    await page.goto(inject('baseUrl'));
    await page.getByRole('heading', { name: 'Watch' }).waitFor();
    await page.getByRole('button', { name: 'Settings' }).click();
    await page.getByRole('radio', { name: '600×' }).check({ force: true });
    await page.getByLabel('Decimal mark').selectOption('.');
    await page.getByRole('button', { name: 'Prepare' }).click();
    await page.getByRole('heading', { name: 'Prepare' }).waitFor();

    // By a synonym and by CAS number (toluene is 108-88-3).
    await page.getByLabel('Compound 1', { exact: true }).fill('hexane');
    await page.getByLabel('Amount of compound 1').fill('40');
    await page.getByLabel('Compound 2', { exact: true }).fill('108-88-3');
    await page.getByLabel('Amount of compound 2').fill('60');
    await page.getByLabel('Barometer reading').fill('0');
    await expect.poll(() => page.getByText('the pressure must be above zero').count()).toBe(1);
    await page.getByLabel('Barometer reading').fill('100.2');
    await page.getByLabel('Kind of column').selectOption('packed');
    await page.getByLabel('Height of the indented or packed part').fill('30');

    const plan = page.getByTestId('plan');
    await plan.waitFor({ timeout: 30_000 });
    await expect.poll(() => page.getByTestId('window-1').count()).toBe(1);
    expect(await plan.textContent()).toMatch(/n-hexane/);
    expect(await page.locator('.plan-chart canvas').count()).toBeGreaterThanOrEqual(3);
    expect(await page.getByTestId('prediction-1').textContent()).toMatch(/about \d+\.\d mL, \d+ mol % n-hexane/);

    // Nothing on the Prepare screen makes the phone scroll sideways.
    await expect.poll(() => page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(page.viewportSize()!.width);

    // Edit receiver 1's upper bound; the checked window goes with the run.
    const upper = page.getByLabel('Receiver 1 to');
    await upper.fill('70.5');
    await page.waitForTimeout(600);
    expect(await upper.inputValue()).toBe('70.5');
    await page.getByRole('button', { name: 'Use this plan' }).click();
    await page.getByRole('button', { name: 'Simulate it' }).click();
    await page.getByRole('heading', { name: 'Before heat on' }).waitFor();
    await heatOnThroughChecklist(page);
    expect(await page.getByTestId('receiver').textContent()).toMatch(/^1 \d+–71 °C$/);
    expect(await page.locator('.source-line').textContent()).toMatch(/Simulated/);
    expect(errors).toEqual([]);
    await context.close();
  });
});
