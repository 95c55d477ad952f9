/**
 * The set-up link for a phone: the app's address with `#sync=<token>` (and `&server=<address>`
 * when the app is opened from elsewhere). A fragment never reaches any server's logs.
 */
export function syncLink(serverUrl: string, appUrl: string | null, token: string): string {
  let server: URL;
  try {
    server = new URL(serverUrl);
  } catch {
    throw new RangeError(`"${serverUrl}" is not an address such as http://lab-pc:8080/`);
  }
  if (server.protocol !== 'http:' && server.protocol !== 'https:') throw new RangeError(`"${serverUrl}" must start with http:// or https://`);
  let app = server;
  try {
    if (appUrl !== null) app = new URL(appUrl);
  } catch {
    throw new RangeError(`"${appUrl}" is not an address such as https://lab-pc:8080/`);
  }
  const base = `${app.origin}${app.pathname}`;
  const serverPart = app.origin === server.origin ? '' : `server=${encodeURIComponent(server.origin)}&`;
  return `${base}#${serverPart}sync=${encodeURIComponent(token)}`;
}
