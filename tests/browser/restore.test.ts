import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, expect, inject, it } from 'vitest';
import { chromium, devices } from 'playwright-core';
import { chromiumPath } from './support/browser.ts';
import { startDemoRun } from './support/demoRun.ts';

const profile = mkdtempSync(join(tmpdir(), 'cutbell-profile-'));
afterAll(() => rmSync(profile, { recursive: true, force: true }));

/** A browser with a profile on disk, so IndexedDB outlives the context as it would a killed tab. */
function openPhone() {
  return chromium.launchPersistentContext(profile, {
    ...devices['Pixel 7'],
    executablePath: chromiumPath,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
}

const seconds = (text: string) => text.split(':').map(Number).reduce((total, part) => total * 60 + part, 0);

it('reopens a run after the browser was closed mid-run, with no more than 2 s of readings missing', async () => {
  let context = await openPhone();
  let page = context.pages()[0] ?? (await context.newPage());
  await page.goto(inject('baseUrl'));
  await startDemoRun(page, 1);
  await page.waitForFunction(() => {
    const text = document.querySelector('[data-testid="elapsed"]')?.textContent ?? '0:00';
    return text.split(':').map(Number).reduce((t, p) => t * 60 + p, 0) >= 6;
  });
  const shownBeforeClose = seconds((await page.getByTestId('elapsed').textContent())!);
  await context.close(); // no end, no goodbye: as a killed tab

  context = await openPhone();
  page = context.pages()[0] ?? (await context.newPage());
  await page.goto(inject('baseUrl'));
  const gap = page.getByTestId('gap-notice');
  await gap.waitFor({ timeout: 15_000 });
  const [from] = (await gap.textContent())!.match(/\d+:\d\d(?::\d\d)?/g)!;
  expect(shownBeforeClose - seconds(from!)).toBeLessThanOrEqual(2);
  // The run carries on: the clock moves past where it stopped.
  await page.waitForFunction((before) => {
    const text = document.querySelector('[data-testid="elapsed"]')?.textContent ?? '0:00';
    return text.split(':').map(Number).reduce((t, p) => t * 60 + p, 0) > before;
  }, shownBeforeClose);
  await context.close();
});
