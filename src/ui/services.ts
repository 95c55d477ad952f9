import {
  AlarmNotifier, Alerter, ScreenWakeLock, SpeechAnnouncer, TonePlayer, browserNotifierDeps, browserWakeLockDeps, vibrator,
} from '../alerts/index.ts';
import { browserClock } from '../sensor/clock.ts';
import { createSignalWatcher, type SessionDeps } from '../session/index.ts';
import { checkStorage, idbKeyValueStore, loadSettings, type KeyValueStore, type StorageHealth } from '../store/index.ts';
import { Outbox, runJson, syncTargetFrom } from '../sync/index.ts';

/** The browser's adapters, made once for the app and handed down (components never build them). */
export interface AppServices {
  store: KeyValueStore;
  alerter: Alerter;
  wakeLock: ScreenWakeLock;
  notifier: AlarmNotifier;
  sessionDeps: SessionDeps;
  /** Finished runs waiting for the lab's server (src/sync/README.md). */
  outbox: Outbox;
  checkStorage(askPersist: boolean): Promise<StorageHealth>;
}

export function createBrowserServices(): AppServices {
  const store = idbKeyValueStore();
  const notifier = new AlarmNotifier(browserNotifierDeps());
  const alerter = new Alerter({ speech: new SpeechAnnouncer(), tone: new TonePlayer(), vibrate: vibrator().vibrate, notifier });
  const wakeLock = new ScreenWakeLock(browserWakeLockDeps());
  const outbox = new Outbox({
    store,
    fetch: (input, init) => fetch(input, init),
    target: async () => syncTargetFrom(await loadSettings(store), location.origin),
    runJson: (runId) => runJson(store, runId),
    nowMs: () => Date.now(),
  });
  return {
    store,
    alerter,
    wakeLock,
    notifier,
    outbox,
    sessionDeps: {
      store,
      clock: browserClock,
      wallMs: () => Date.now(),
      alerter,
      wakeLock,
      createWatcher: createSignalWatcher,
      onFlushTimed: (start, duration, readings) => {
        performance.measure('cutbell journal flush', { start, duration, detail: { readings } });
      },
    },
    checkStorage: (askPersist) => checkStorage(globalThis.navigator?.storage, askPersist),
  };
}
