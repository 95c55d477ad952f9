import type { ReadingHub } from './readingHub.ts';
import type { ReadingSource } from './readingSource.ts';
import { pause, type ReplyWaiter } from './replyWaiter.ts';
import type { SerialLink } from './serialLink.ts';

export interface PolledSourceParts {
  label: string;
  link: SerialLink;
  hub: ReadingHub;
  waiter: ReplyWaiter<unknown>;
  /** Units: s */
  intervalS: number;
  /** One query and its reply; `isRunning` says whether the source was stopped meanwhile. */
  pollOnce(isRunning: () => boolean): Promise<void>;
}

/**
 * A source that asks the instrument on a timer (Modbus registers, a query string): the polling
 * loop and the ReadingSource face shared by both, one query at a time while the link is up.
 */
export function polledSource({ label, link, hub, waiter, intervalS, pollOnce }: PolledSourceParts): ReadingSource {
  let running = false;
  const isRunning = () => running;

  async function loop(): Promise<void> {
    while (running) {
      if (link.isConnected) await pollOnce(isRunning);
      if (running) await pause(intervalS, () => !running);
    }
  }

  return {
    label,
    get status() {
      return hub.status;
    },
    async start(signal) {
      await link.start(signal);
      running = true;
      signal?.addEventListener('abort', () => (running = false), { once: true });
      void loop();
    },
    async stop() {
      running = false;
      waiter.cancel();
      await link.stop();
      hub.endAll();
    },
    onReading: (listener) => hub.onReading(listener),
    onStatus: (listener) => hub.onStatus(listener),
    readings: (signal) => hub.iterate(signal),
  };
}
