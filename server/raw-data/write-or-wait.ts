import { once } from 'node:events';
import type { Writable } from 'node:stream';

/** Writes `chunk`, then waits for 'drain' when the stream's buffer is full (backpressure). */
export async function writeOrWait(out: Writable, chunk: string): Promise<void> {
  if (!out.write(chunk)) await waitForDrain(out);
}

/** Waits until `out` wants more; throws when it closes first (the receiver went away). */
export async function waitForDrain(out: Writable): Promise<void> {
  if (!out.writableNeedDrain) return;
  const stop = new AbortController();
  try {
    const event = await Promise.race([
      once(out, 'drain', { signal: stop.signal }).then(() => 'drain'),
      once(out, 'close', { signal: stop.signal }).then(() => 'close'),
    ]);
    if (event === 'close') throw new Error('the receiver closed the download');
  } finally {
    stop.abort();
  }
}
