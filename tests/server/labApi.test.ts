import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createToken, revokeToken } from '../../src/server/tokens.ts';
import { demoRunRecord } from '../support/demoRunRecord.ts';
import { startTestLab, type TestLab } from './support/testLab.ts';

let lab: TestLab;
let clock = 1_000_000;

beforeAll(async () => {
  lab = await startTestLab({ maxBodyBytes: 256 * 1024, failureLimit: 3, failureWindowMs: 60_000, now: () => clock, allowOrigins: ['https://app.example'] });
});
afterAll(async () => {
  await lab.close();
});

function call(path: string, init: RequestInit & { token?: string | null } = {}): Promise<Response> {
  const { token = lab.token, ...rest } = init;
  const headers = new Headers(rest.headers);
  if (token !== null) headers.set('authorization', `Bearer ${token}`);
  return fetch(new URL(path, lab.url), { ...rest, headers });
}

const put = (id: string, revision: number, body: string, init: RequestInit & { token?: string | null } = {}) =>
  call(`api/runs/${id}/revisions/${revision}`, { method: 'PUT', body, ...init, headers: { 'content-type': 'application/json', ...init.headers } });

const rowCount = (id: string) => (lab.db.prepare('SELECT COUNT(*) AS n FROM run_revisions WHERE run_id = ?').get(id) as { n: number }).n;

describe('PUT /api/runs/:id/revisions/:n and GET /api/runs/:id', () => {
  it('gives back the uploaded bytes exactly, whitespace and number spelling included', async () => {
    // Pretty-printed with an odd spelling of a number: a re-serialising server would change both.
    const body = JSON.stringify(demoRunRecord('byte-check', 50), null, 1).replace('"pressure_pa": 101325', '"pressure_pa": 101325.0');
    expect(body).toContain('101325.0');
    const stored = await put('byte-check', 1, body);
    expect(stored.status).toBe(201);
    expect(await stored.json()).toEqual({ id: 'byte-check', revision: 1, outcome: 'stored' });
    const fetched = await call('api/runs/byte-check');
    expect(fetched.status).toBe(200);
    expect(fetched.headers.get('x-cutbell-revision')).toBe('1');
    expect(Buffer.from(await fetched.arrayBuffer()).equals(Buffer.from(body, 'utf8'))).toBe(true);
  });

  it('stores the same run and revision sent twice as one row', async () => {
    const body = JSON.stringify(demoRunRecord('twice', 20));
    expect((await put('twice', 1, body)).status).toBe(201);
    const again = await put('twice', 1, body);
    expect(again.status).toBe(200);
    expect((await again.json()).outcome).toBe('already-stored');
    expect(rowCount('twice')).toBe(1);
  });

  it('refuses other content under a revision already stored (409) and keeps the first', async () => {
    const first = JSON.stringify(demoRunRecord('conflict', 20));
    await put('conflict', 1, first);
    const other = JSON.stringify({ ...demoRunRecord('conflict', 20), title: 'changed' });
    expect((await put('conflict', 1, other)).status).toBe(409);
    expect(await (await call('api/runs/conflict')).text()).toBe(first);
  });

  it('keeps every revision and shows the newest', async () => {
    const one = JSON.stringify(demoRunRecord('amended', 20));
    const two = JSON.stringify({ ...demoRunRecord('amended', 20), title: 'amended title' });
    await put('amended', 1, one);
    await put('amended', 2, two);
    expect(rowCount('amended')).toBe(2);
    const newest = await call('api/runs/amended');
    expect(newest.headers.get('x-cutbell-revisions')).toBe('2');
    expect(await newest.text()).toBe(two);
    expect(await (await call('api/runs/amended/revisions/1')).text()).toBe(one);
    expect((await call('api/runs/amended/revisions/3')).status).toBe(404);
  });
});

describe('tokens on the API', () => {
  const body = JSON.stringify(demoRunRecord('token-check', 5));

  it('refuses a missing, a wrong and a revoked token with 401 and stores nothing', async () => {
    const phone = createToken(lab.db, 'revoked phone');
    revokeToken(lab.db, phone.id);
    for (const token of [null, 'cb1.not-a-real-token', phone.token]) {
      const response = await put('token-check', 1, body, { token, headers: { 'x-forwarded-for': 'ignored' } });
      expect(response.status).toBe(401);
      expect((await response.json()).error).toMatch(/token/);
      // Each refusal counted against 127.0.0.1: make room for the next one.
      clock += 61_000;
    }
    expect(rowCount('token-check')).toBe(0);
    expect((await call('api/runs', { token: null })).status).toBe(401);
  });

  it('answers 429 with Retry-After after too many failed tries from one address, even to a good token, until the window passes', async () => {
    clock += 61_000;
    for (let i = 0; i < 3; i++) expect((await call('api/runs', { token: `cb1.guess${i}` })).status).toBe(401);
    const limited = await call('api/runs');
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get('retry-after'))).toBeGreaterThan(0);
    clock += 61_000;
    expect((await call('api/runs')).status).toBe(200);
  });
});

describe('strict input', () => {
  const record = () => demoRunRecord('strict', 10) as unknown as Record<string, unknown>;

  it('refuses a body over the limit with 413', async () => {
    const big = JSON.stringify(demoRunRecord('strict', 40_000));
    expect(big.length).toBeGreaterThan(256 * 1024);
    const response = await put('strict', 1, big);
    expect(response.status).toBe(413);
    expect(rowCount('strict')).toBe(0);
  });

  it('refuses anything but application/json with 415', async () => {
    const response = await put('strict', 1, JSON.stringify(record()), { headers: { 'content-type': 'text/plain' } });
    expect(response.status).toBe(415);
  });

  it('refuses a body that is not JSON with 400', async () => {
    const response = await put('strict', 1, '{"format": "cutbell-run", ');
    expect(response.status).toBe(400);
    expect((await response.json()).field).toBe('(body)');
  });

  it.each([
    ['format', (r: Record<string, unknown>) => ({ ...r, format: 'other' })],
    ['version', (r: Record<string, unknown>) => ({ ...r, version: 2 })],
    ['status', (r: Record<string, unknown>) => ({ ...r, status: 'running' })],
    ['started_at', (r: Record<string, unknown>) => ({ ...r, started_at: 'yesterday' })],
    ['readings.head_c[3]', (r: Record<string, unknown>) => {
      const readings = r.readings as { time_s: number[]; head_c: unknown[] };
      const head_c = [...readings.head_c];
      head_c[3] = 'hot';
      return { ...r, readings: { ...readings, head_c } };
    }],
    ['readings.head_c', (r: Record<string, unknown>) => {
      const readings = r.readings as { time_s: number[]; head_c: unknown[] };
      return { ...r, readings: { ...readings, head_c: readings.head_c.slice(1) } };
    }],
    ['charge[0].unit', (r: Record<string, unknown>) => ({ ...r, charge: [{ name: 'ethanol', amount: 5, unit: 'cups' }] })],
    ['pressure_pa', (r: Record<string, unknown>) => ({ ...r, pressure_pa: 0 })],
    ['id', (r: Record<string, unknown>) => ({ ...r, id: 'another-run' })],
  ])('refuses a record with a bad %s with 400 naming the field', async (field, spoil) => {
    const response = await put('strict', 1, JSON.stringify(spoil(record())));
    expect(response.status).toBe(400);
    const answer = await response.json();
    expect(answer.field).toBe(field);
    expect(answer.error).toContain(field);
  });

  it('answers an unknown API path with 404 and a wrong method with 405', async () => {
    expect((await call('api/nothing')).status).toBe(404);
    expect((await call('api/runs', { method: 'DELETE' })).status).toBe(405);
  });
});

describe('GET /api/runs', () => {
  beforeAll(async () => {
    const days = [
      ['list-a', '2026-04-01T08:00:00.000Z', ['Toluene', 'cyclohexane']],
      ['list-b', '2026-04-02T08:00:00.000Z', ['ethanol', 'water']],
      ['list-c', '2026-04-03T23:30:00.000Z', ['toluene']],
    ] as const;
    for (const [id, startedAt, components] of days) {
      await put(id, 1, JSON.stringify(demoRunRecord(id, 10, { startedAt, components: [...components] })));
    }
  });

  it('filters by start day (both ends inclusive) and by component, whatever its case', async () => {
    const april = await (await call('api/runs?from=2026-04-01&to=2026-04-03')).json();
    expect(april.runs.map((r: { id: string }) => r.id)).toEqual(['list-c', 'list-b', 'list-a']);
    const toluene = await (await call('api/runs?component=TOLUENE&from=2026-04-01')).json();
    expect(toluene.runs.map((r: { id: string }) => r.id)).toEqual(['list-c', 'list-a']);
    expect(toluene.runs[1].uploadedBy).toBe('test phone');
  });

  it('pages with limit and offset and counts the total', async () => {
    const first = await (await call('api/runs?from=2026-04-01&to=2026-04-03&limit=2')).json();
    const second = await (await call('api/runs?from=2026-04-01&to=2026-04-03&limit=2&offset=2')).json();
    expect(first.total).toBe(3);
    expect(first.runs).toHaveLength(2);
    expect(second.runs.map((r: { id: string }) => r.id)).toEqual(['list-a']);
  });

  it('shows an amended run once, at its newest revision', async () => {
    const all = await (await call('api/runs?limit=200')).json();
    const amended = all.runs.filter((r: { id: string }) => r.id === 'amended');
    expect(amended).toHaveLength(1);
    expect(amended[0]).toMatchObject({ revision: 2, revisions: 2, title: 'amended title' });
  });

  it('refuses a bad query with 400 naming the parameter', async () => {
    for (const [query, field] of [['limit=0', 'limit'], ['offset=-1', 'offset'], ['from=soon', 'from']]) {
      const response = await call(`api/runs?${query}`);
      expect(response.status).toBe(400);
      expect((await response.json()).field).toBe(field);
    }
  });
});

describe('CORS', () => {
  it('answers a preflight from a configured origin and names it on replies', async () => {
    const preflight = await call('api/runs', { method: 'OPTIONS', token: null, headers: { origin: 'https://app.example', 'access-control-request-method': 'GET' } });
    expect(preflight.status).toBe(204);
    expect(preflight.headers.get('access-control-allow-origin')).toBe('https://app.example');
    expect(preflight.headers.get('access-control-allow-headers')).toMatch(/authorization/);
    const reply = await call('api/runs', { headers: { origin: 'https://app.example' } });
    expect(reply.headers.get('access-control-allow-origin')).toBe('https://app.example');
  });

  it('gives another origin no CORS permission', async () => {
    const preflight = await call('api/runs', { method: 'OPTIONS', token: null, headers: { origin: 'https://elsewhere.example' } });
    expect(preflight.status).toBe(403);
    const reply = await call('api/runs', { headers: { origin: 'https://elsewhere.example' } });
    expect(reply.headers.get('access-control-allow-origin')).toBeNull();
  });

  it('serves /api/health without a token and with no data', async () => {
    const health = await call('api/health', { token: null });
    expect(await health.json()).toEqual({ service: 'cutbell-lab', ok: true });
  });
});
