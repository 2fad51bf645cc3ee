import { randomUUID } from 'node:crypto';
import { count, eq, inArray, sql } from 'drizzle-orm';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import { syncBatchResultSchema, type SyncItemResult } from '@shared/field-sync/sync-batch';
import { interviews } from '../../server/db/schema';
import { createFieldSetup, fieldInterview, type FieldSetup } from '../support/field-setup';
import type { SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db } = testApp.deps;
let setup: FieldSetup;

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Unstorable sync');
});

afterAll(async () => {
  await db.$client.end();
});

async function sync(agent: SignedInAgent, items: unknown[]): Promise<SyncItemResult[]> {
  const response = await agent.post('/api/field/sync', { interviews: items });
  expect(response.status).toBe(200);
  return syncBatchResultSchema.parse(response.body).results; // the shared contract holds
}

async function storedIds(ids: string[]): Promise<string[]> {
  const rows = await db
    .select({ id: interviews.id })
    .from(interviews)
    .where(inArray(interviews.id, ids));
  return rows.map((row) => row.id).sort();
}

const remarks = (good: FieldInterview, value: string): FieldInterview => ({
  ...good,
  answers: { ...good.answers, remarks: { value } },
});

const rejectedAt = (result: SyncItemResult | undefined) =>
  result?.outcome === 'rejected'
    ? { code: result.code, paths: result.issues.map((issue) => issue.path) }
    : result?.outcome;

describe('POST /api/field/sync judges each interview on its own', () => {
  it('stores the good interviews of a batch and refuses what the database cannot hold, by field', async () => {
    const good = [fieldInterview(setup), fieldInterview(setup)];
    const nul = remarks(fieldInterview(setup), 'kiosk\u0000closed');
    const halfEmoji = remarks(fieldInterview(setup), `bread ${'🍞'[0]}`);
    const yearZero = { ...fieldInterview(setup), startedAt: '0000-06-01T08:00:00Z' };
    const batch = [good[0], nul, halfEmoji, yearZero, good[1]];

    const first = await sync(setup.agents.enumerator, batch);
    expect(first.map((r) => r.outcome)).toEqual([
      'accepted',
      'rejected',
      'rejected',
      'rejected',
      'accepted',
    ]);
    expect(rejectedAt(first[1])).toEqual({
      code: 'invalid-interview',
      paths: ['answers.remarks.value'],
    });
    expect(rejectedAt(first[2])).toEqual({
      code: 'invalid-interview',
      paths: ['answers.remarks.value'],
    });
    expect(rejectedAt(first[3])).toEqual({ code: 'invalid-interview', paths: ['startedAt'] });
    expect(first[1]?.outcome === 'rejected' && first[1].message).toMatch(/NUL/);
    expect(first[2]?.outcome === 'rejected' && first[2].message).toMatch(/broken character/);
    expect(first[3]?.outcome === 'rejected' && first[3].message).toMatch(/between 1 and 9999/);

    const ids = batch.map((item) => item.id);
    expect(await storedIds(ids)).toEqual([good[0].id, good[1].id].sort());

    // The device sends the same batch again: the good are duplicates, the bad refused alike.
    const again = await sync(setup.agents.enumerator, batch);
    expect(again.map((r) => r.outcome)).toEqual([
      'duplicate',
      'rejected',
      'rejected',
      'rejected',
      'duplicate',
    ]);
    expect(again.map(rejectedAt)).toEqual(
      first.map((r, i) => (i % 4 === 0 ? 'duplicate' : rejectedAt(r))),
    );
    expect(await storedIds(ids)).toEqual([good[0].id, good[1].id].sort());
  });

  it('refuses an offset that carries the start into year 0 in UTC', async () => {
    const item = {
      ...fieldInterview(setup),
      startedAt: '0001-01-01T00:30:00+01:00',
      finishedAt: '0001-01-01T00:40:00+01:00',
    };
    const [result] = await sync(setup.agents.enumerator, [item]);
    expect(rejectedAt(result)).toEqual({
      code: 'invalid-interview',
      paths: ['startedAt', 'finishedAt'],
    });
  });

  it('rejects alone an interview the database still refuses, keeping the rest of the batch', async () => {
    // A rule the shared schemas do not know: the database refuses one marked answer.
    const marker = `refused-${randomUUID()}`;
    await db.execute(
      sql.raw(`alter table interviews add constraint refuse_marker_test
        check ((answers->'remarks'->>'value') is distinct from '${marker}') not valid`),
    );
    try {
      const good = [fieldInterview(setup), fieldInterview(setup)];
      const refused = remarks(fieldInterview(setup), marker);
      const batch = [good[0], refused, good[1]];
      const results = await sync(setup.agents.enumerator, batch);
      expect(results.map((r) => r.outcome)).toEqual(['accepted', 'rejected', 'accepted']);
      expect(rejectedAt(results[1])).toEqual({ code: 'unstorable', paths: ['interview'] });
      expect(await storedIds(batch.map((item) => item.id))).toEqual(
        [good[0].id, good[1].id].sort(),
      );
      const again = await sync(setup.agents.enumerator, batch);
      expect(again.map((r) => r.outcome)).toEqual(['duplicate', 'rejected', 'duplicate']);
    } finally {
      await db.execute(sql`alter table interviews drop constraint refuse_marker_test`);
    }
  });
});

describe('POST /api/field/sync treats interview ids without regard to case', () => {
  it('answers an upper-case resend of a stored interview as a duplicate', async () => {
    const item = fieldInterview(setup);
    expect((await sync(setup.agents.enumerator, [item]))[0]?.outcome).toBe('accepted');
    const upper = { ...item, id: item.id.toUpperCase() };
    const [again] = await sync(setup.agents.enumerator, [upper]);
    expect(again).toMatchObject({ outcome: 'duplicate', id: item.id });
    const [row] = await db
      .select({ n: count() })
      .from(interviews)
      .where(eq(interviews.id, item.id));
    expect(row?.n).toBe(1);
  });

  it('refuses the same id twice in one batch even when its case differs', async () => {
    const item = fieldInterview(setup);
    const results = await sync(setup.agents.enumerator, [
      item,
      { ...item, id: item.id.toUpperCase() },
    ]);
    expect(results.map((r) => r.outcome)).toEqual(['accepted', 'rejected']);
    expect(results[1]).toMatchObject({ code: 'repeated-in-batch' });
  });
});

describe('POST /api/field/sync does not reveal another enumerator’s interviews', () => {
  it('answers an id another enumerator holds exactly as any other conflict', async () => {
    const theirs = fieldInterview(setup, {
      routeId: setup.otherRouteId,
      pointId: setup.otherPoint.id,
    });
    expect((await sync(setup.agents.second, [theirs]))[0]?.outcome).toBe('accepted');
    const mine = fieldInterview(setup);
    expect((await sync(setup.agents.enumerator, [mine]))[0]?.outcome).toBe('accepted');

    const [onTheirs] = await sync(setup.agents.enumerator, [
      fieldInterview(setup, { id: theirs.id }),
    ]);
    const [onMine] = await sync(setup.agents.enumerator, [fieldInterview(setup, { id: mine.id })]);
    const shape = (result: SyncItemResult | undefined) =>
      result?.outcome === 'rejected' ? { ...result, index: 0, id: 'x' } : result;
    expect(onTheirs?.outcome).toBe('rejected');
    expect(shape(onTheirs)).toEqual(shape(onMine));
  });
});
