import { sql } from 'drizzle-orm';
import {
  bulkAcceptResultSchema,
  pendingReviewCountSchema,
  reviewFacetsSchema,
  reviewQueueSchema,
  type ReviewQueue,
} from '@shared/field-sync/review-queue';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import { createFieldSetup, fieldInterview, type FieldSetup } from '../support/field-setup';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db } = testApp.deps;
let setup: FieldSetup;
const copies = 1_200;
const firstDay = Date.UTC(2026, 2, 1); // 1 March 2026; copy i finishes i hours later

const studyPath = () => `/api/studies/${setup.studyId}`;

async function queue(query: string): Promise<ReviewQueue> {
  const response = await setup.agents.supervisor.get(`${studyPath()}/review?${query}`);
  expect(response.status).toBe(200);
  return reviewQueueSchema.parse(response.body);
}

async function statusCounts(): Promise<Record<string, number>> {
  const result = await db.execute<{ status: string; n: number }>(
    sql`select status, count(*)::int as n from interviews where study_id = ${setup.studyId}
        group by status`,
  );
  return Object.fromEntries(result.rows.map((row) => [row.status, row.n]));
}

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Review at scale');
  const seed = fieldInterview(setup);
  const synced = await setup.agents.enumerator.post('/api/field/sync', { interviews: [seed] });
  expect((synced.body as SyncBatchResult).results[0].outcome).toBe('accepted');
  // Copies of the synced interview, made by the database as a large study's would arrive: every
  // tenth flagged, every third at the route's second point, one hour apart.
  await db.execute(sql`
    insert into interviews (id, study_id, questionnaire_version_id, route_id, point_id,
      enumerator_id, status, answers, flags, started_at, finished_at, received_at, photo_count)
    select gen_random_uuid(), study_id, questionnaire_version_id, route_id,
      case when i % 3 = 0 then ${setup.points[1].id}::uuid else point_id end,
      enumerator_id,
      (case when i % 10 = 0 then 'flagged' else 'received' end)::interview_status,
      answers,
      case when i % 10 = 0 then '[{"kind":"too-short","durationSeconds":40,"answeredBlocks":4,"secondsPerBlock":10,"minSecondsPerBlock":20}]'::jsonb
        else '[]'::jsonb end,
      to_timestamp(${firstDay / 1000} + i * 3600 - 480), to_timestamp(${firstDay / 1000} + i * 3600),
      now(), 0
    from interviews, generate_series(1, ${copies}) as i
    where id = ${seed.id}`);
});

afterAll(async () => {
  await db.$client.end();
});

describe('the review queue of a large study', () => {
  it('pages through every interview once, in a stable order', async () => {
    const seen = new Set<string>();
    let total = 0;
    for (let offset = 0; ; offset += 200) {
      const page = await queue(`sort=oldest&limit=200&offset=${offset}`);
      total = page.total;
      page.items.forEach((item) => seen.add(item.id));
      if (page.items.length < 200) break;
    }
    expect(total).toBe(copies + 1);
    expect(seen.size).toBe(copies + 1);
  });

  it('filters by point, flag kind and day, and says how many match in all', async () => {
    const atSecondPoint = await queue(`pointId=${setup.points[1].id}&limit=1`);
    expect(atSecondPoint.total).toBe(copies / 3);
    const tooShort = await queue('flag=too-short&limit=5');
    expect(tooShort.total).toBe(copies / 10);
    expect(tooShort.items.every((item) => item.status === 'flagged')).toBe(true);
    // 2 March 2026 holds copies 24..47 (finished 24 to 47 hours after midnight on 1 March).
    const secondDay = await queue('from=2026-03-02&to=2026-03-02&sort=oldest&limit=50');
    expect(secondDay.total).toBe(24);
    expect(secondDay.items[0].finishedAt).toBe('2026-03-02T00:00:00.000Z');
    expect(secondDay.items.at(-1)?.finishedAt).toBe('2026-03-02T23:00:00.000Z');
  });

  it('sorts newest first on request', async () => {
    const newest = await queue('sort=newest&limit=2');
    expect(newest.items[0].finishedAt > newest.items[1].finishedAt).toBe(true);
  });

  it('finds an interview by the reference the screens print, in any case', async () => {
    const [target] = (await queue('sort=oldest&offset=700&limit=1')).items;
    const found = await queue(
      `reference=${encodeURIComponent(`Interview ${target.id.slice(0, 8).toUpperCase()}`)}`,
    );
    expect(found.items.map((item) => item.id)).toContain(target.id);
    expect(found.total).toBeLessThan(3); // eight hex digits: a clash is a one-in-millions chance
  });

  it('refuses filters it cannot read, naming each', async () => {
    const cases: [string, string][] = [
      ['reference=xyz', 'reference'],
      ['from=2026-13-45', 'from'],
      ['from=2026-03-05&to=2026-03-01', 'to'],
      ['sort=loudest', 'sort'],
      ['pointId=nowhere', 'pointId'],
    ];
    for (const [query, field] of cases) {
      const response = await setup.agents.supervisor.get(`${studyPath()}/review?${query}`);
      expect(response.status).toBe(400);
      expect(response.body.error.issues[0].path).toBe(field);
    }
  });

  it('offers the study’s people, routes and points as filter choices', async () => {
    const response = await setup.agents.researcher.get(`${studyPath()}/review/facets`);
    expect(response.status).toBe(200);
    const facets = reviewFacetsSchema.parse(response.body);
    expect(facets.enumerators).toHaveLength(1);
    expect(facets.routes.map((route) => route.id)).toEqual([setup.routeId]);
    expect(facets.points.map((point) => point.id)).toEqual(
      expect.arrayContaining(setup.points.map((point) => point.id)),
    );
  });
});

describe('pending counts and accepting several at once', () => {
  it('counts what waits for a decision per study, for supervisors only', async () => {
    const response = await setup.agents.supervisor.get('/api/review/pending');
    expect(response.status).toBe(200);
    const counts = pendingReviewCountSchema.array().parse(response.body);
    expect(counts.find((count) => count.studyId === setup.studyId)).toEqual({
      studyId: setup.studyId,
      pending: copies + 1,
      flagged: copies / 10,
    });
    const fromEnumerator = await setup.agents.enumerator.get('/api/review/pending');
    expect(fromEnumerator.body).toEqual([]);
  });

  it('refuses the whole decision when one id is not the study’s, accepting nothing', async () => {
    const before = await statusCounts();
    const ids = (await queue('status=received&limit=3')).items.map((item) => item.id);
    const response = await setup.agents.supervisor.post(`${studyPath()}/review/accept`, {
      interviewIds: [...ids, setup.routeId],
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('interviewIds.3');
    expect(await statusCounts()).toEqual(before);
  });

  it('accepts a page of interviews in one decision, and again changes nothing', async () => {
    const ids = (await queue('status=received&limit=200')).items.map((item) => item.id);
    const first = await setup.agents.supervisor.post(`${studyPath()}/review/accept`, {
      interviewIds: ids,
    });
    expect(first.status).toBe(200);
    expect(bulkAcceptResultSchema.parse(first.body)).toEqual({ accepted: 200, alreadyAccepted: 0 });
    const again = await setup.agents.supervisor.post(`${studyPath()}/review/accept`, {
      interviewIds: ids,
    });
    expect(again.body).toEqual({ accepted: 0, alreadyAccepted: 200 });
    expect((await statusCounts())['accepted']).toBe(200);
  });

  it('lets only supervisors decide, and no more than 200 at once', async () => {
    const ids = (await queue('status=received&limit=1')).items.map((item) => item.id);
    const researcher = await setup.agents.researcher.post(`${studyPath()}/review/accept`, {
      interviewIds: ids,
    });
    expect(researcher.status).toBe(403);
    const tooMany = await setup.agents.supervisor.post(`${studyPath()}/review/accept`, {
      interviewIds: Array.from({ length: 201 }, () => crypto.randomUUID()),
    });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.issues[0].path).toBe('interviewIds');
  });
});
