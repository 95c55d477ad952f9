export { MemoryStore } from './keyValueStore.ts';
export type { KeyValueStore, StoreKey } from './keyValueStore.ts';
export { idbKeyValueStore } from './idbKeyValueStore.ts';
export { RunJournal, loadRun, activeRunKey, chunkKey, manifestKey } from './runJournal.ts';
export type { JournalManifest, RestoredRun } from './runJournal.ts';
export { checkStorage } from './storageHealth.ts';
export type { StorageHealth, StorageLike } from './storageHealth.ts';
export { defaultSettings, loadSettings, saveSettings, pressureUnitSettings } from './settings.ts';
export type { Settings, TemperatureUnitSetting, PressureUnitSetting, DecimalSeparatorSetting } from './settings.ts';
