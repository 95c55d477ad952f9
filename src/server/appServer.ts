import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createLabApi, type LabApiOptions } from './labApi.ts';
import { createStaticHandler } from './staticFiles.ts';

export interface AppServerOptions {
  /** Folder of the built app (vite build output). */
  distDir: string;
  port: number;
  host: string;
  /** The lab's sync API under /api/; without it the server serves the app only. */
  api?: LabApiOptions;
}

export interface RunningServer {
  server: Server;
  url: string;
  close(): Promise<void>;
}

/** The app server: the built app, and the lab's sync API under /api/ on the same port. */
export async function startAppServer({ distDir, port, host, api }: AppServerOptions): Promise<RunningServer> {
  const serveStatic = createStaticHandler(distDir);
  const serveApi = api ? createLabApi(api) : null;
  const server = createServer((request, response) => {
    const isApi = (request.url ?? '/').startsWith('/api/');
    const handle = isApi && serveApi ? serveApi : serveStatic;
    handle(request, response).catch((error: unknown) => {
      console.error('request failed:', error);
      if (!response.headersSent) response.writeHead(500, { 'content-type': 'text/plain; charset=utf-8', connection: 'close' });
      response.end('server error\n');
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.address() as AddressInfo;
  const shownHost = host === '0.0.0.0' || host === '::' ? 'localhost' : host;
  return {
    server,
    url: `http://${shownHost}:${address.port}/`,
    close: () =>
      new Promise((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        // Idle keep-alive connections would hold close() open for seconds.
        server.closeIdleConnections();
      }),
  };
}
