import {
  AlarmNotifier, Alerter, ScreenWakeLock, SpeechAnnouncer, TonePlayer, browserNotifierDeps, browserWakeLockDeps, vibrator,
} from '../alerts/index.ts';
import { browserClock } from '../sensor/clock.ts';
import { createSignalWatcher, type SessionDeps } from '../session/index.ts';
import { checkStorage, idbKeyValueStore, type KeyValueStore, type StorageHealth } from '../store/index.ts';

/** The browser's adapters, made once for the app and handed down (components never build them). */
export interface AppServices {
  store: KeyValueStore;
  alerter: Alerter;
  wakeLock: ScreenWakeLock;
  notifier: AlarmNotifier;
  sessionDeps: SessionDeps;
  checkStorage(askPersist: boolean): Promise<StorageHealth>;
}

export function createBrowserServices(): AppServices {
  const store = idbKeyValueStore();
  const notifier = new AlarmNotifier(browserNotifierDeps());
  const alerter = new Alerter({ speech: new SpeechAnnouncer(), tone: new TonePlayer(), vibrate: vibrator().vibrate, notifier });
  const wakeLock = new ScreenWakeLock(browserWakeLockDeps());
  return {
    store,
    alerter,
    wakeLock,
    notifier,
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
