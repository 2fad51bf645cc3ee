import { randomUUID } from 'node:crypto';
import { count, eq, inArray } from 'drizzle-orm';
import { fieldAssignmentsSchema } from '@shared/field-sync/field-assignments';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import { qualityThresholds } from '@shared/field-sync/quality/quality-thresholds';
import { syncBatchResultSchema, type SyncItemResult } from '@shared/field-sync/sync-batch';
import type { StudyProgress } from '@shared/routes/route-progress';
import { interviewPhotos, interviews } from '../../server/db/schema';
import {
  createFieldSetup,
  fakeJpeg,
  fieldInterview,
  respondentKey,
  withPhotos,
  type FieldSetup,
} from '../support/field-setup';
import type { SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db } = testApp.deps;
let setup: FieldSetup;

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Field sync');
});

afterAll(async () => {
  await db.$client.end();
});

async function sync(agent: SignedInAgent, items: unknown[]): Promise<SyncItemResult[]> {
  const response = await agent.post('/api/field/sync', { interviews: items });
  expect(response.status).toBe(200);
  return syncBatchResultSchema.parse(response.body).results; // the shared contract holds
}

async function storedCount(studyId = setup.studyId): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(interviews)
    .where(eq(interviews.studyId, studyId));
  return row.n;
}

const rejected = (result: SyncItemResult) => {
  if (result.outcome !== 'rejected') throw new Error(`expected a rejection, got ${result.outcome}`);
  return result;
};

describe('GET /api/field/assignments', () => {
  it('gives the enumerator their route with its points, the study and only published versions', async () => {
    const response = await setup.agents.enumerator.get('/api/field/assignments');
    expect(response.status).toBe(200);
    const body = fieldAssignmentsSchema.parse(response.body); // the shared contract holds
    expect(body.routes.map((r) => r.id)).toEqual([setup.routeId]);
    expect(body.routes[0].stops.map((s) => [s.pointId, s.latitude, s.longitude])).toEqual(
      setup.points.map((p) => [p.id, p.latitude, p.longitude]),
    );
    expect(body.studies.map((s) => s.id)).toEqual([setup.studyId]);
    expect(body.questionnaireVersions.map((v) => v.id)).toEqual([setup.versionId]);
    expect(body.questionnaireVersions[0].definition.blocks.map((b) => b.id)).toEqual([
      'consent',
      'ladder',
      'psm',
      'where',
      'tags',
      'size',
      'remarks',
    ]);
  });

  it('gives another enumerator only their own route', async () => {
    const body = fieldAssignmentsSchema.parse(
      (await setup.agents.second.get('/api/field/assignments')).body,
    );
    expect(body.routes.map((r) => r.id)).toEqual([setup.otherRouteId]);
  });

  it('refuses a supervisor (the device endpoints are the enumerator’s)', async () => {
    const response = await setup.agents.supervisor.get('/api/field/assignments');
    expect(response.status).toBe(403);
  });
});

describe('POST /api/field/sync with bad items among good ones', () => {
  const cases: [string, (good: FieldInterview) => unknown, string, string][] = [
    [
      'an unknown questionnaire version',
      (g) => ({ ...g, questionnaireVersionId: randomUUID() }),
      'unknown-version',
      'questionnaireVersionId',
    ],
    [
      'a draft version',
      (g) => ({ ...g, questionnaireVersionId: setup.draftVersionId }),
      'unknown-version',
      'questionnaireVersionId',
    ],
    [
      'another study’s version',
      (g) => ({ ...g, questionnaireVersionId: setup.otherStudyVersionId }),
      'unknown-version',
      'questionnaireVersionId',
    ],
    [
      'a price that is not on the ladder',
      (g) => ({
        ...g,
        answers: { ...g.answers, ladder: { steps: [{ priceMinor: 175, response: 'yes' }] } },
      }),
      'invalid-answers',
      'answers.ladder.steps.0.priceMinor',
    ],
    [
      'an answer to a block that does not exist',
      (g) => ({ ...g, answers: { ...g.answers, colour: { value: 'red' } } }),
      'invalid-answers',
      'answers.colour',
    ],
    [
      'a missing required answer',
      (g) => ({
        ...g,
        answers: { consent: { agreed: true }, ladder: g.answers['ladder'], psm: g.answers['psm'] },
      }),
      'invalid-answers',
      'answers.size',
    ],
    [
      'no consent recorded',
      (g) => ({ ...g, answers: { ladder: g.answers['ladder'], size: { people: 2 } } }),
      'no-consent',
      'answers.consent',
    ],
    [
      'a declined consent',
      (g) => ({ ...g, answers: { consent: { agreed: false } } }),
      'no-consent',
      'answers.consent',
    ],
    [
      'another enumerator’s route',
      (g) => ({ ...g, routeId: setup.otherRouteId, pointId: setup.otherPoint.id }),
      'not-assigned',
      'routeId',
    ],
    [
      'a point that is not on the route',
      (g) => ({ ...g, pointId: setup.otherPoint.id }),
      'not-assigned',
      'pointId',
    ],
    [
      'a forged enumerator in the body',
      (g) => ({ ...g, enumeratorId: setup.secondEnumerator.userId }),
      'invalid-interview',
      'interview',
    ],
    ['an id that is not a UUID', (g) => ({ ...g, id: 'interview-1' }), 'invalid-interview', 'id'],
    [
      // Looked up (as one array parameter) before the item is checked: the quotes, braces,
      // comma and backslash must reach PostgreSQL as text, not break the batch's query.
      'a respondent key that is not a hash',
      (g) => ({ ...g, respondentKey: 'Amina "A", {Lakeshore}\\ NULL' }),
      'invalid-interview',
      'respondentKey',
    ],
    [
      'an end before the start',
      (g) => ({ ...g, finishedAt: '2020-01-01T00:00:00Z' }),
      'invalid-interview',
      'finishedAt',
    ],
    [
      'a photo answer missing from the photo list',
      (g) => ({ ...g, answers: { ...g.answers, tags: { photoIds: [randomUUID()] } } }),
      'photo-manifest',
      'answers.tags.photoIds.0',
    ],
    [
      'a photo over 2 MiB',
      (g) => ({
        ...g,
        answers: { ...g.answers, tags: { photoIds: [g.id] } },
        photos: [
          { photoId: g.id, sha256: 'a'.repeat(64), byteSize: 3_000_000, contentType: 'image/jpeg' },
        ],
      }),
      'invalid-interview',
      'photos.0.byteSize',
    ],
  ];

  let batch: unknown[];
  let goodIds: string[];
  let results: SyncItemResult[];
  let before: number;

  beforeAll(async () => {
    before = await storedCount();
    const first = fieldInterview(setup);
    const last = fieldInterview(setup, { pointId: setup.points[1].id });
    goodIds = [first.id, last.id];
    batch = [first, ...cases.map(([, make]) => make(fieldInterview(setup))), last];
    results = await sync(setup.agents.enumerator, batch);
  });

  it('stores the good interviews, as the session’s enumerator', async () => {
    expect(results[0]).toMatchObject({
      index: 0,
      id: goodIds[0],
      outcome: 'accepted',
      status: 'received',
    });
    expect(results.at(-1)).toMatchObject({ id: goodIds[1], outcome: 'accepted' });
    const rows = await db.select().from(interviews).where(inArray(interviews.id, goodIds));
    expect(rows.map((r) => r.enumeratorId)).toEqual([
      setup.organisation.people.enumerator.userId,
      setup.organisation.people.enumerator.userId,
    ]);
    expect(await storedCount()).toBe(before + 2);
  });

  it.each(cases.map(([label, , code, path], i) => [label, code, path, i + 1] as const))(
    'refuses %s as %s naming %s, and stores nothing of it',
    async (_label, code, path, index) => {
      const result = rejected(results[index]);
      expect(result).toMatchObject({ index, outcome: 'rejected', code });
      expect(result.issues.map((issue) => issue.path)).toContain(path);
      expect(result.message.length).toBeGreaterThan(10);
      const id = (batch[index] as { id: unknown }).id;
      if (typeof id === 'string' && id.length === 36) {
        expect(await db.select().from(interviews).where(eq(interviews.id, id))).toHaveLength(0);
      }
    },
  );

  it('answers a replay of the whole batch with duplicates and the same refusals, storing nothing', async () => {
    const replay = await sync(setup.agents.enumerator, batch);
    expect(replay.map((r) => r.outcome)).toEqual(
      results.map((r) => (r.outcome === 'accepted' ? 'duplicate' : r.outcome)),
    );
    expect(replay[0]).toMatchObject({ outcome: 'duplicate', status: 'received' });
    expect(await storedCount()).toBe(before + 2);
  });
});

describe('ids that are already taken', () => {
  it('refuses other content under a stored id as id-conflict and keeps the stored one', async () => {
    const original = fieldInterview(setup);
    await sync(setup.agents.enumerator, [original]);
    const changed = { ...original, answers: { ...original.answers, size: { people: 9 } } };
    const [result] = await sync(setup.agents.enumerator, [changed]);
    expect(result).toMatchObject({ outcome: 'rejected', code: 'id-conflict' });
    const [row] = await db.select().from(interviews).where(eq(interviews.id, original.id));
    expect(row.answers).toMatchObject({ size: { people: 4 } });
  });

  it('refuses another enumerator reusing an id on their own route', async () => {
    const original = fieldInterview(setup);
    await sync(setup.agents.enumerator, [original]);
    const onTheirRoute = { ...original, routeId: setup.otherRouteId, pointId: setup.otherPoint.id };
    const [result] = await sync(setup.agents.second, [onTheirRoute]);
    expect(result).toMatchObject({ outcome: 'rejected', code: 'id-conflict' });
  });

  it('refuses an id repeated within one batch, keeping the first', async () => {
    const first = fieldInterview(setup);
    const results = await sync(setup.agents.enumerator, [first, { ...first }]);
    expect(results.map((r) => r.outcome)).toEqual(['accepted', 'rejected']);
    expect(results[1]).toMatchObject({ code: 'repeated-in-batch' });
  });

  it('refuses a photo id that another interview declared', async () => {
    const photoId = randomUUID();
    const photo = {
      photoId,
      sha256: 'b'.repeat(64),
      byteSize: 1000,
      contentType: 'image/jpeg' as const,
    };
    const owner = fieldInterview(setup);
    const thief = fieldInterview(setup);
    const results = await sync(setup.agents.enumerator, [
      { ...owner, answers: { ...owner.answers, tags: { photoIds: [photoId] } }, photos: [photo] },
      { ...thief, answers: { ...thief.answers, tags: { photoIds: [photoId] } }, photos: [photo] },
    ]);
    expect(results.map((r) => r.outcome)).toEqual(['accepted', 'rejected']);
    expect(rejected(results[1]).issues).toEqual([
      { path: 'photos.0.photoId', message: 'This photo id belongs to another interview' },
    ]);
    const rows = await db.select().from(interviewPhotos).where(eq(interviewPhotos.id, photoId));
    expect(rows.map((r) => r.interviewId)).toEqual([owner.id]);
  });
});

describe('storing exactly what was sent', () => {
  it('keeps text with backslashes, tabs, line breaks, quotes and emoji as it was typed', async () => {
    const awkward = 'C:\\stall\\7\tprice "150"\nsecond line\r\nthird \\N \\t 🪔 ünïcode';
    const interview = fieldInterview(setup);
    const sent = { ...interview, answers: { ...interview.answers, remarks: { value: awkward } } };
    const [result] = await sync(setup.agents.enumerator, [sent]);
    expect(result.outcome).toBe('accepted');
    const [row] = await db.select().from(interviews).where(eq(interviews.id, sent.id));
    expect(row.answers).toEqual(sent.answers);
    expect(row.respondentKey).toBe(sent.respondentKey);
    expect(row.startedAt.toISOString()).toBe(new Date(sent.startedAt).toISOString());
  });

  it('answers duplicates when another request stored the same batch first, mid-write', async () => {
    // Both requests check the batch before either has stored it; the study row held here keeps
    // the first one's write open until the second is waiting on the same ids, so the second
    // finds them taken only while writing and must fall back to judging them one by one.
    const batch = [fieldInterview(setup), fieldInterview(setup)];
    const lock = await db.$client.connect();
    let answers: SyncItemResult[][];
    try {
      await lock.query('begin');
      await lock.query('select 1 from studies where id = $1 for update', [setup.studyId]);
      const requests = [0, 1].map(() => sync(setup.agents.enumerator, batch));
      for (let waited = 0; ; waited += 20) {
        const writing = await db.$client.query(
          `select 1 from pg_stat_activity
           where wait_event_type = 'Lock' and query ilike 'copy interviews %'`,
        );
        if (writing.rowCount === 2) break;
        if (waited > 10_000) throw new Error('the two writes never met');
        await new Promise((r) => setTimeout(r, 20));
      }
      await lock.query('rollback');
      answers = await Promise.all(requests);
    } finally {
      await lock.query('rollback').catch(() => undefined);
      lock.release();
    }
    const outcomes = answers.map((results) => results.map((r) => r.outcome).join(',')).sort();
    expect(outcomes).toEqual(['accepted,accepted', 'duplicate,duplicate']);
    const stored = await db
      .select({ id: interviews.id })
      .from(interviews)
      .where(
        inArray(
          interviews.id,
          batch.map((i) => i.id),
        ),
      );
    expect(stored).toHaveLength(2);
  });
});

describe('the batch envelope', () => {
  it('refuses more than 200 interviews as a whole, naming the list', async () => {
    const response = await setup.agents.enumerator.post('/api/field/sync', {
      interviews: Array.from({ length: 201 }, () => ({})),
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('interviews');
  });

  it('takes a full batch of 200 interviews over 1 MB in one request', async () => {
    const before = await storedCount();
    const remarks = {
      value: 'The stall keeper compared three brands at length. '.repeat(79).trim(),
    };
    const photos = [fakeJpeg(64), fakeJpeg(64), fakeJpeg(64)];
    const batch = Array.from({ length: 200 }, () => {
      const { interview } = withPhotos(fieldInterview(setup), photos);
      return { ...interview, answers: { ...interview.answers, remarks } };
    });
    expect(JSON.stringify({ interviews: batch }).length).toBeGreaterThan(1_000_000);
    const results = await sync(setup.agents.enumerator, batch);
    expect(results.filter((r) => r.outcome === 'accepted')).toHaveLength(200);
    expect(await storedCount()).toBe(before + 200);
  });
});

describe('quality flags computed on acceptance', () => {
  const metresPerDegreeOfLatitude = (6_371_008.8 * Math.PI) / 180; // mean-sphere arc, geometry

  async function syncOne(interview: FieldInterview) {
    const [result] = await sync(setup.agents.enumerator, [interview]);
    const [row] = await db.select().from(interviews).where(eq(interviews.id, interview.id));
    return { result, row };
  }

  it('leaves an honest interview as received, with no flag', async () => {
    const { result, row } = await syncOne(fieldInterview(setup));
    expect(result).toMatchObject({ outcome: 'accepted', status: 'received' });
    expect(row.flags).toEqual([]);
  });

  it('flags an interview quicker than the least time per answered block', async () => {
    const finishedAt = new Date().toISOString();
    const startedAt = new Date(Date.now() - 12_000).toISOString(); // 4 answered blocks in 12 s
    const { result, row } = await syncOne(fieldInterview(setup, { startedAt, finishedAt }));
    expect(result).toMatchObject({ status: 'flagged' });
    expect(row.status).toBe('flagged');
    expect(row.flags).toEqual([
      expect.objectContaining({
        kind: 'too-short',
        answeredBlocks: 4,
        minSecondsPerBlock: qualityThresholds.minSecondsPerAnsweredBlock,
      }),
    ]);
  });

  it('flags a yes at every price of the ladder', async () => {
    const good = fieldInterview(setup);
    const steps = [100, 150, 200, 250, 300].map((priceMinor) => ({ priceMinor, response: 'yes' }));
    const { row } = await syncOne({ ...good, answers: { ...good.answers, ladder: { steps } } });
    expect(row.flags).toEqual([
      { kind: 'straight-lining', blockId: 'ladder', steps: 5, response: 'yes' },
    ]);
  });

  it('flags a fix 1 km from the point and stores the distance', async () => {
    const point = setup.points[0];
    const gps = {
      latitude: point.latitude + 1000 / metresPerDegreeOfLatitude,
      longitude: point.longitude,
      accuracyM: 15,
    };
    const { row } = await syncOne(fieldInterview(setup, { gps }));
    expect(row.flags).toEqual([
      { kind: 'gps-far', distanceM: 1000, accuracyM: 15, maxDistanceM: 250 },
    ]);
    expect([row.latitude, row.longitude, row.gpsAccuracyM]).toEqual([
      gps.latitude,
      gps.longitude,
      15,
    ]);
  });

  it('flags thresholds out of order', async () => {
    const good = fieldInterview(setup);
    const psm = { tooCheapMinor: 50, cheapMinor: 400, expensiveMinor: 220, tooExpensiveMinor: 320 };
    const { row } = await syncOne({ ...good, answers: { ...good.answers, psm } });
    expect(row.flags).toEqual([
      {
        kind: 'thresholds-out-of-order',
        blockId: 'psm',
        violations: [
          { lower: 'cheapMinor', higher: 'expensiveMinor' },
          { lower: 'cheapMinor', higher: 'tooExpensiveMinor' },
        ],
      },
    ]);
  });

  it('flags the same respondent twice in the study, in one batch and across batches', async () => {
    const key = respondentKey();
    const first = fieldInterview(setup, { respondentKey: key });
    const second = fieldInterview(setup, { respondentKey: key });
    const results = await sync(setup.agents.enumerator, [first, second]);
    expect(results.map((r) => r.outcome === 'accepted' && r.status)).toEqual([
      'received',
      'flagged',
    ]);
    const { row } = await syncOne(fieldInterview(setup, { respondentKey: key }));
    expect(row.flags).toEqual([
      {
        kind: 'duplicate-respondent',
        otherInterviewIds: expect.arrayContaining([first.id, second.id]),
      },
    ]);
  });
});

describe('progress after sync', () => {
  it('counts synced interviews per stop against the quota', async () => {
    const { studyId, points, routeId } = setup;
    const progressOf = async () =>
      (await setup.agents.supervisor.get(`/api/studies/${studyId}/progress`)).body as StudyProgress;
    const before = await progressOf();
    const stop = (progress: StudyProgress) =>
      progress.routes
        .find((r) => r.routeId === routeId)!
        .points.find((p) => p.pointId === points[1].id)!;
    await sync(setup.agents.enumerator, [
      fieldInterview(setup, { pointId: points[1].id }),
      fieldInterview(setup, {
        pointId: points[1].id,
        startedAt: new Date(Date.now() - 5000).toISOString(),
        finishedAt: new Date().toISOString(),
      }),
    ]);
    const after = await progressOf();
    expect(stop(after).completed).toBe(stop(before).completed + 2);
    expect(stop(after).flagged).toBe(stop(before).flagged + 1);
    expect(after.totals.completed).toBe(before.totals.completed + 2);
  });
});
