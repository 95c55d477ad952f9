import type { SyncTarget } from './syncStatus.ts';

/**
 * Where to sync, from the settings: the typed server address (or, when empty, the origin the
 * app was opened from) and the token. Null while no token is set: sync is off.
 * Throws RangeError for an address that is not http(s).
 */
export function syncTargetFrom(settings: { syncServer: string; syncToken: string }, pageOrigin: string): SyncTarget | null {
  const token = settings.syncToken.trim();
  if (!token) return null;
  return { serverUrl: normaliseServerUrl(settings.syncServer.trim() || pageOrigin), token };
}

/** "lab-pc:8080" or "https://lab/x" -> an absolute http(s) address ending in "/". */
export function normaliseServerUrl(address: string): string {
  const withScheme = /^[a-z][a-z0-9+.-]*:\/\//i.test(address) ? address : `http://${address}`;
  let url: URL;
  try {
    url = new URL(withScheme);
  } catch {
    throw new RangeError(`"${address}" is not a server address such as http://lab-pc:8080`);
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') throw new RangeError(`"${address}" must be an http:// or https:// address`);
  url.search = '';
  url.hash = '';
  if (!url.pathname.endsWith('/')) url.pathname += '/';
  return url.href;
}
