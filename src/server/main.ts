// `npm start` ends here: serve the built app and the lab's sync API on one port.
// Options: --port N (or PORT), --host H (or HOST), --data DIR (default ./data),
// --allow-origin ORIGIN (repeatable; other sites allowed to call the API), --max-body 16MiB.
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { startAppServer } from './appServer.ts';
import { parseByteSize } from './byteSize.ts';
import { openLabDatabase } from './labDatabase.ts';
import { defaultMaxBodyBytes } from './labApi.ts';

function fail(message: string): never {
  console.error(`cutbell server: ${message}`);
  process.exit(2);
}

let values;
try {
  ({ values } = parseArgs({
    options: {
      port: { type: 'string', default: process.env.PORT ?? '8080' },
      host: { type: 'string', default: process.env.HOST ?? '0.0.0.0' },
      dist: { type: 'string', default: fileURLToPath(new URL('../../dist/', import.meta.url)) },
      data: { type: 'string', default: 'data' },
      'allow-origin': { type: 'string', multiple: true, default: [] },
      'max-body': { type: 'string' },
    },
  }));
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
}

const port = Number(values.port);
if (!Number.isInteger(port) || port < 0 || port > 65535) fail(`--port must be a whole number 0-65535, not "${values.port}"`);
if (!existsSync(`${values.dist}/index.html`)) fail(`no built app in ${values.dist}; run "npm run build" (npm start does it for you)`);
const allowOrigins = values['allow-origin'].flatMap((o) => o.split(',')).map((o) => o.trim()).filter(Boolean);
for (const origin of allowOrigins) {
  let parsed: URL | null = null;
  try {
    parsed = new URL(origin);
  } catch {
    parsed = null;
  }
  if (!parsed || parsed.origin !== origin) fail(`--allow-origin wants an origin such as https://lab.example.org:8443, not "${origin}"`);
}
let maxBodyBytes = defaultMaxBodyBytes;
try {
  if (values['max-body']) maxBodyBytes = parseByteSize(values['max-body']);
} catch (error) {
  fail(`--max-body: ${error instanceof Error ? error.message : String(error)}`);
}

const dataDir = resolve(values.data);
const db = openLabDatabase(dataDir);
const running = await startAppServer({ distDir: values.dist, port, host: values.host, api: { db, allowOrigins, maxBodyBytes } });
console.log(`Cutbell is being served at ${running.url} (lab records in ${dataDir})`);
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(signal, () =>
    void running.close().finally(() => {
      db.close();
      process.exit(0);
    }),
  );
}
