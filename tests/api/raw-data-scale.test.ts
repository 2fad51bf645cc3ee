import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { rawDataPath, rawDataQuery } from '@shared/raw-data/raw-data-request';
import { insertManyInterviews } from '../support/many-interviews';
import { insertRawDataStudy, type RawDataStudy } from '../support/raw-data-study';
import type { SignedInAgent } from '../support/signed-in-agent';
import { agentsFor } from '../support/study-agents';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';

const INTERVIEWS = 100_000;
// Holding the download would take at least its own size (about 43 MB of CSV text here); a streamed one needs the cursor's batch and the socket's buffers.
const HEAP_GROWTH_LIMIT = 32 * 1024 * 1024;
/** A heap sample every 2 MB received: about twenty during the CSV, six during the XLSX. */
const SAMPLE_EVERY_BYTES = 2 * 1024 * 1024;

const testApp = createTestApp();
const { db } = testApp.deps;
let study: RawDataStudy;
let researcher: SignedInAgent;

describe('a download of 100,000 interviews', () => {
  beforeAll(async () => {
    const organisation = await createTestOrganisation(db, 'Raw data scale');
    study = await insertRawDataStudy(db, organisation);
    researcher = (await agentsFor(testApp, organisation)).researcher;
    await insertManyInterviews(db, study, organisation.people.enumerator.userId, INTERVIEWS);
  }, 120_000);

  afterAll(async () => {
    await db.$client.end();
  });

  // A full collection before each sample, so the samples measure what is held, not garbage
  // waiting for the collector (the flag is V8's own; set at run time it applies from now on).
  setFlagsFromString('--expose-gc');
  const collect = runInNewContext('gc') as () => void;

  function liveHeap(): number {
    collect();
    return process.memoryUsage().heapUsed;
  }

  /**
   * Downloads over a real socket while sampling the heap of this process (the app runs in it),
   * counting lines and bytes as they arrive and keeping none of them. The heap is sampled by
   * bytes received, not by the clock: each sample is a full collection, whose cost grows with
   * everything the test process holds, and sampling every second in a long-lived test worker
   * left the download itself starved of time.
   */
  async function downloadCounting(file: 'csv' | 'xlsx') {
    const path = `${rawDataPath(study.studyId, file)}?${rawDataQuery({ filter: { flagged: 'include' } })}`;
    const server = testApp.app.listen(0, '127.0.0.1');
    await once(server, 'listening');
    const { port } = server.address() as AddressInfo;
    const baseline = liveHeap();
    let peak = baseline;
    let bytes = 0;
    let nextSampleAt = SAMPLE_EVERY_BYTES;
    let lines = 0;
    try {
      const response = await fetch(`http://127.0.0.1:${port}${path}`, {
        headers: { cookie: researcher.cookie },
      });
      expect(response.status).toBe(200);
      for await (const chunk of response.body as unknown as AsyncIterable<Uint8Array>) {
        bytes += chunk.length;
        for (const byte of chunk) if (byte === 10) lines++;
        if (bytes >= nextSampleAt) {
          peak = Math.max(peak, liveHeap());
          nextSampleAt += SAMPLE_EVERY_BYTES;
        }
      }
    } finally {
      server.close();
    }
    return { bytes, lines, growth: peak - baseline };
  }

  it('streams the CSV without the heap growing with the study', async () => {
    const { bytes, lines, growth } = await downloadCounting('csv');
    expect(lines).toBe(INTERVIEWS + 5 + 1); // the seeded five, the many, the header
    expect(bytes).toBeGreaterThan(HEAP_GROWTH_LIMIT);
    expect(growth).toBeLessThan(HEAP_GROWTH_LIMIT);
  }, 300_000);

  it('streams the XLSX without the heap growing with the study', async () => {
    const { bytes, growth } = await downloadCounting('xlsx');
    expect(bytes).toBeGreaterThan(HEAP_GROWTH_LIMIT / 4);
    expect(growth).toBeLessThan(HEAP_GROWTH_LIMIT);
  }, 300_000);
});
