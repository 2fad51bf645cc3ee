import { randomUUID } from 'node:crypto';
import { eq, inArray } from 'drizzle-orm';
import {
  interviews,
  questionnaireVersions,
  routes,
  samplingPoints,
  studies,
  users,
} from '../../server/db/schema';
import { createFieldSetup, type FieldSetup } from '../support/field-setup';
import { insertPerson, insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';

/**
 * The statement-level reference checks that stand in for row-level foreign keys on interviews
 * (drizzle/0007): the same guarantees, checked once per statement.
 */
const testApp = createTestApp();
const { db } = testApp.deps;
let setup: FieldSetup;

type InterviewRow = typeof interviews.$inferInsert;

function row(overrides: Partial<InterviewRow> = {}): InterviewRow {
  return {
    id: randomUUID(),
    studyId: setup.studyId,
    questionnaireVersionId: setup.versionId,
    routeId: setup.routeId,
    pointId: setup.points[0].id,
    enumeratorId: setup.organisation.people.enumerator.userId,
    answers: { consent: { agreed: true } },
    startedAt: new Date(Date.now() - 600_000),
    finishedAt: new Date(),
    ...overrides,
  };
}

/** The PostgreSQL error a rejected statement raised (drizzle wraps it as the cause). */
async function failure(statement: Promise<unknown>): Promise<{ code?: string; message: string }> {
  try {
    await statement;
  } catch (error) {
    const cause = (error as { cause?: { code?: string; message: string } }).cause;
    return cause ?? (error as { code?: string; message: string });
  }
  throw new Error('the statement succeeded');
}

const storedIds = async (ids: string[]) =>
  (await db.select({ id: interviews.id }).from(interviews).where(inArray(interviews.id, ids))).map(
    (r) => r.id,
  );

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'References');
});

afterAll(async () => {
  await db.$client.end();
});

describe('interviews refer only to parents that exist', () => {
  it.each([
    ['study', { studyId: randomUUID() }],
    ['questionnaire version', { questionnaireVersionId: randomUUID() }],
    ['route', { routeId: randomUUID() }],
    ['point', { pointId: randomUUID() }],
    ['enumerator', { enumeratorId: randomUUID() }],
  ] as const)(
    'refuses a statement with one unknown %s, storing none of its rows',
    async (what, bad) => {
      const good = row();
      const wrong = row(bad);
      const error = await failure(db.insert(interviews).values([good, wrong]));
      expect(error.code).toBe('23503'); // foreign_key_violation, as a foreign key would raise
      expect(error.message).toBe(`an interview refers to a ${what} that does not exist`);
      expect(await storedIds([good.id, wrong.id])).toEqual([]);
    },
  );

  it('stores rows whose optional references are empty', async () => {
    const bare = row({ routeId: null, pointId: null, enumeratorId: null });
    await db.insert(interviews).values(bare);
    expect(await storedIds([bare.id])).toEqual([bare.id]);
  });

  it('checks an update only when it changes a reference', async () => {
    const stored = row();
    await db.insert(interviews).values(stored);
    await db.update(interviews).set({ status: 'accepted' }).where(eq(interviews.id, stored.id));
    const error = await failure(
      db.update(interviews).set({ routeId: randomUUID() }).where(eq(interviews.id, stored.id)),
    );
    expect(error.code).toBe('23503');
    expect(error.message).toBe('an interview refers to a route that does not exist');
  });
});

describe('deleting a parent', () => {
  it('clears the references to a deleted route, point and enumerator', async () => {
    const person = await insertPerson(db, setup.organisation.id, 'enumerator', 'leaving');
    const [point] = await db
      .insert(samplingPoints)
      .values({
        studyId: setup.studyId,
        code: `GONE-${randomUUID().slice(0, 4)}`,
        name: 'Closed stall',
        kind: 'shop',
        latitude: -0.12,
        longitude: 34.76,
        stratum: 'Lakeside',
      })
      .returning({ id: samplingPoints.id });
    const [route] = await db
      .insert(routes)
      .values({
        studyId: setup.studyId,
        name: 'Short-lived route',
        enumeratorId: person.userId,
        windowStart: '2027-03-01',
        windowEnd: '2027-03-31',
      })
      .returning({ id: routes.id });
    const stored = row({ routeId: route.id, pointId: point.id, enumeratorId: person.userId });
    await db.insert(interviews).values(stored);
    await db.delete(routes).where(eq(routes.id, route.id));
    await db.delete(samplingPoints).where(eq(samplingPoints.id, point.id));
    await db.delete(users).where(eq(users.id, person.userId));
    const [after] = await db.select().from(interviews).where(eq(interviews.id, stored.id));
    expect(after).toMatchObject({ routeId: null, pointId: null, enumeratorId: null });
    expect(after.studyId).toBe(setup.studyId);
  });

  it('takes a deleted study’s interviews with it', async () => {
    const bareStudy = await insertStudy(db, setup.organisation.id, []);
    const stored = row({ studyId: bareStudy, routeId: null, pointId: null });
    await db.insert(interviews).values(stored);
    await db.delete(studies).where(eq(studies.id, bareStudy));
    expect(await storedIds([stored.id])).toEqual([]);
  });

  it('refuses to delete a questionnaire version that interviews were taken with', async () => {
    // A draft (published versions are frozen by their own trigger), referred to directly.
    const stored = row({ questionnaireVersionId: setup.draftVersionId });
    await db.insert(interviews).values(stored);
    const error = await failure(
      db.delete(questionnaireVersions).where(eq(questionnaireVersions.id, setup.draftVersionId)),
    );
    expect(error.code).toBe('23503');
    expect(error.message).toBe('a questionnaire version with interviews cannot be deleted');
  });

  it('waits for a transaction that is storing interviews of the route (the parent is locked)', async () => {
    const [route] = await db
      .insert(routes)
      .values({
        studyId: setup.studyId,
        name: 'Route in use',
        windowStart: '2027-03-01',
        windowEnd: '2027-03-31',
      })
      .returning({ id: routes.id });
    const storing = await db.$client.connect();
    const deleting = await db.$client.connect();
    const stored = row({ routeId: route.id });
    try {
      await storing.query('BEGIN');
      await storing.query(
        `INSERT INTO interviews (id, study_id, questionnaire_version_id, route_id, answers,
           started_at, finished_at) VALUES ($1, $2, $3, $4, '{}', now(), now())`,
        [stored.id, stored.studyId, stored.questionnaireVersionId, route.id],
      );
      await deleting.query("SET lock_timeout = '300ms'");
      const blocked = await deleting.query('DELETE FROM routes WHERE id = $1', [route.id]).then(
        () => null,
        (error: { code?: string }) => error.code,
      );
      expect(blocked).toBe('55P03'); // lock_not_available: the delete had to wait
      await storing.query('COMMIT');
      await deleting.query('DELETE FROM routes WHERE id = $1', [route.id]);
      const [after] = await db.select().from(interviews).where(eq(interviews.id, stored.id));
      expect(after.routeId).toBeNull();
    } finally {
      await storing.query('ROLLBACK').catch(() => undefined);
      storing.release();
      deleting.release();
    }
  });
});
