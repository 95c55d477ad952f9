import { describe, expect, it } from 'vitest';
import { MemoryStore, defaultSettings, loadSettings, saveSettings, type Settings } from '../../src/store/index.ts';

describe('settings', () => {
  it('loadSettings gives the defaults on a new phone', async () => {
    expect(await loadSettings(new MemoryStore())).toEqual(defaultSettings);
  });

  it('saveSettings then loadSettings round-trips', async () => {
    const store = new MemoryStore();
    const chosen: Settings = {
      speech: false, sound: true, vibration: false, demoSpeed: 120, alarmRepeatS: 60, snoozeMin: 5,
      breakthroughRiseC: 2, noVapourMin: 45, fallAwayC: 3, sensorSilenceS: 10, readingReminderS: 120, temperatureUnit: 'degF', pressureUnit: 'mmHg', decimalSeparator: ',',
      syncServer: 'https://lab.example:8443/', syncToken: 'cb1.abc',
    };
    await saveSettings(store, chosen);
    expect(await loadSettings(store)).toEqual(chosen);
  });

  it('loadSettings replaces malformed values with defaults and keeps the good ones', async () => {
    const store = new MemoryStore();
    await store.setMany([[['settings'], { speech: 'yes', sound: false, demoSpeed: -3, temperatureUnit: 'K', pressureUnit: 'mmhg', decimalSeparator: ';', syncToken: 42, alarmRepeatS: 2, snoozeMin: Number.NaN,
      breakthroughRiseC: 0, noVapourMin: 600, fallAwayC: '4', sensorSilenceS: -1, readingReminderS: Number.POSITIVE_INFINITY }]]);
    expect(await loadSettings(store)).toEqual({ ...defaultSettings, sound: false });
  });

  it('loadSettings fills the unit settings in for settings saved before they existed', async () => {
    const store = new MemoryStore();
    await store.setMany([[['settings'], { speech: true, sound: true, vibration: true, demoSpeed: 10 }]]);
    const loaded = await loadSettings(store);
    expect([loaded.temperatureUnit, loaded.pressureUnit, loaded.decimalSeparator, loaded.demoSpeed]).toEqual(['degC', 'kPa', 'auto', 10]);
  });

  it('loadSettings gives the watcher defaults for alarm thresholds saved before they existed', async () => {
    const store = new MemoryStore();
    await store.setMany([[['settings'], { alarmRepeatS: 60 }]]);
    const loaded = await loadSettings(store);
    expect([loaded.breakthroughRiseC, loaded.noVapourMin, loaded.fallAwayC, loaded.sensorSilenceS, loaded.readingReminderS]).toEqual([1, 30, 4, 5, 60]);
    expect(loaded.alarmRepeatS).toBe(60);
  });
});
