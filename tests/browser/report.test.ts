import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';
import { recordAlertsScript, startDemoRun } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

/** The head temperature shown on the Watch screen, acknowledging any alarm that covers it. */
async function headTemp(page: Page): Promise<number> {
  const ack = page.locator('.alarm-ack');
  if (await ack.isVisible()) await ack.click();
  const text = (await page.getByTestId('head-temp').textContent()) ?? '';
  return Number.parseFloat(text);
}

async function waitForHead(page: Page, above: number): Promise<void> {
  for (let i = 0; i < 200; i++) {
    if ((await headTemp(page)) > above) return;
    await page.waitForTimeout(100);
  }
  throw new Error(`the head never passed ${above} °C`);
}

async function exportJson(page: Page): Promise<string> {
  const waiting = page.waitForEvent('download', { timeout: 10_000 });
  await page.getByRole('button', { name: 'Export run (JSON)' }).click({ timeout: 10_000 });
  const download = await waiting;
  return readFile((await download.path())!, 'utf8');
}

describe('Fractions and Report after a demo run', () => {
  it('enters fractions, prints the report, exports the run and imports it identically on another phone', async () => {
    const context = await phoneContext(browser);
    await context.addInitScript(recordAlertsScript);
    const page = await context.newPage();
    await page.goto(inject('baseUrl'));
    await startDemoRun(page, 600);
    // Ethyl acetate distils near 77 degC; change receivers once the head climbs past 85 degC.
    await waitForHead(page, 70);
    await waitForHead(page, 85);
    await page.getByRole('button', { name: /Receiver changed/ }).click();
    await waitForHead(page, 110);
    const ack = page.locator('.alarm-ack');
    if (await ack.isVisible()) await ack.click();
    await page.getByRole('button', { name: 'End run' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'End run' }).click();
    await page.getByRole('heading', { name: 'Run ended' }).waitFor();

    await page.getByRole('button', { name: 'Fractions' }).click();
    await page.getByRole('heading', { name: 'Fractions' }).waitFor();
    expect(await page.getByTestId('range-1').textContent()).toMatch(/°C/);
    await page.getByLabel('Receiver 1 amount', { exact: true }).fill('27,5');
    await page.getByLabel('Receiver 2 amount', { exact: true }).fill('24.0');
    await page.getByLabel('Residue', { exact: true }).fill('3.2');
    const box = await page.getByLabel('Receiver 1 amount', { exact: true }).boundingBox();
    // Large enough for a gloved thumb (common practice: at least 48 px).
    expect(box?.height).toBeGreaterThanOrEqual(48);
    await page.getByRole('button', { name: 'Save and report' }).click();

    const table = page.getByTestId('fraction-table');
    await table.waitFor();
    const tableText = (await table.textContent()) ?? '';
    expect(tableText).toContain('27.5 mL');
    expect(tableText).toContain('24.0 mL');
    expect(await page.getByTestId('mass-balance').textContent()).toMatch(/unaccounted/);
    expect(await page.locator('.report .trace-chart canvas').count()).toBeGreaterThanOrEqual(2);
    // Everything inside the phone's width: no sideways scrolling (Pixel 7 emulation, 412 px).
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(412);

    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.tab-bar').isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Export run (JSON)' }).isVisible()).toBe(false);
    const pdf = await page.pdf({ format: 'A4', printBackground: false });
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g)?.length ?? 0;
    expect(pages).toBeGreaterThanOrEqual(1);
    expect(pages).toBeLessThanOrEqual(2);
    await page.emulateMedia({ media: 'screen' });

    const exported = await exportJson(page);
    const run = JSON.parse(exported) as { id: string; title: string; fractions: { entries: { amount: { value: number } }[] } };
    expect(run.fractions.entries.map((e) => e.amount.value)).toEqual([27.5, 24]);
    await context.close();

    // Another phone: empty storage, the file imported from the Runs screen.
    const other = await phoneContext(browser);
    const phone = await other.newPage();
    await phone.goto(inject('baseUrl'));
    await phone.getByRole('button', { name: 'Runs' }).click();
    await phone.getByText('No runs on this phone yet.').waitFor();
    await phone.getByLabel('Import a run file').setInputFiles({ name: 'run.json', mimeType: 'application/json', buffer: Buffer.from(exported) });
    await phone.getByTestId('fraction-table').waitFor();
    expect(await phone.getByRole('heading', { name: run.title }).count()).toBe(1);
    expect(await phone.getByTestId('fraction-table').textContent()).toBe(tableText);
    expect(await exportJson(phone)).toBe(exported);

    // A bad file is refused with its reason, and the stored run stays.
    await phone.getByRole('button', { name: 'All runs' }).click();
    await phone.getByLabel('Import a run file').setInputFiles({ name: 'broken.json', mimeType: 'application/json', buffer: Buffer.from('{"format":"cutbell-run","version":9}') });
    await phone.getByText(/broken.json was not imported: the run record is version 9/).waitFor();
    expect(await phone.locator('.run-item').count()).toBe(1);
    await other.close();
  });
});
