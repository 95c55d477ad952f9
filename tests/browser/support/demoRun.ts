import type { Page } from 'playwright-core';

/** Ticks every pre-heat check, turns the heat on and waits for the Watch screen's head temperature. */
export async function heatOnThroughChecklist(page: Page): Promise<void> {
  const boxes = page.getByRole('checkbox');
  const count = await boxes.count();
  for (let i = 0; i < count; i++) await boxes.nth(i).check();
  await page.getByRole('button', { name: 'Heat on: start the run' }).click();
  await page.getByTestId('head-temp').waitFor();
}

/** Sets the demo speed in Settings, then goes through the checklist and starts a demo run. */
export async function startDemoRun(page: Page, speed = 600): Promise<void> {
  await page.getByRole('button', { name: 'Settings' }).click();
  await page.getByRole('radio', { name: `${speed}×` }).check({ force: true });
  await page.getByRole('button', { name: 'Watch' }).click();
  await page.getByRole('button', { name: 'Start demo run' }).click();
  await heatOnThroughChecklist(page);
}

/**
 * With the network already cut: a short demo run, ended, whose upload then fails (the sync line
 * says so). Leaves the page on the Run ended screen.
 */
export async function finishDemoRunUnsent(page: Page): Promise<void> {
  await startDemoRun(page, 10);
  await page.waitForFunction(() => {
    const text = document.querySelector('[data-testid="elapsed"]')?.textContent;
    return text !== undefined && text !== '0:00';
  });
  await page.getByRole('button', { name: 'End run' }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'End run' }).click();
  await page.getByRole('heading', { name: 'Run ended' }).waitFor();
  await page.waitForFunction(() => document.querySelector('[data-testid="sync-state"]')?.getAttribute('data-state') === 'failed');
}

/** Fakes for the alert channels headless Chromium lacks (it has no voices): they record what was asked. */
export const recordAlertsScript = `
  window.__spoken = [];
  window.__tones = 0;
  const fakeSynth = {
    speak(u) { window.__spoken.push(u.text); },
    cancel() {},
    getVoices() { return []; },
    addEventListener() {},
  };
  Object.defineProperty(window, 'speechSynthesis', { value: fakeSynth, configurable: true });
  const RealAudioContext = window.AudioContext;
  window.AudioContext = class extends RealAudioContext {
    createOscillator() { window.__tones += 1; return super.createOscillator(); }
  };
`;
