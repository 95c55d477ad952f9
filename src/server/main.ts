// `npm start` ends here: serve the built app. Options: --port N (or PORT), --host H (or HOST).
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { startAppServer } from './appServer.ts';

const { values } = parseArgs({
  options: {
    port: { type: 'string', default: process.env.PORT ?? '8080' },
    host: { type: 'string', default: process.env.HOST ?? '0.0.0.0' },
    dist: { type: 'string', default: fileURLToPath(new URL('../../dist/', import.meta.url)) },
  },
});

const port = Number(values.port);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`cutbell server: --port must be a whole number 0-65535, not "${values.port}"`);
  process.exit(2);
}
if (!existsSync(`${values.dist}/index.html`)) {
  console.error(`cutbell server: no built app in ${values.dist}; run "npm run build" (npm start does it for you)`);
  process.exit(2);
}

const running = await startAppServer({ distDir: values.dist, port, host: values.host });
console.log(`Cutbell is being served at ${running.url}`);
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(signal, () => void running.close().then(() => process.exit(0)));
}
