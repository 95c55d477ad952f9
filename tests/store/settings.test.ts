import { describe, expect, it } from 'vitest';
import { MemoryStore, defaultSettings, loadSettings, saveSettings } from '../../src/store/index.ts';

describe('settings', () => {
  it('loadSettings gives the defaults on a new phone', async () => {
    expect(await loadSettings(new MemoryStore())).toEqual(defaultSettings);
  });

  it('saveSettings then loadSettings round-trips', async () => {
    const store = new MemoryStore();
    const saved = { speech: false, sound: true, vibration: false, demoSpeed: 120, syncServer: 'https://lab.example:8443/', syncToken: 'cb1.abc' };
    await saveSettings(store, saved);
    expect(await loadSettings(store)).toEqual(saved);
  });

  it('loadSettings replaces malformed values with defaults and keeps the good ones', async () => {
    const store = new MemoryStore();
    await store.setMany([[['settings'], { speech: 'yes', sound: false, demoSpeed: -3, syncToken: 42 }]]);
    expect(await loadSettings(store)).toEqual({ ...defaultSettings, sound: false });
  });
});
