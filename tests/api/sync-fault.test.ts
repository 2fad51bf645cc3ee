import { count, eq, inArray } from 'drizzle-orm';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { SyncBatchResult, SyncItemResult } from '@shared/field-sync/sync-batch';
import { interviews } from '../../server/db/schema';
import { killHard, startCompiledServer, type RunningServer } from '../support/compiled-server';
import { createFieldSetup, fieldInterview, type FieldSetup } from '../support/field-setup';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db } = testApp.deps;
const rounds = 5;
const batchSize = 200;

/**
 * One web process, so the SIGKILL lands on the very process holding the batch (a cluster's
 * primary, killed, lets its web processes finish their current step first).
 */
const startServer = () => startCompiledServer({ WEB_PROCESSES: '1' });

let setup: FieldSetup;
let headers: Record<string, string>;

async function post(url: string, batch: FieldInterview[]): Promise<SyncItemResult[]> {
  const response = await fetch(`${url}/api/field/sync`, {
    method: 'POST',
    headers,
    body: JSON.stringify({ interviews: batch }),
  });
  if (response.status !== 200) throw new Error(`sync answered ${response.status}`);
  return ((await response.json()) as SyncBatchResult).results;
}

async function studyRowCount(): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(interviews)
    .where(eq(interviews.studyId, setup.studyId));
  return row.n;
}

async function storedOf(batch: FieldInterview[]): Promise<number> {
  const ids = batch.map((item) => item.id);
  const [row] = await db.select({ n: count() }).from(interviews).where(inArray(interviews.id, ids));
  return row.n;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Polls until `check` holds (or 10 s pass, which fails the test). */
async function until(check: () => Promise<boolean>, what: string): Promise<void> {
  for (let waited = 0; waited < 10_000; waited += 10) {
    if (await check()) return;
    await sleep(10);
  }
  throw new Error(`gave up waiting for ${what}`);
}

/** Kills the server at a random moment within `window` ms of sending; true if before the answer. */
async function killAtRandom(server: RunningServer, batch: FieldInterview[], window: number) {
  let answered = false;
  const attempt = post(server.url, batch).then(
    () => (answered = true),
    () => undefined,
  );
  await sleep(Math.random() * window);
  await killHard(server);
  await attempt;
  return !answered;
}

/**
 * Kills the server while its COPY of the batch is inside PostgreSQL: the test holds a lock on
 * the study row that the statement's reference check waits for, kills the server there, lets
 * go, and waits for the orphaned statement's backend to end. Answers how much of the batch was
 * stored then: all of it (the statement finished and committed on its own) or none — never part.
 */
async function killDuringInsert(server: RunningServer, batch: FieldInterview[]) {
  const lock = await db.$client.connect();
  let blocked: number | undefined;
  try {
    await lock.query('begin');
    await lock.query('select 1 from studies where id = $1 for update', [setup.studyId]);
    const attempt = post(server.url, batch).catch(() => undefined);
    await until(async () => {
      const waiting = await db.$client.query<{ pid: number }>(
        `select pid from pg_stat_activity where wait_event_type = 'Lock'
           and query ilike 'copy interviews %'`,
      );
      blocked = waiting.rows[0]?.pid;
      return blocked !== undefined;
    }, 'the server’s COPY to reach the lock');
    await killHard(server);
    await attempt;
  } finally {
    await lock.query('rollback');
    lock.release();
  }
  await until(async () => {
    const alive = await db.$client.query('select 1 from pg_stat_activity where pid = $1', [
      blocked,
    ]);
    return alive.rowCount === 0;
  }, 'the orphaned backend to end');
  return storedOf(batch);
}

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Sync fault');
  const agent = setup.agents.enumerator;
  headers = {
    Cookie: agent.cookie,
    'x-csrf-token': agent.csrfToken,
    'Content-Type': 'application/json',
  };
});

afterAll(async () => {
  await db.$client.end();
});

it('stores every interview exactly once when the server is killed mid-batch again and again', async () => {
  const fresh = () =>
    Array.from({ length: batchSize }, (_, i) =>
      fieldInterview(setup, { pointId: setup.points[i % 2].id }),
    );
  const warmUp = fresh();
  const batches = Array.from({ length: rounds }, fresh);
  let server = await startServer();
  const notes: string[] = [];
  try {
    // How long a fresh server takes to answer a new batch: random kills fall within it.
    const started = Date.now();
    await post(server.url, warmUp);
    const window = Date.now() - started;
    for (const [round, batch] of batches.entries()) {
      if (round % 2 === 1) {
        const stored = await killDuringInsert(server, batch);
        expect([0, batchSize]).toContain(stored);
        notes.push(`killed inside the COPY (${stored} of ${batchSize} stored by then)`);
      } else {
        const cut = await killAtRandom(server, batch, window);
        notes.push(`killed at random ${cut ? 'before' : 'after'} the answer`);
      }
      server = await startServer();
      const results = await post(server.url, batch);
      expect(results).toHaveLength(batchSize);
      const unanswered = results.filter(
        (r) => r.outcome !== 'accepted' && r.outcome !== 'duplicate',
      );
      expect(unanswered).toEqual([]);
    }
    const all = [warmUp, ...batches].flat();
    expect(await studyRowCount()).toBe(all.length);
    const stored = await db
      .select({ id: interviews.id })
      .from(interviews)
      .where(eq(interviews.studyId, setup.studyId));
    expect(new Set(stored.map((row) => row.id))).toEqual(new Set(all.map((item) => item.id)));
    // A replay of everything, after all that, adds nothing.
    for (const batch of batches) {
      const replay = await post(server.url, batch);
      expect(new Set(replay.map((r) => r.outcome))).toEqual(new Set(['duplicate']));
    }
    expect(await studyRowCount()).toBe(all.length);
    console.log(`sync fault (window ${window} ms):\n${notes.join('\n')}`);
  } finally {
    await killHard(server);
  }
}, 180_000);
