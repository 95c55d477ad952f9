// @vitest-environment happy-dom
import { render } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import { createManualSource, type ManualSource } from '../../../src/sensor/manualSource.ts';
import type { Reading } from '../../../src/sensor/protocols/reading.ts';
import { TypedReadingPad } from '../../../src/ui/sensor/TypedReadingPad.tsx';

let host: HTMLElement;
afterEach(() => {
  render(null, host);
  host.remove();
});

const settle = () => new Promise((resolve) => setTimeout(resolve, 0));

async function mount(unit: 'C' | 'F' = 'C', decimalMark: '.' | ',' = '.') {
  let nowS = 100;
  const source: ManualSource = createManualSource({ clock: () => nowS, unit, reminderEveryS: 60 });
  await source.start();
  const stored: Reading[] = [];
  source.onReading((r) => stored.push(r));
  let reminders = 0;
  host = document.createElement('div');
  document.body.append(host);
  render(<TypedReadingPad source={source} onReminder={() => reminders++} decimalMark={decimalMark} />, host);
  const press = async (...labels: string[]) => {
    for (const label of labels) {
      const button = [...host.querySelectorAll('button')].find((b) => (b.getAttribute('aria-label') ?? b.textContent) === label);
      if (!button) throw new Error(`no key ${label}`);
      button.click();
      await settle();
    }
  };
  return { source, stored, press, reminders: () => reminders, setNow: (s: number) => (nowS = s), display: () => host.querySelector('[data-testid="typed-display"]')!.textContent };
}

describe('TypedReadingPad', () => {
  it('stores the typed value at the time Enter is pressed and clears the display', async () => {
    const pad = await mount();
    await pad.press('7', '8', 'decimal point', '5');
    expect(pad.display()).toMatch(/^78\.5/);
    pad.setNow(161);
    await pad.press('Enter');
    expect(pad.stored).toHaveLength(1);
    expect(pad.stored[0]).toMatchObject({ headC: 78.5, timeS: 161, valid: true });
    expect(pad.display()).toMatch(/^–/);
    pad.source.stop();
  });

  it('with a decimal comma set, the key and the display show a comma and the value is the same', async () => {
    const pad = await mount('C', ',');
    await pad.press('7', '8', 'decimal comma', '5');
    expect(pad.display()).toMatch(/^78,5/);
    expect(host.querySelector('[aria-label="decimal comma"]')!.textContent).toBe(',');
    await pad.press('Enter');
    expect(pad.stored[0]).toMatchObject({ headC: 78.5, valid: true });
    expect(host.textContent).toContain('Stored 78,5 °C');
    pad.source.stop();
  });

  it('converts degF to degC', async () => {
    const pad = await mount('F');
    await pad.press('2', '1', '2', 'Enter');
    // 212 degF is 100 degC by the definition of the Fahrenheit scale (NIST SP 811, B.8).
    expect(pad.stored[0]!.headC).toBeCloseTo(100, 10);
    pad.source.stop();
  });

  it('an impossible value asks for confirmation: nothing is stored on cancel, it is stored on confirm', async () => {
    const pad = await mount();
    await pad.press('9', '5', '0', 'Enter');
    expect(host.textContent).toMatch(/Store this reading\?/);
    expect(pad.stored).toHaveLength(0);
    await pad.press('Cancel');
    expect(pad.stored).toHaveLength(0);
    expect(host.textContent).toMatch(/Not stored/);
    await pad.press('Enter');
    await pad.press('Store it');
    expect(pad.stored.map((r) => r.headC)).toEqual([950]);
    pad.source.stop();
  });

  it('delete takes the last digit back, minus gives a negative reading, and Enter needs a digit', async () => {
    const pad = await mount();
    const enter = [...host.querySelectorAll('button')].find((b) => b.textContent === 'Enter')!;
    expect(enter.disabled).toBe(true);
    await pad.press('2', '5', 'delete', 'minus');
    expect(pad.display()).toMatch(/^-2/);
    await pad.press('Enter');
    expect(pad.stored[0]!.headC).toBe(-2);
    pad.source.stop();
  });

  it('calls onReminder when a reading is due', async () => {
    const pad = await mount();
    pad.source.onReminder(() => {}); // a second listener does not stop the pad's own
    const reminders = pad.reminders();
    expect(reminders).toBe(0);
    pad.setNow(161);
    await new Promise((resolve) => setTimeout(resolve, 1100));
    expect(pad.reminders()).toBe(1);
    pad.source.stop();
  });

  it('shows the ten digits, point, minus, delete and Enter', async () => {
    await mount();
    const names = [...host.querySelectorAll('.keypad-key')].map((b) => b.getAttribute('aria-label') ?? b.textContent);
    expect(names.sort()).toEqual(['0', '1', '2', '3', '4', '5', '6', '7', '8', '9', 'Enter', 'decimal point', 'delete', 'minus']);
  });
});
