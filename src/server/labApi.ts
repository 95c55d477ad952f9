import type { IncomingMessage, ServerResponse } from 'node:http';
import { clientAddressOf, type ProxyHeader } from './clientAddress.ts';
import { FailureLimiter } from './failureLimiter.ts';
import type { LabDatabase } from './labDatabase.ts';
import { parseListQuery, QueryError } from './listQuery.ts';
import { BodyTooLarge, readBody } from './readBody.ts';
import { getRevision, listRuns, putRevision } from './runArchive.ts';
import { findToken, type TokenInfo } from './tokens.ts';
import { RecordError, validateRunRecord } from './validateRunRecord.ts';

export interface LabApiOptions {
  db: LabDatabase;
  /** Origins (scheme://host:port) other than the server's own that may call the API. */
  allowOrigins?: string[];
  /** Units: bytes. An 8-hour run at one reading a tenth of a second is about 4 MB of JSON. */
  maxBodyBytes?: number;
  /** Failed token checks allowed per client address per window before it gets 429. */
  failureLimit?: number;
  failureWindowMs?: number;
  /**
   * The lab's reverse proxies (addresses or CIDR ranges). Only a request whose socket comes from
   * one of them is counted by the address in `proxyHeader` (clientAddress.ts); otherwise, and
   * when this is empty, by the socket's own address, and no header is read.
   */
  proxyAddresses?: string[];
  proxyHeader?: ProxyHeader;
  now?: () => number;
}

export const defaultMaxBodyBytes = 16 * 1024 * 1024;

interface Reply {
  status: number;
  body: Buffer | string;
  headers?: Record<string, string>;
}

const json = (status: number, value: unknown, headers?: Record<string, string>): Reply => ({
  status,
  body: JSON.stringify(value),
  headers: { 'content-type': 'application/json; charset=utf-8', ...headers },
});
const problem = (status: number, error: string, field?: string, headers?: Record<string, string>): Reply =>
  json(status, field === undefined ? { error } : { error, field }, headers);

const runPath = /^\/api\/runs\/([A-Za-z0-9._-]{1,100})$/;
const revisionPath = /^\/api\/runs\/([A-Za-z0-9._-]{1,100})\/revisions\/([0-9]{1,9})$/;

/**
 * The lab's sync API under /api/: bearer tokens, strict JSON, CORS only for configured
 * origins. Returns a request handler for everything under /api/.
 */
export function createLabApi(options: LabApiOptions) {
  const { db } = options;
  const allowOrigins = new Set(options.allowOrigins ?? []);
  const maxBodyBytes = options.maxBodyBytes ?? defaultMaxBodyBytes;
  const limiter = new FailureLimiter(options.failureLimit ?? 10, options.failureWindowMs ?? 60_000, options.now);
  const clientAddress = clientAddressOf({ proxyAddresses: options.proxyAddresses, proxyHeader: options.proxyHeader });

  function corsHeaders(request: IncomingMessage): Record<string, string> {
    const origin = request.headers.origin;
    if (!origin || !allowOrigins.has(origin)) return { vary: 'Origin' };
    return {
      vary: 'Origin',
      'access-control-allow-origin': origin,
      'access-control-expose-headers': 'x-cutbell-revision, x-cutbell-revisions, retry-after',
    };
  }

  /** The caller's token, or the reply refusing it. */
  function authenticate(request: IncomingMessage): TokenInfo | Reply {
    const address = clientAddress(request);
    const waitS = limiter.retryAfterS(address);
    if (waitS > 0) return problem(429, `too many failed token checks from this address: try again in ${waitS} s`, undefined, { 'retry-after': String(waitS) });
    const match = /^Bearer ([A-Za-z0-9._~+/=-]{1,200})$/.exec(request.headers.authorization ?? '');
    const token = match ? findToken(db, match[1]!) : null;
    if (token) return token;
    limiter.recordFailure(address);
    const challenge = { 'www-authenticate': 'Bearer realm="cutbell"' };
    return match
      ? problem(401, 'the token is not known to this server or has been revoked', undefined, challenge)
      : problem(401, 'a token is needed: send "Authorization: Bearer <token>"', undefined, challenge);
  }

  async function upload(request: IncomingMessage, token: TokenInfo, runId: string, revision: number): Promise<Reply> {
    if (!(revision >= 1)) return problem(400, 'revision must be a whole number >= 1', 'revision');
    const type = (request.headers['content-type'] ?? '').split(';')[0]!.trim().toLowerCase();
    if (type !== 'application/json') return problem(415, `only application/json is accepted, not "${type || 'none'}"`);
    let bytes: Buffer;
    try {
      bytes = await readBody(request, maxBodyBytes);
    } catch (error) {
      if (error instanceof BodyTooLarge) return problem(413, `a run upload may be at most ${maxBodyBytes} bytes`);
      throw error;
    }
    let parsed: unknown;
    try {
      parsed = JSON.parse(bytes.toString('utf8'));
    } catch (error) {
      return problem(400, `the body is not JSON: ${error instanceof Error ? error.message : String(error)}`, '(body)');
    }
    try {
      const summary = validateRunRecord(parsed);
      if (summary.id !== runId) return problem(400, `id: "${summary.id}" does not match the run in the address ("${runId}")`, 'id');
      const outcome = putRevision(db, revision, bytes, summary, token.id);
      if (outcome === 'conflict') {
        return problem(409, `revision ${revision} of run ${runId} is already stored with other content: send it as a new revision`);
      }
      return json(outcome === 'stored' ? 201 : 200, { id: runId, revision, outcome });
    } catch (error) {
      if (error instanceof RecordError) return problem(400, error.message, error.field);
      throw error;
    }
  }

  function route(request: IncomingMessage, url: URL): Promise<Reply> | Reply {
    const method = request.method ?? 'GET';
    const path = url.pathname;
    if (path === '/api/health' && method === 'GET') return json(200, { service: 'cutbell-lab', ok: true });

    const revisionMatch = revisionPath.exec(path);
    const runMatch = runPath.exec(path);
    const known = path === '/api/whoami' || path === '/api/runs' || revisionMatch !== null || runMatch !== null;
    if (!known) return problem(404, `no such API path: ${path}`);
    const allowed = revisionMatch ? ['GET', 'PUT'] : ['GET'];
    if (!allowed.includes(method)) return problem(405, `${method} is not allowed here`, undefined, { allow: allowed.join(', ') });

    const auth = authenticate(request);
    if ('status' in auth) return auth;
    if (path === '/api/whoami') return json(200, { token: { id: auth.id, label: auth.label } });
    if (path === '/api/runs') {
      try {
        return json(200, listRuns(db, parseListQuery(url.searchParams)));
      } catch (error) {
        if (error instanceof QueryError) return problem(400, error.message, error.field);
        throw error;
      }
    }
    const [, runId, revisionText] = (revisionMatch ?? runMatch)!;
    const revision = revisionText === undefined ? null : Number(revisionText);
    if (method === 'PUT') return upload(request, auth, runId!, revision!);
    const stored = getRevision(db, runId!, revision);
    if (!stored) return problem(404, revision === null ? `no run ${runId}` : `no revision ${revision} of run ${runId}`);
    return {
      status: 200,
      body: stored.body,
      headers: {
        'content-type': 'application/json; charset=utf-8',
        'x-cutbell-revision': String(stored.revision),
        'x-cutbell-revisions': String(stored.revisions),
      },
    };
  }

  return async function handleApi(request: IncomingMessage, response: ServerResponse): Promise<void> {
    const url = new URL(request.url ?? '/', 'http://localhost');
    const cors = corsHeaders(request);
    let reply: Reply;
    if (request.method === 'OPTIONS') {
      reply = cors['access-control-allow-origin']
        ? {
            status: 204,
            body: '',
            headers: {
              'access-control-allow-methods': 'GET, PUT',
              'access-control-allow-headers': 'authorization, content-type',
              'access-control-max-age': '600',
            },
          }
        : problem(403, 'this origin may not call the API');
    } else {
      reply = await route(request, url);
    }
    const body = typeof reply.body === 'string' ? Buffer.from(reply.body, 'utf8') : reply.body;
    response.writeHead(reply.status, {
      'cache-control': 'no-store',
      'x-content-type-options': 'nosniff',
      'content-length': String(body.length),
      ...cors,
      ...reply.headers,
    });
    response.end(request.method === 'HEAD' ? undefined : body);
  };
}
