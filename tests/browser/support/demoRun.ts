import type { Page } from 'playwright-core';

/** Sets the demo speed in Settings, then goes through the checklist and starts a demo run. */
export async function startDemoRun(page: Page, speed = 600): Promise<void> {
  await page.getByRole('button', { name: 'Settings' }).click();
  await page.getByRole('radio', { name: `${speed}×` }).check({ force: true });
  await page.getByRole('button', { name: 'Watch' }).click();
  await page.getByRole('button', { name: 'Start demo run' }).click();
  const boxes = page.getByRole('checkbox');
  const count = await boxes.count();
  for (let i = 0; i < count; i++) await boxes.nth(i).check();
  await page.getByRole('button', { name: 'Heat on: start the run' }).click();
  await page.getByTestId('head-temp').waitFor();
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
