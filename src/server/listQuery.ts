import type { RunListQuery } from './runArchive.ts';

export class QueryError extends Error {
  constructor(readonly field: string, problem: string) {
    super(`${field}: ${problem}`);
  }
}

const dayPattern = /^\d{4}-\d{2}-\d{2}$/;
const dayMs = 86_400_000;

function parseTime(field: string, value: string): number {
  const ms = Date.parse(dayPattern.test(value) ? `${value}T00:00:00Z` : value);
  if (Number.isNaN(ms)) throw new QueryError(field, `"${value}" is not a date (YYYY-MM-DD) or an ISO 8601 time`);
  return ms;
}

/**
 * Reads `from`, `to` (days are whole UTC days, `to` inclusive), `component`, `limit` (1-200,
 * default 50) and `offset` from a list request's query string.
 */
export function parseListQuery(params: URLSearchParams): RunListQuery {
  const from = params.get('from');
  const to = params.get('to');
  const fromIso = from ? new Date(parseTime('from', from)).toISOString() : null;
  let beforeIso: string | null = null;
  if (to) {
    const toMs = parseTime('to', to);
    beforeIso = new Date(dayPattern.test(to) ? toMs + dayMs : toMs + 1).toISOString();
  }
  const limit = params.has('limit') ? Number(params.get('limit')) : 50;
  if (!Number.isInteger(limit) || limit < 1 || limit > 200) throw new QueryError('limit', 'must be a whole number 1-200');
  const offset = params.has('offset') ? Number(params.get('offset')) : 0;
  if (!Number.isInteger(offset) || offset < 0) throw new QueryError('offset', 'must be a whole number >= 0');
  const component = params.get('component')?.trim() || null;
  return { fromIso, beforeIso, component, limit, offset };
}
