// `npm start`: install if needed, build the app, serve it (and later the sync API) on one port.
// Port: `npm start -- --port 9000` or PORT=9000 npm start (default 8080).
import { ensureDependencies, run } from './lib/setup.mjs';

ensureDependencies();
if (run('npx', ['vite', 'build']) !== 0) process.exit(1);
process.exit(run('npx', ['tsx', 'src/server/main.ts', ...process.argv.slice(2)]));
