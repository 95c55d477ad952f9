import { afterAll, beforeAll, expect, it } from 'vitest';
import type { Browser, BrowserContext } from 'playwright-core';
import { launchChromium, phoneContext, untilServiceWorkerControls } from './support/browser.ts';
import { startBuiltAppLab, type BuiltAppLab } from './support/builtAppLab.ts';
import { finishDemoRunUnsent } from './support/demoRun.ts';

// A lab server of this test's own (its origin, data folder and token), so the run it sends is
// the only one there and other tests' servers and registrations are not touched.
let browser: Browser;
let lab: BuiltAppLab;
beforeAll(async () => {
  lab = await startBuiltAppLab();
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  await lab?.close();
});

const api = (path: string) => fetch(new URL(path, lab.url), { headers: { authorization: `Bearer ${lab.token}` } });

/**
 * Fires Background Sync's `sync` event at the app's service worker through the DevTools
 * protocol (ServiceWorker.dispatchSyncEvent), as Chromium does when the network is back. The
 * session is on a blank page of the same browser profile: no page of the app is open.
 */
async function dispatchSyncEvent(context: BrowserContext, tag: string): Promise<void> {
  const blank = await context.newPage();
  const cdp = await context.newCDPSession(blank);
  const origin = new URL(lab.url).origin;
  const registrationId = await new Promise<string>((resolve) => {
    cdp.on('ServiceWorker.workerRegistrationUpdated', ({ registrations }) => {
      const ours = registrations.find((r) => r.scopeURL === `${origin}/` && !r.isDeleted);
      if (ours) resolve(ours.registrationId);
    });
    void cdp.send('ServiceWorker.enable');
  });
  await cdp.send('ServiceWorker.dispatchSyncEvent', { origin, registrationId, tag, lastChance: false });
  await cdp.detach();
  await blank.close();
}

it("the service worker's sync handler sends a run finished offline after the app's pages are closed", async () => {
  const context = await phoneContext(browser);
  const page = await context.newPage();
  await page.goto(`${lab.url}#sync=${encodeURIComponent(lab.token)}`);
  await untilServiceWorkerControls(page);

  await context.setOffline(true);
  await finishDemoRunUnsent(page);

  const { runIds, tags } = await page.evaluate(async () => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const open = indexedDB.open('cutbell');
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    const keys = await new Promise<IDBValidKey[]>((resolve, reject) => {
      const request = db.transaction('records').objectStore('records').getAllKeys();
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error);
    });
    db.close();
    const registration = (await navigator.serviceWorker.ready) as ServiceWorkerRegistration & { sync: { getTags(): Promise<string[]> } };
    return {
      runIds: keys.filter((k): k is [string, string] => Array.isArray(k) && k[0] === 'outbox').map((k) => k[1]),
      tags: await registration.sync.getTags(),
    };
  });
  expect(runIds).toHaveLength(1);
  const runId = runIds[0]!;
  // The page asked for Background Sync when its upload got no answer.
  expect(tags).toContain('cutbell-outbox');

  // Every page of the app closed: nothing but the service worker can send the run now.
  await page.close();
  expect(context.pages()).toHaveLength(0);
  expect((await api(`api/runs/${runId}`)).status).toBe(404);

  // Chromium fires the waiting sync itself when the (emulated) network comes back. The first
  // attempt is cut off here, so the worker's handler rejects and the sync stays registered.
  const cutOff: { url: string; isFromWorker: boolean }[] = [];
  await context.route('**/api/runs/**', (route) => {
    cutOff.push({ url: route.request().url(), isFromWorker: route.request().serviceWorker() !== null });
    return route.abort('internetdisconnected');
  });
  await context.setOffline(false);
  for (let i = 0; i < 100 && cutOff.length === 0; i++) await new Promise((resolve) => setTimeout(resolve, 100));
  expect(cutOff).toEqual([{ url: expect.stringMatching(new RegExp(`/api/runs/${runId}/revisions/1$`)), isFromWorker: true }]);
  await context.unrouteAll();
  expect((await api(`api/runs/${runId}`)).status).toBe(404);

  // The next sync event (Chromium would retry after some minutes) sends it.
  await dispatchSyncEvent(context, 'cutbell-outbox');
  let fetched = await api(`api/runs/${runId}`);
  for (let i = 0; i < 100 && fetched.status === 404; i++) {
    await new Promise((resolve) => setTimeout(resolve, 200));
    fetched = await api(`api/runs/${runId}`);
  }
  expect(fetched.status).toBe(200);
  expect(fetched.headers.get('x-cutbell-revisions')).toBe('1');
  const record = (await fetched.json()) as { id: string; status: string; readings: { time_s: number[] } };
  expect(record.id).toBe(runId);
  expect(record.status).toBe('ended');
  expect(record.readings.time_s.length).toBeGreaterThan(0);

  // Opened again, the app shows what the worker did: the run is synced, not sent twice.
  const again = await context.newPage();
  await again.goto(lab.url);
  await again.getByRole('button', { name: 'Runs' }).click();
  await again.locator(`[data-run-id="${runId}"] .sync-state[data-sync="synced"]`).waitFor();
  expect((await api(`api/runs/${runId}`)).headers.get('x-cutbell-revisions')).toBe('1');
  await context.close();
});
