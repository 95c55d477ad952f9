import type { SyncTarget } from './syncStatus.ts';

export type UploadResult =
  | { kind: 'stored' }
  /** The server holds this revision with other content: send the run as a new revision. */
  | { kind: 'conflict'; reason: string }
  /**
   * Worth trying again later: no network or the server down (`isUnreachable`: no answer at
   * all), or the server busy or failing.
   */
  | { kind: 'retry'; reason: string; retryAfterMs: number | null; isUnreachable: boolean }
  /** Trying again cannot help until the token, the run or the server changes. */
  | { kind: 'refused'; reason: string };

/** The address of one run revision on the lab's server. */
export function revisionUrl(target: SyncTarget, runId: string, revision: number): string {
  return new URL(`api/runs/${encodeURIComponent(runId)}/revisions/${revision}`, target.serverUrl).href;
}

async function serverReason(response: Response): Promise<string> {
  try {
    const body = (await response.json()) as { error?: unknown };
    if (typeof body.error === 'string') return body.error;
  } catch {
    // Not our server's JSON (a proxy's error page): the status says enough.
  }
  return `HTTP ${response.status} ${response.statusText}`.trim();
}

/** How long one upload may take before it is given up. Units: ms */
export const defaultUploadTimeoutMs = 120_000;

/** PUTs one revision of a run record. Never throws: every outcome is a result. */
export async function uploadRun(
  fetchFn: typeof fetch,
  target: SyncTarget,
  runId: string,
  revision: number,
  body: string,
  timeoutMs = defaultUploadTimeoutMs,
): Promise<UploadResult> {
  let response: Response;
  try {
    response = await fetchFn(revisionUrl(target, runId, revision), {
      method: 'PUT',
      headers: { authorization: `Bearer ${target.token}`, 'content-type': 'application/json' },
      body,
      signal: AbortSignal.timeout(timeoutMs),
    });
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return { kind: 'retry', reason: `the lab server could not be reached (${detail})`, retryAfterMs: null, isUnreachable: true };
  }
  if (response.ok) {
    await response.body?.cancel().catch(() => undefined);
    return { kind: 'stored' };
  }
  const reason = await serverReason(response);
  if (response.status === 409) return { kind: 'conflict', reason };
  if (response.status === 429 || response.status === 408 || response.status >= 500) {
    const after = Number(response.headers.get('retry-after'));
    return { kind: 'retry', reason: `the lab server is busy or failing: ${reason}`, retryAfterMs: after > 0 ? after * 1000 : null, isUnreachable: false };
  }
  if (response.status === 401 || response.status === 403) {
    return { kind: 'refused', reason: `the lab server refused this phone's token: ${reason}. Check Settings.` };
  }
  return { kind: 'refused', reason: `the lab server refused the run: ${reason}` };
}
