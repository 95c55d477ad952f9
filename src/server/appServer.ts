import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createStaticHandler } from './staticFiles.ts';

export interface AppServerOptions {
  /** Folder of the built app (vite build output). */
  distDir: string;
  port: number;
  host: string;
}

export interface RunningServer {
  server: Server;
  url: string;
  close(): Promise<void>;
}

/** The app server: static app today; the lab's sync API will mount under /api/. */
export async function startAppServer({ distDir, port, host }: AppServerOptions): Promise<RunningServer> {
  const serveStatic = createStaticHandler(distDir);
  const server = createServer((request, response) => {
    serveStatic(request, response).catch((error: unknown) => {
      console.error('request failed:', error);
      if (!response.headersSent) response.writeHead(500, { 'content-type': 'text/plain; charset=utf-8' });
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
    close: () => new Promise((resolve, reject) => server.close((error) => (error ? reject(error) : resolve()))),
  };
}
