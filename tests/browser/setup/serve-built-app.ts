// Serves the built app (dist/, built by `npm test` before this project runs) on 127.0.0.1,
// with the lab's sync API on a temporary data folder and one token for the tests.
import type { TestProject } from 'vitest/node';
import { startBuiltAppLab } from '../support/builtAppLab.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    /** A token the lab server knows, for tests of sync and the lab view. */
    syncToken: string;
  }
}

export default async function setup(project: TestProject) {
  const lab = await startBuiltAppLab();
  project.provide('baseUrl', lab.url);
  project.provide('syncToken', lab.token);
  return () => lab.close();
}
