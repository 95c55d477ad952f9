import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const stub = (path: string) => fileURLToPath(new URL(path, import.meta.url));

export default defineConfig({
  oxc: { jsx: { runtime: 'automatic', importSource: 'preact' } },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/**/*.test.{ts,tsx}'],
          exclude: ['tests/browser/**'],
          environment: 'node',
          alias: { 'virtual:pwa-register': stub('./tests/support/pwa-register-stub.ts') },
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/browser/setup/serve-built-app.ts'],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          // One Chromium at a time: the machine has two cores.
          fileParallelism: false,
        },
      },
    ],
  },
});
