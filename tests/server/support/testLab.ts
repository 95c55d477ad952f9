import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startAppServer } from '../../../src/server/appServer.ts';
import type { LabApiOptions } from '../../../src/server/labApi.ts';
import { openLabDatabase, type LabDatabase } from '../../../src/server/labDatabase.ts';
import { createToken } from '../../../src/server/tokens.ts';

export interface TestLab {
  url: string;
  db: LabDatabase;
  token: string;
  dataDir: string;
  close(): Promise<void>;
}

/** A real server on 127.0.0.1 (port 0) with a temporary data folder and one token. */
export async function startTestLab(api: Omit<LabApiOptions, 'db'> = {}): Promise<TestLab> {
  const root = mkdtempSync(join(tmpdir(), 'cutbell-lab-'));
  const distDir = join(root, 'dist');
  mkdirSync(distDir);
  writeFileSync(join(distDir, 'index.html'), '<!doctype html><title>app</title>');
  const dataDir = join(root, 'data');
  const db = openLabDatabase(dataDir);
  const { token } = createToken(db, 'test phone');
  const running = await startAppServer({ distDir, port: 0, host: '127.0.0.1', api: { ...api, db } });
  return {
    url: running.url,
    db,
    token,
    dataDir,
    close: async () => {
      await running.close();
      db.close();
      rmSync(root, { recursive: true, force: true });
    },
  };
}
