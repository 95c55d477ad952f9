// Serves the built app (dist/, built by `npm test` before this project runs) on 127.0.0.1.
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';
import { startAppServer } from '../../../src/server/appServer.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const distDir = fileURLToPath(new URL('../../../dist/', import.meta.url));
  if (!existsSync(`${distDir}index.html`)) {
    throw new Error('browser tests need a build: run "npx vite build" first (npm test does)');
  }
  const running = await startAppServer({ distDir, port: 0, host: '127.0.0.1' });
  project.provide('baseUrl', running.url);
  return () => running.close();
}
