import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';
import { recordAlertsScript } from './support/demoRun.ts';
import { fakeSerialScript } from './support/fakeSerialScript.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

async function throughChecklist(page: Page): Promise<void> {
  const boxes = page.getByRole('checkbox');
  await boxes.first().waitFor();
  const count = await boxes.count();
  for (let i = 0; i < count; i++) await boxes.nth(i).check();
  await page.getByRole('button', { name: 'Heat on: start the run' }).click();
  await page.getByTestId('head-temp').waitFor();
}

async function connectSerialBoard(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Connect a sensor' }).click();
  await page.getByRole('button', { name: /Thermocouple board or meter/ }).click();
  await page.getByRole('button', { name: 'Choose the serial port' }).click();
  await page.getByRole('radio', { name: /head_c/ }).waitFor();
  await page.getByRole('button', { name: 'Use this sensor' }).click();
}

const headTemp = (page: Page) => page.getByTestId('head-temp').textContent();

describe('sensor connection on a phone', () => {
  it('a serial board: readings reach the Watch screen, an unplug raises the sensor alarm within about 5 s, a replug resumes', async () => {
    const context = await phoneContext(browser);
    await context.addInitScript(recordAlertsScript);
    await context.addInitScript(fakeSerialScript);
    const page = await context.newPage();
    await page.goto(inject('baseUrl'));
    await page.getByRole('button', { name: 'Connect a sensor' }).click();
    await page.getByRole('button', { name: /Thermocouple board or meter/ }).click();
    await page.getByLabel('Baud rate').selectOption('115200');
    await page.getByRole('button', { name: 'Choose the serial port' }).click();
    await page.getByTestId('line-preview').getByText('head_c=78.25').first().waitFor();
    const pick = page.getByRole('radio', { name: /head_c/ });
    await expect.poll(() => pick.isChecked()).toBe(true);
    expect(await page.evaluate(() => (window as unknown as { __board: { baudRate: number } }).__board.baudRate)).toBe(115200);
    await page.getByRole('button', { name: 'Use this sensor' }).click();
    await throughChecklist(page);

    await expect.poll(() => headTemp(page), { timeout: 5000 }).toMatch(/^78\.3°C$/);
    expect(await page.getByTestId('sensor-status').textContent()).toMatch(/Web Serial: reading at 115200 baud/);

    await page.evaluate(() => (window as unknown as { __board: { unplug(): void } }).__board.unplug());
    const pulledAt = Date.now();
    await page.locator('.alarm-banner[data-kind="sensor-lost"]').waitFor({ timeout: 8000 });
    const alarmAfterMs = Date.now() - pulledAt;
    // RunSession raises the alarm 5 s after the last reading (at most 250 ms before the unplug), on a 250 ms tick.
    expect(alarmAfterMs).toBeLessThan(6000);
    expect(await page.getByTestId('sensor-status').textContent()).toMatch(/Sensor lost/);
    await page.getByRole('button', { name: 'Acknowledge' }).click();

    await page.evaluate(() => {
      const board = (window as unknown as { __board: { setHeadC(v: number): void; plugIn(): void } }).__board;
      board.setHeadC(80.5);
      board.plugIn();
    });
    await expect.poll(() => headTemp(page), { timeout: 5000 }).toMatch(/^80\.5°C$/);
    expect(await page.getByTestId('sensor-status').textContent()).toMatch(/reconnected/);
    expect(await page.evaluate(() => (window as unknown as { __board: { opens: number } }).__board.opens)).toBe(2);
    await context.close();
  });

  it('a run reopened after a reload reconnects the granted port by itself, or with one tap when it is not there', async () => {
    const context = await phoneContext(browser);
    await context.addInitScript(recordAlertsScript);
    await context.addInitScript(fakeSerialScript);
    const page = await context.newPage();
    await page.goto(inject('baseUrl'));
    await connectSerialBoard(page);
    await throughChecklist(page);
    await expect.poll(() => headTemp(page), { timeout: 5000 }).toMatch(/^78\.3°C$/);
    await page.waitForTimeout(1500); // the journal flushes every second

    // The same port is still granted: getPorts() offers it and the run carries on with no tap.
    await page.reload();
    await page.evaluate(() => (window as unknown as { __board: { setHeadC(v: number): void } }).__board.setHeadC(79.5));
    await expect.poll(() => headTemp(page), { timeout: 8000 }).toMatch(/^79\.5°C$/);
    expect(await page.getByTestId('sensor-status').textContent()).toMatch(/Web Serial: reading/);
    expect(await page.getByTestId('gap-notice').textContent()).toMatch(/Run reopened/);
    await page.waitForTimeout(1500);

    // Reopened with the board unplugged: the Watch screen offers the reconnect.
    await page.evaluate(() => sessionStorage.setItem('fake-board-unplugged', '1'));
    await page.reload();
    const reconnect = page.getByRole('button', { name: 'Reconnect sensor' });
    await reconnect.waitFor({ timeout: 8000 });
    await page.evaluate(() => {
      const board = (window as unknown as { __board: { setHeadC(v: number): void; plugIn(): void } }).__board;
      board.setHeadC(81.5);
      board.plugIn();
    });
    await reconnect.click();
    await expect.poll(() => headTemp(page), { timeout: 8000 }).toMatch(/^81\.5°C$/);
    expect(await reconnect.count()).toBe(0);
    await context.close();
  });

  it('typed readings through the gloved keypad reach the Watch screen; an impossible value asks first', async () => {
    const context = await phoneContext(browser);
    await context.addInitScript(recordAlertsScript);
    const page = await context.newPage();
    await page.goto(inject('baseUrl'));
    await page.getByRole('button', { name: 'Connect a sensor' }).click();
    await page.getByRole('button', { name: /Type the readings in/ }).click();
    await page.getByRole('button', { name: 'Use typed readings' }).click();
    await throughChecklist(page);
    const key = (name: string) => page.getByRole('group', { name: 'Keypad' }).getByRole('button', { name, exact: true });
    const box = await key('5').boundingBox();
    // Large enough for a gloved finger (common practice: at least 48 px).
    expect(box?.height).toBeGreaterThanOrEqual(48);
    for (const k of ['7', '8', 'decimal point', '5', 'Enter']) await key(k).click();
    await expect.poll(() => headTemp(page)).toBe('78.5°C');
    for (const k of ['9', '5', '0', 'Enter']) await key(k).click();
    await page.getByRole('dialog', { name: 'Store this reading?' }).waitFor();
    await page.getByRole('button', { name: 'Cancel' }).click();
    expect(await headTemp(page)).toBe('78.5°C');
    for (const k of ['delete', 'delete', 'delete', '7', '9', 'Enter']) await key(k).click();
    await expect.poll(() => headTemp(page)).toBe('79.0°C');
    // No sensor alarm between typed readings a few seconds apart.
    await page.waitForTimeout(6000);
    expect(await page.locator('.alarm-banner').count()).toBe(0);
    await context.close();
  });
});
