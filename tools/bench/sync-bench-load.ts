import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import type { BenchDevice } from './sync-bench-setup';

/** A batch as the device sends it: serialised before the clock starts. */
export const batchBody = (batch: FieldInterview[]) => JSON.stringify({ interviews: batch });

/** Sends one batch as the device; answers how many interviews the server accepted. */
export async function postBatch(url: string, device: BenchDevice, body: string): Promise<number> {
  const response = await fetch(`${url}/api/field/sync`, {
    method: 'POST',
    headers: {
      Cookie: device.cookie,
      'x-csrf-token': device.csrfToken,
      'Content-Type': 'application/json',
    },
    body,
  });
  if (response.status !== 200)
    throw new Error(`sync answered ${response.status}: ${await response.text()}`);
  const { results } = (await response.json()) as SyncBatchResult;
  const refused = results.find((r) => r.outcome === 'rejected');
  if (refused) throw new Error(`the bench sent a bad interview: ${JSON.stringify(refused)}`);
  return results.filter((r) => r.outcome === 'accepted').length;
}

/**
 * Every device sends its batches one after the other, all devices at once (as phones coming
 * back online together would); answers the interviews accepted and the wall-clock seconds.
 */
export async function runDevices(
  url: string,
  devices: BenchDevice[],
  bodies: string[][],
): Promise<{ accepted: number; seconds: number }> {
  const started = process.hrtime.bigint();
  const counts = await Promise.all(
    devices.map(async (device, d) => {
      let accepted = 0;
      for (const body of bodies[d]) accepted += await postBatch(url, device, body);
      return accepted;
    }),
  );
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  return { accepted: counts.reduce((a, b) => a + b, 0), seconds };
}
