import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { startAppServer } from '../../../src/server/appServer.ts';
import { openLabDatabase } from '../../../src/server/labDatabase.ts';
import { createToken } from '../../../src/server/tokens.ts';

export interface BuiltAppLab {
  url: string;
  /** A token the lab server knows. */
  token: string;
  close(): Promise<void>;
}

/**
 * The built app (dist/, built by `npm test` before the browser tests) and the lab's sync API on
 * 127.0.0.1 (port 0), with a temporary data folder and one token.
 */
export async function startBuiltAppLab(): Promise<BuiltAppLab> {
  const distDir = fileURLToPath(new URL('../../../dist/', import.meta.url));
  if (!existsSync(`${distDir}index.html`)) {
    throw new Error('browser tests need a build: run "npx vite build" first (npm test does)');
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'cutbell-browser-lab-'));
  const db = openLabDatabase(dataDir);
  const { token } = createToken(db, 'browser test phone');
  const running = await startAppServer({ distDir, port: 0, host: '127.0.0.1', api: { db } });
  return {
    url: running.url,
    token,
    close: async () => {
      await running.close();
      db.close();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
