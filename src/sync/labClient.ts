import type { LabRunItem } from '../run/index.ts';
import type { SyncTarget } from './syncStatus.ts';

export type { LabRunItem };

export interface LabRunQuery {
  /** YYYY-MM-DD (UTC day) or ISO time; `to` is inclusive for days. */
  from?: string;
  to?: string;
  component?: string;
  limit?: number;
  offset?: number;
}

export class LabRequestError extends Error {
  constructor(readonly status: number, message: string) {
    super(message);
  }
}

async function getJson(fetchFn: typeof fetch, target: SyncTarget, path: string): Promise<unknown> {
  let response: Response;
  try {
    response = await fetchFn(new URL(path, target.serverUrl).href, { headers: { authorization: `Bearer ${target.token}` } });
  } catch (error) {
    throw new LabRequestError(0, `the lab server could not be reached (${error instanceof Error ? error.message : String(error)})`);
  }
  const body: unknown = await response.json().catch(() => null);
  if (!response.ok) {
    const error = (body as { error?: unknown } | null)?.error;
    throw new LabRequestError(response.status, typeof error === 'string' ? error : `HTTP ${response.status}`);
  }
  return body;
}

/** Every synced run from every phone, newest first, one page at a time. */
export async function fetchLabRuns(fetchFn: typeof fetch, target: SyncTarget, query: LabRunQuery = {}): Promise<{ runs: LabRunItem[]; total: number }> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, String(value));
  const search = params.size > 0 ? `?${params}` : '';
  return (await getJson(fetchFn, target, `api/runs${search}`)) as { runs: LabRunItem[]; total: number };
}

/** One run's record (its newest revision) as the phone sent it. */
export async function fetchLabRun(fetchFn: typeof fetch, target: SyncTarget, runId: string): Promise<unknown> {
  return getJson(fetchFn, target, `api/runs/${encodeURIComponent(runId)}`);
}
