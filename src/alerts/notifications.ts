/**
 * System notifications while the page is hidden. On Android `new Notification()` throws; only
 * `registration.showNotification()` from the service worker works, so that is all we use.
 */
export interface NotifierDeps {
  permission: () => NotificationPermission | 'unsupported';
  requestPermission: () => Promise<NotificationPermission>;
  registration: () => Promise<Pick<ServiceWorkerRegistration, 'showNotification'> | undefined>;
  isPageHidden: () => boolean;
}

export function browserNotifierDeps(): NotifierDeps {
  return {
    permission: () => (typeof Notification === 'undefined' ? 'unsupported' : Notification.permission),
    requestPermission: () => Notification.requestPermission(),
    registration: async () => ('serviceWorker' in navigator ? navigator.serviceWorker.getRegistration() : undefined),
    isPageHidden: () => document.visibilityState === 'hidden',
  };
}

export class AlarmNotifier {
  readonly #deps: NotifierDeps;

  constructor(deps: NotifierDeps) {
    this.#deps = deps;
  }

  get permission(): NotificationPermission | 'unsupported' {
    return this.#deps.permission();
  }

  /** Asks once, from a tap; the answer is the browser's to keep. */
  async ask(): Promise<NotificationPermission | 'unsupported'> {
    const current = this.#deps.permission();
    if (current !== 'default') return current;
    return this.#deps.requestPermission();
  }

  /** Shows a notification when the page is hidden; the tag replaces an older one of the same alarm. */
  async notify(title: string, body: string, tag: string): Promise<boolean> {
    if (!this.#deps.isPageHidden() || this.#deps.permission() !== 'granted') return false;
    const registration = await this.#deps.registration();
    if (!registration) return false;
    await registration.showNotification(title, {
      body,
      tag,
      requireInteraction: true,
      icon: '/icons/cutbell-192.png',
      // `renotify` and `vibrate` are in the spec but not yet in TypeScript's DOM types.
      ...({ renotify: true, vibrate: [400, 150, 400] } as object),
    });
    return true;
  }
}
