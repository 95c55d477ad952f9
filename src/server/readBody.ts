import type { IncomingMessage } from 'node:http';

export class BodyTooLarge extends Error {
  constructor(readonly limitBytes: number) {
    super(`the body is larger than ${limitBytes} bytes`);
  }
}

/** Reads the whole request body, stopping as soon as it passes `limitBytes`. */
export function readBody(request: IncomingMessage, limitBytes: number): Promise<Buffer> {
  const declared = Number(request.headers['content-length']);
  if (Number.isFinite(declared) && declared > limitBytes) return Promise.reject(new BodyTooLarge(limitBytes));
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    const onData = (chunk: Buffer) => {
      size += chunk.length;
      if (size > limitBytes) {
        request.off('data', onData);
        // Keep reading and dropping the rest so the 413 can still be sent on this connection.
        request.resume();
        reject(new BodyTooLarge(limitBytes));
        return;
      }
      chunks.push(chunk);
    };
    request.on('data', onData);
    request.once('end', () => resolve(Buffer.concat(chunks, size)));
    request.once('error', reject);
  });
}
