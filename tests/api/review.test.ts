import { eq } from 'drizzle-orm';
import request from 'supertest';
import { fieldNoticesSchema, type FieldNotices } from '@shared/field-sync/field-notice';
import { interviewDetailSchema } from '@shared/field-sync/interview-detail';
import { reviewQueueSchema, type ReviewQueue } from '@shared/field-sync/review-queue';
import type { SyncBatchResult, SyncItemResult } from '@shared/field-sync/sync-batch';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { StudyProgress } from '@shared/routes/route-progress';
import { interviews } from '../../server/db/schema';
import {
  createFieldSetup,
  fakeJpeg,
  fieldInterview,
  sha256Hex,
  withPhotos,
  type FieldSetup,
} from '../support/field-setup';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db } = testApp.deps;
let setup: FieldSetup;
let honest: FieldInterview;
let far: FieldInterview;
let quick: FieldInterview;
const photo = fakeJpeg(20_000);
const metresPerDegreeOfLatitude = (6_371_008.8 * Math.PI) / 180; // mean-sphere arc, geometry

const studyPath = () => `/api/studies/${setup.studyId}`;
const interviewPath = (id: string) => `${studyPath()}/interviews/${id}`;

async function sync(
  items: FieldInterview[],
  agent = setup.agents.enumerator,
): Promise<SyncItemResult[]> {
  const response = await agent.post('/api/field/sync', { interviews: items });
  expect(response.status).toBe(200);
  return (response.body as SyncBatchResult).results;
}

async function queue(query = ''): Promise<ReviewQueue> {
  const response = await setup.agents.supervisor.get(`${studyPath()}/review${query}`);
  expect(response.status).toBe(200);
  return reviewQueueSchema.parse(response.body); // the shared contract holds
}

async function notices(agent = setup.agents.enumerator): Promise<FieldNotices> {
  const response = await agent.get('/api/field/notices');
  expect(response.status).toBe(200);
  return fieldNoticesSchema.parse(response.body);
}

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Review');
  const point = setup.points[0];
  honest = fieldInterview(setup);
  const withPhoto = withPhotos(
    fieldInterview(setup, {
      gps: {
        latitude: point.latitude + 600 / metresPerDegreeOfLatitude,
        longitude: point.longitude,
        accuracyM: 20,
      },
    }),
    [photo],
  );
  far = withPhoto.interview;
  quick = fieldInterview(setup, {
    startedAt: new Date(Date.now() - 8000).toISOString(),
    finishedAt: new Date().toISOString(),
  });
  const results = await sync([honest, far, quick]);
  expect(results.map((r) => r.outcome)).toEqual(['accepted', 'accepted', 'accepted']);
  const upload = await setup.agents.enumerator
    .put(`/api/field/photos/${withPhoto.photoIds[0]}?offset=0`)
    .set('Content-Type', 'application/octet-stream')
    .send(photo);
  expect(upload.body).toMatchObject({ stored: true });
});

afterAll(async () => {
  await db.$client.end();
});

describe('the review queue', () => {
  it('lists flagged interviews first, then received ones', async () => {
    const { items, total } = await queue();
    expect(total).toBe(3);
    expect(items.map((i) => i.status)).toEqual(['flagged', 'flagged', 'received']);
    expect(items[2].id).toBe(honest.id);
    expect(items.find((i) => i.id === far.id)).toMatchObject({
      photoCount: 1,
      photosStored: 1,
      point: { id: setup.points[0].id },
    });
  });

  it('filters by flag and by status', async () => {
    expect((await queue('?flag=gps-far')).items.map((i) => i.id)).toEqual([far.id]);
    expect((await queue('?flag=too-short')).items.map((i) => i.id)).toEqual([quick.id]);
    expect((await queue('?status=received')).items.map((i) => i.id)).toEqual([honest.id]);
  });

  it('refuses an unknown filter value, naming it', async () => {
    const response = await setup.agents.supervisor.get(`${studyPath()}/review?flag=sleepy`);
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('flag');
  });

  it('lets a researcher read it, but not an enumerator or a client', async () => {
    expect((await setup.agents.researcher.get(`${studyPath()}/review`)).status).toBe(200);
    expect((await setup.agents.enumerator.get(`${studyPath()}/review`)).status).toBe(403);
    expect((await setup.agents.client.get(`${studyPath()}/review`)).status).toBe(403);
  });
});

describe('one interview', () => {
  it('shows answers, the GPS flag with its distance, both positions and a working photo link', async () => {
    const response = await setup.agents.supervisor.get(interviewPath(far.id));
    expect(response.status).toBe(200);
    const detail = interviewDetailSchema.parse(response.body); // the shared contract holds
    expect(detail.answers).toEqual(far.answers);
    expect(detail.flags).toEqual([
      { kind: 'gps-far', distanceM: 600, accuracyM: 20, maxDistanceM: 250 },
    ]);
    expect(detail.gps).toEqual(far.gps);
    expect(detail.pointPosition).toEqual({
      latitude: setup.points[0].latitude,
      longitude: setup.points[0].longitude,
    });
    expect(detail.definition.blocks[0].kind).toBe('consent');
    expect(detail.photos).toHaveLength(1);
    const link = detail.photos[0];
    expect(link).toMatchObject({ stored: true, sha256: sha256Hex(photo) });
    // Served by the API behind the session, as the image type checked at upload, never sniffed.
    expect(link.url).toBe(`${interviewPath(far.id)}/photos/${link.photoId}`);
    const fetched = await setup.agents.supervisor
      .get(link.url!)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(fetched.status).toBe(200);
    expect(fetched.headers['content-type']).toBe('image/jpeg');
    expect(fetched.headers['x-content-type-options']).toBe('nosniff');
    expect(fetched.headers['cache-control']).toMatch(/no-store/);
    expect(sha256Hex(fetched.body as Buffer)).toBe(sha256Hex(photo));
    // Not to a signed-out caller, nor a researcher of another study, nor an unknown photo.
    expect((await request(testApp.app).get(link.url!)).status).toBe(401);
    const unknown = `${interviewPath(far.id)}/photos/${far.id}`;
    expect((await setup.agents.supervisor.get(unknown)).status).toBe(404);
  });

  it('answers 404 for an interview of another study', async () => {
    const other = `/api/studies/${setup.otherStudyId}/interviews/${far.id}`;
    const response = await setup.agents.supervisor.get(other);
    expect(response.status).toBe(404); // the supervisor is not even a member there
    expect((await setup.agents.supervisor.get(interviewPath(setup.routeId))).status).toBe(404);
  });
});

describe('review actions and the device’s notices', () => {
  it('needs a note to return or reject, and changes nothing without one', async () => {
    const response = await setup.agents.supervisor.post(`${interviewPath(quick.id)}/review`, {
      action: 'return',
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues).toEqual([
      { path: 'note', message: 'Write a note for the enumerator: say why you return it' },
    ]);
    const [row] = await db.select().from(interviews).where(eq(interviews.id, quick.id));
    expect(row.status).toBe('flagged');
  });

  it('does not let a researcher decide', async () => {
    const response = await setup.agents.researcher.post(`${interviewPath(quick.id)}/review`, {
      action: 'accept',
    });
    expect(response.status).toBe(403);
  });

  it('returns an interview to the enumerator’s device with the note', async () => {
    const note =
      'Eight seconds is too short: please go through the ladder again with the respondent.';
    const response = await setup.agents.supervisor.post(`${interviewPath(quick.id)}/review`, {
      action: 'return',
      note,
    });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ status: 'returned', reviewNote: note });
    const { notices: list } = await notices();
    expect(list).toHaveLength(1);
    expect(list[0]).toMatchObject({
      interviewId: quick.id,
      status: 'returned',
      note,
      answers: quick.answers,
      respondentKey: quick.respondentKey,
    });
    expect((await notices(setup.agents.second)).notices).toEqual([]);
  });

  it('takes the enumerator’s corrected resubmission under the same id, once', async () => {
    const corrected = { ...quick, startedAt: new Date(Date.now() - 6 * 60_000).toISOString() };
    const [result] = await sync([corrected]);
    expect(result).toMatchObject({ outcome: 'accepted', status: 'received', resubmitted: true });
    const [row] = await db.select().from(interviews).where(eq(interviews.id, quick.id));
    expect([row.status, row.flags]).toEqual(['received', []]);
    expect((await notices()).notices).toEqual([]);
    const [replay] = await sync([corrected]);
    expect(replay).toMatchObject({ outcome: 'duplicate', status: 'received' });
  });

  it('takes an unchanged resubmission only when it names the return it answers', async () => {
    await setup.agents.supervisor.post(`${interviewPath(honest.id)}/review`, {
      action: 'return',
      note: 'Please confirm the household size.',
    });
    const [notice] = (await notices()).notices;
    const [unchanged] = await sync([honest]);
    expect(unchanged).toMatchObject({ outcome: 'duplicate', status: 'returned' });
    const [confirmed] = await sync([{ ...honest, returnedAt: notice.reviewedAt }]);
    expect(confirmed).toMatchObject({ outcome: 'accepted', resubmitted: true });
  });

  it('rejects an interview: the device is told, and a resubmission is refused', async () => {
    const note = 'Recorded 600 m from the stall; this was not the sampled point.';
    const response = await setup.agents.supervisor.post(`${interviewPath(far.id)}/review`, {
      action: 'reject',
      note,
    });
    expect(response.body).toMatchObject({ status: 'rejected' });
    const { notices: list } = await notices();
    expect(list.map((n) => [n.interviewId, n.status, n.note])).toEqual([
      [far.id, 'rejected', note],
    ]);
    const changed = { ...far, answers: { ...far.answers, size: { people: 5 } } };
    const [result] = await sync([changed]);
    expect(result).toMatchObject({ outcome: 'rejected', code: 'id-conflict' });
  });

  it('accepts an interview, and progress counts it as accepted', async () => {
    const response = await setup.agents.supervisor.post(`${interviewPath(quick.id)}/review`, {
      action: 'accept',
    });
    expect(response.body).toMatchObject({ status: 'accepted', reviewNote: null });
    const progress = (await setup.agents.supervisor.get(`${studyPath()}/progress`))
      .body as StudyProgress;
    // honest (received) + quick (accepted) count as completed; far is rejected.
    expect(progress.totals).toMatchObject({ completed: 2, accepted: 1, flagged: 0 });
  });
});
