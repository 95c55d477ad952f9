import type { KeyValueStore } from './keyValueStore.ts';

/** The chemist's preferences, kept on the phone. */
export interface Settings {
  speech: boolean;
  sound: boolean;
  vibration: boolean;
  /** Simulated seconds per real second for the demo source. */
  demoSpeed: number;
  /** The lab server's address; empty means the server this app was opened from. */
  syncServer: string;
  /** This phone's token for the lab server; empty means sync is off. */
  syncToken: string;
}

export const defaultSettings: Settings = { speech: true, sound: true, vibration: true, demoSpeed: 30, syncServer: '', syncToken: '' };

const settingsKey = ['settings'];

/** Loads settings, filling anything missing or malformed with the defaults. */
export async function loadSettings(store: KeyValueStore): Promise<Settings> {
  let saved: Partial<Settings> | undefined;
  try {
    saved = await store.get<Partial<Settings>>(settingsKey);
  } catch {
    saved = undefined;
  }
  const pick = <K extends keyof Settings>(key: K): Settings[K] =>
    saved && typeof saved[key] === typeof defaultSettings[key] ? (saved[key] as Settings[K]) : defaultSettings[key];
  const demoSpeed = pick('demoSpeed');
  return {
    speech: pick('speech'),
    sound: pick('sound'),
    vibration: pick('vibration'),
    demoSpeed: demoSpeed > 0 ? demoSpeed : defaultSettings.demoSpeed,
    syncServer: pick('syncServer'),
    syncToken: pick('syncToken'),
  };
}

export function saveSettings(store: KeyValueStore, settings: Settings): Promise<void> {
  return store.setMany([[settingsKey, settings]]);
}
