// `npm start` ends here: serve the built app and the lab's sync API on one port.
// Options: see `help` below (`npm start -- --help`).
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { startAppServer } from './appServer.ts';
import { parseByteSize } from './byteSize.ts';
import { clientAddressOf, proxyHeaders, type ProxyHeader } from './clientAddress.ts';
import { openLabDatabase } from './labDatabase.ts';
import { defaultMaxBodyBytes } from './labApi.ts';

const help = `Serve the Cutbell app and the lab's sync API on one port.

npm start -- [options]

  --port N               port to listen on (default 8080, or PORT)
  --host H               address to listen on (default 0.0.0.0, or HOST)
  --data DIR             folder of the lab's SQLite records (default ./data)
  --dist DIR             the built app (default dist/)
  --allow-origin ORIGIN  another site whose pages may call the API (repeatable)
  --max-body SIZE        largest run upload (default 16MiB)
  --proxy-address ADDR   the lab's reverse proxy, as an address or CIDR range (repeatable, or
                         comma-separated in CUTBELL_PROXY_ADDRESSES). Only for requests from
                         it, failed token checks are counted per phone by the right-most
                         address in --proxy-header that is not a listed proxy; otherwise by
                         the connection's address, and the header is never read.
  --proxy-header NAME    x-forwarded-for (default) or forwarded (RFC 7239): the header the
                         proxy appends to (or CUTBELL_PROXY_HEADER)
  --help                 this text

Tokens: npm run server -- token create "hood 3 phone" (see npm run server -- --help).`;

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
      'proxy-address': { type: 'string', multiple: true, default: (process.env.CUTBELL_PROXY_ADDRESSES ?? '').split(',') },
      'proxy-header': { type: 'string', default: process.env.CUTBELL_PROXY_HEADER ?? 'x-forwarded-for' },
      help: { type: 'boolean', default: false },
    },
  }));
} catch (error) {
  fail(error instanceof Error ? error.message : String(error));
}

if (values.help) {
  console.log(help);
  process.exit(0);
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

const proxyAddresses = values['proxy-address'].flatMap((a) => a.split(',')).map((a) => a.trim()).filter(Boolean);
const proxyHeader = values['proxy-header'].trim().toLowerCase() as ProxyHeader;
if (!proxyHeaders.includes(proxyHeader)) fail(`--proxy-header must be ${proxyHeaders.join(' or ')}, not "${values['proxy-header']}"`);
try {
  clientAddressOf({ proxyAddresses, proxyHeader });
} catch (error) {
  fail(`--proxy-address: ${error instanceof Error ? error.message : String(error)}`);
}

const dataDir = resolve(values.data);
const db = openLabDatabase(dataDir);
const running = await startAppServer({ distDir: values.dist, port, host: values.host, api: { db, allowOrigins, maxBodyBytes, proxyAddresses, proxyHeader } });
if (proxyAddresses.length > 0) console.log(`Phones are told apart by ${proxyHeader} on requests from ${proxyAddresses.join(', ')}`);
console.log(`Cutbell is being served at ${running.url} (lab records in ${dataDir})`);
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(signal, () =>
    void running.close().finally(() => {
      db.close();
      process.exit(0);
    }),
  );
}
