import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { request } from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type RunningServer } from '../../src/server/appServer.ts';

let dir: string;
let running: RunningServer;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'cutbell-static-'));
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>shell</title>');
  writeFileSync(join(dir, 'assets', 'index-abc.js'), 'console.log(1)');
  writeFileSync(join(dir, 'manifest.webmanifest'), '{}');
  running = await startAppServer({ distDir: dir, port: 0, host: '127.0.0.1' });
});

afterAll(async () => {
  await running.close();
  rmSync(dir, { recursive: true, force: true });
});

function get(path: string, method = 'GET'): Promise<{ status: number; headers: Record<string, unknown>; body: string }> {
  const url = new URL(running.url);
  return new Promise((resolve, reject) => {
    const req = request({ host: url.hostname, port: url.port, path, method }, (res) => {
      let body = '';
      res.on('data', (c) => (body += c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('the static app server', () => {
  it('serves the shell with revalidation and hashed assets as immutable', async () => {
    const shell = await get('/');
    expect(shell.status).toBe(200);
    expect(shell.headers['content-type']).toMatch(/text\/html/);
    expect(shell.headers['cache-control']).toBe('no-cache');
    const asset = await get('/assets/index-abc.js');
    expect(asset.headers['content-type']).toMatch(/javascript/);
    expect(asset.headers['cache-control']).toMatch(/immutable/);
  });

  it('serves the manifest with its media type', async () => {
    const manifest = await get('/manifest.webmanifest');
    expect(manifest.headers['content-type']).toMatch(/application\/manifest\+json/);
  });

  it('answers a screen path with the shell and a missing file with 404', async () => {
    expect((await get('/runs/today')).body).toContain('shell');
    expect((await get('/assets/missing.js')).status).toBe(404);
  });

  it('refuses paths that climb out of the app folder', async () => {
    const res = await get('/..%2f..%2fetc%2fpasswd');
    expect([403, 404]).toContain(res.status);
    expect(res.body).not.toContain('root:');
  });

  it('refuses methods other than GET and HEAD', async () => {
    expect((await get('/', 'POST')).status).toBe(405);
    const head = await get('/', 'HEAD');
    expect(head.status).toBe(200);
    expect(head.body).toBe('');
  });
});
