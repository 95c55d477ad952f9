/**
 * Reads the set-up link the server prints when a token is made:
 * `https://lab-pc:8080/#sync=<token>` (app and server at one address) or
 * `https://app.example/#server=<address>&sync=<token>`. Null when the fragment holds no token.
 */
export function readSyncLink(hash: string, pageOrigin: string): { syncServer: string; syncToken: string } | null {
  const params = new URLSearchParams(hash.replace(/^#/, ''));
  const token = params.get('sync')?.trim();
  if (!token) return null;
  return { syncServer: params.get('server')?.trim() || pageOrigin, syncToken: token };
}
