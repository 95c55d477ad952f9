import { chromium, devices, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/**
 * Debian's Chromium, headless. The background-networking flags matter here: with no internet,
 * Chromium's own connections otherwise fail many at a time and slow every start.
 */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** A phone-sized context (Pixel-class emulation: viewport, touch, user agent). */
export function phoneContext(browser: Browser): Promise<BrowserContext> {
  return browser.newContext({ ...devices['Pixel 7'], serviceWorkers: 'allow' });
}

/**
 * Waits until the service worker controls the page: the first load installs it, a reload is
 * then served through it. After this, `context.setOffline(true)` tests the offline path.
 */
export async function untilServiceWorkerControls(page: Page): Promise<void> {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}
