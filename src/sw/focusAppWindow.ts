/** The little of a window client this needs (WindowClient in the service worker). */
export interface AppWindowLike {
  readonly url: string;
  readonly focused: boolean;
  focus(): Promise<unknown>;
}

/** The little of `self.clients` this needs. */
export interface AppClientsLike {
  matchAll(options: { type: 'window'; includeUncontrolled: boolean }): Promise<readonly AppWindowLike[]>;
  openWindow(url: string): Promise<unknown>;
}

/**
 * A tapped alarm notification brings the app to the front: the window already showing the run
 * (the focused one first, else the first of the app's windows), or a new one at the app's start
 * when none is open. Never a second copy of a running app: that would open a second session.
 */
export async function focusAppWindow(clients: AppClientsLike, scopeUrl: string): Promise<void> {
  const windows = (await clients.matchAll({ type: 'window', includeUncontrolled: true })).filter((w) => w.url.startsWith(scopeUrl));
  const target = windows.find((w) => w.focused) ?? windows[0];
  if (target) await target.focus();
  else await clients.openWindow(scopeUrl);
}
