// Serves the built app (dist/, built by `npm test` before this project runs) on 127.0.0.1,
// with the lab's sync API on a temporary data folder and one token for the tests.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';
import { startAppServer } from '../../../src/server/appServer.ts';
import { openLabDatabase } from '../../../src/server/labDatabase.ts';
import { createToken } from '../../../src/server/tokens.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    /** A token the lab server knows, for tests of sync and the lab view. */
    syncToken: string;
  }
}

export default async function setup(project: TestProject) {
  const distDir = fileURLToPath(new URL('../../../dist/', import.meta.url));
  if (!existsSync(`${distDir}index.html`)) {
    throw new Error('browser tests need a build: run "npx vite build" first (npm test does)');
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'cutbell-browser-lab-'));
  const db = openLabDatabase(dataDir);
  const { token } = createToken(db, 'browser test phone');
  const running = await startAppServer({ distDir, port: 0, host: '127.0.0.1', api: { db } });
  project.provide('baseUrl', running.url);
  project.provide('syncToken', token);
  return async () => {
    await running.close();
    db.close();
    rmSync(dataDir, { recursive: true, force: true });
  };
}
