import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, phoneContext } from './support/browser.ts';
import { heatOnThroughChecklist, recordAlertsScript } from './support/demoRun.ts';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

/** The head temperature shown on the Watch screen (comma or point), acknowledging any alarm that covers it. */
async function headTemp(page: Page): Promise<number> {
  const ack = page.locator('.alarm-ack');
  // force: at 120x the page re-renders many times a second, and Playwright's wait for the button
  // to hold still (the banner has no animation) lets the fast demo run on for minutes.
  if (await ack.isVisible()) await ack.click({ force: true, timeout: 2000 }).catch(() => undefined);
  const text = (await page.getByTestId('head-temp').textContent()) ?? '';
  return Number.parseFloat(text.replace(',', '.'));
}

async function waitForHead(page: Page, above: number): Promise<void> {
  for (let i = 0; i < 900; i++) {
    if ((await headTemp(page)) > above) return;
    await page.waitForTimeout(100);
  }
  const shown = await page.getByTestId('head-temp').textContent();
  throw new Error(`the head never passed ${above} on the display (it shows ${shown}, ${await page.getByTestId('elapsed').textContent()} since heat on)`);
}

/** The cut, from the alarm banner when it is up (it covers the screen), else from the Watch screen. */
async function changeReceiver(page: Page): Promise<void> {
  const inBanner = page.getByRole('alertdialog').getByRole('button', { name: /Receiver changed/ });
  if (await inBanner.isVisible()) await inBanner.click({ force: true });
  else await page.getByRole('button', { name: /Receiver changed/ }).first().click({ timeout: 5000 });
}

/** Temperature scale °F and a decimal comma, as a chemist might set them. */
async function chooseFahrenheitAndComma(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Settings' }).click();
  await page.getByLabel(/^Temperature/).selectOption('degF');
  await page.getByLabel('Decimal mark').selectOption(',');
}

// degF = degC x 9/5 + 32 (NIST SP 811, B.8)
const degF = (c: number) => c * 1.8 + 32;

async function exportJson(page: Page): Promise<string> {
  const waiting = page.waitForEvent('download', { timeout: 10_000 });
  await page.getByRole('button', { name: 'Export run (JSON)' }).click({ timeout: 10_000 });
  const download = await waiting;
  return readFile((await download.path())!, 'utf8');
}

describe('From Prepare through a simulated run to the report', () => {
  it('plans a charge, runs it on the simulated still, enters fractions, prints, exports and imports the run identically', async () => {
    const context = await phoneContext(browser);
    await context.addInitScript(recordAlertsScript);
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (error) => errors.push(error.stack ?? error.message));
    await page.goto(inject('baseUrl'));
    await page.getByRole('heading', { name: 'Watch' }).waitFor();
    await chooseFahrenheitAndComma(page);
    await page.getByRole('radio', { name: '120×' }).check({ force: true });
    // The alarm thresholds are shown on the chosen scale: the usual 1 degC rise is 1.8 degF.
    expect(await page.getByLabel('Cut: the head rises above its plateau by').locator('option:checked').textContent()).toBe('1,8 °F');

    // Prepare: cyclohexane and toluene, 30 mL each, at the lab's barometer reading, a packed column.
    await page.getByRole('button', { name: 'Prepare' }).click();
    await page.getByRole('heading', { name: 'Prepare' }).waitFor();
    await page.getByLabel('Compound 1', { exact: true }).fill('cyclohexane');
    await page.getByLabel('Amount of compound 1').fill('30');
    await page.getByLabel('Compound 2', { exact: true }).fill('toluene');
    await page.getByLabel('Amount of compound 2').fill('30');
    await page.getByLabel('Barometer reading').fill('101,3');
    await page.getByLabel('Kind of column').selectOption('packed');
    await page.getByLabel('Height of the indented or packed part').fill('30');
    await page.getByTestId('plan').waitFor({ timeout: 30_000 });
    await expect.poll(() => page.getByTestId('window-1').count()).toBe(1);
    await page.getByRole('button', { name: 'Use this plan' }).click();
    await page.getByRole('button', { name: 'Simulate it' }).click();
    await page.getByRole('heading', { name: 'Before heat on' }).waitFor();
    await heatOnThroughChecklist(page);

    // Watch, on the chosen scale: cyclohexane boils at 353.85 K, 80.7 degC (CRC Handbook 95th ed., as in tests/fixtures/boilingPoints.ts), 177 degF.
    expect(await page.locator('.head-unit').textContent()).toBe('°F');
    // The simulator's expected trace, computed in a worker, is drawn behind the readings.
    expect(await page.getByText('Whole run (faint line: predicted)').count()).toBe(1);
    expect(await page.getByTestId('receiver').textContent()).toMatch(/^1 \d+–\d+ °F$/);
    expect(await page.getByTestId('head-rate').textContent()).toMatch(/°F\/min/);
    await waitForHead(page, degF(70));
    await waitForHead(page, degF(90));
    await changeReceiver(page);
    // Toluene boils at 383.75 K, 110.6 degC (CRC Handbook 95th ed., as in tests/fixtures/boilingPoints.ts): wait for its plateau.
    await waitForHead(page, degF(106));
    const ack = page.locator('.alarm-ack');
    if (await ack.isVisible()) await ack.click({ force: true });
    await page.getByRole('button', { name: 'End run' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'End run' }).click();
    await page.getByRole('heading', { name: 'Run ended' }).waitFor();

    // Fractions, typed with the decimal comma; the refractive index read at 68 degF (20 degC).
    await page.getByRole('button', { name: 'Fractions' }).click();
    await page.getByRole('heading', { name: 'Fractions' }).waitFor();
    expect(await page.getByTestId('range-1').textContent()).toMatch(/\d,\d–\d+,\d °F/);
    await page.getByLabel('Receiver 1 amount', { exact: true }).fill('27,5');
    await page.getByLabel('Receiver 2 amount', { exact: true }).fill('24,0');
    await page.getByLabel('Residue', { exact: true }).fill('3,2');
    await page.getByLabel('Receiver 1 analysis').selectOption('refractive-index');
    // Cyclohexane n_D at 20 degC is 1.4262 (CRC Handbook, from memory): receiver 1 is nearly pure.
    await page.getByLabel('Receiver 1 refractive index').fill('1,4262');
    expect(await page.getByLabel('Receiver 1 reading temperature').inputValue()).toBe('68');
    const box = await page.getByLabel('Receiver 1 amount', { exact: true }).boundingBox();
    // Large enough for a gloved thumb (common practice: at least 48 px).
    expect(box?.height).toBeGreaterThanOrEqual(48);
    await expect.poll(() => page.locator('.composition').first().textContent()).toMatch(/Analysis: cyclohexane (9\d|100),\d %/);
    await page.getByRole('button', { name: 'Save and report' }).click();

    const table = page.getByTestId('fraction-table');
    await table.waitFor();
    const tableText = (await table.textContent()) ?? '';
    expect(tableText).toContain('27,5 mL');
    expect(tableText).toContain('24,0 mL');
    expect(tableText).toMatch(/\d+,\d °F–\d+,\d °F/);
    expect(await page.locator('.report-facts').textContent()).toMatch(/101,3 kPa/);
    // The thresholds the run was watched with, on the chosen scale: 1 degC is 1.8 degF.
    expect(await page.locator('.report-facts').textContent()).toMatch(/cut at 1,8 °F above a plateau/);
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
    const run = JSON.parse(exported) as {
      title: string;
      charge: { name: string }[];
      plan: { windows: unknown[] };
      fractions: { entries: { amount: { value: number }; analysis: { at_c?: number } | null }[] };
    };
    expect(run.charge.map((c) => c.name)).toEqual(['cyclohexane', 'toluene']);
    expect(run.plan.windows.length).toBeGreaterThanOrEqual(2);
    expect(run.fractions.entries.map((e) => e.amount.value)).toEqual([27.5, 24]);
    // Typed as 68 degF, kept as 20 degC in the record.
    expect(run.fractions.entries[0]!.analysis?.at_c).toBeCloseTo(20, 6);
    expect(errors).toEqual([]);
    await context.close();

    // Another phone with the same settings: empty storage, the file imported from the Runs screen.
    const other = await phoneContext(browser);
    const phone = await other.newPage();
    await phone.goto(inject('baseUrl'));
    await phone.getByRole('heading', { name: 'Watch' }).waitFor();
    await chooseFahrenheitAndComma(phone);
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
