import { registerSW } from 'virtual:pwa-register';

/** The service worker's update flow behind a small interface (the page never touches it directly). */
export interface UpdateService {
  /** Calls back once a new version is waiting. */
  onUpdateReady(listener: () => void): void;
  /** Calls back once the app shell is cached and the app can start offline. */
  onOfflineReady(listener: () => void): void;
  /** Activates the waiting version and reloads. Only between runs. */
  applyUpdate(): Promise<void>;
}

export function startUpdateService(): UpdateService {
  const updateListeners: Array<() => void> = [];
  const offlineListeners: Array<() => void> = [];
  let isUpdateReady = false;
  let isOfflineReady = false;
  const update = registerSW({
    immediate: true,
    onNeedRefresh() {
      isUpdateReady = true;
      for (const listener of updateListeners) listener();
    },
    onOfflineReady() {
      isOfflineReady = true;
      for (const listener of offlineListeners) listener();
    },
    onRegisterError(error: unknown) {
      console.warn('Service worker registration failed; the app will not start offline.', error);
    },
  });
  return {
    onUpdateReady(listener) {
      updateListeners.push(listener);
      if (isUpdateReady) listener();
    },
    onOfflineReady(listener) {
      offlineListeners.push(listener);
      if (isOfflineReady) listener();
    },
    applyUpdate: () => update(true),
  };
}
