import { randomUUID } from 'node:crypto';
import { count, eq } from 'drizzle-orm';
import { roles, type Role } from '@shared/auth/role';
import type { InterviewStatus } from '@shared/interviews/interview-status';
import type { FieldRoute } from '@shared/routes/field-route';
import type { ProgressCounts, StudyProgress } from '@shared/routes/route-progress';
import type { SamplingPoint } from '@shared/sampling/sampling-point';
import { interviews, questionnaireVersions, questionnaires, routes } from '../../server/db/schema';
import { firstLink, sinkMessages, type SinkMessage } from '../support/mail-sink-client';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertPerson, insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';
import type { TestPerson } from '../support/test-organisation';

const { app, deps } = createTestApp();
let organisation: TestOrganisation;
let studyId: string;
let otherStudyId: string;
let secondEnumerator: TestPerson;
const agents = {} as Record<Role, SignedInAgent>;
let secondEnumeratorAgent: SignedInAgent;
let points: Record<string, SamplingPoint>;
let foreignPoint: SamplingPoint;

const pointsCsv = [
  'point_code,point_name,point_kind,latitude,longitude,stratum',
  'RV-01,River shop,shop,-0.11,34.70,Riverside',
  'RV-02,River stall,market_stall,-0.12,34.71,Riverside',
  'RV-03,River home,household,-0.13,34.72,Riverside',
].join('\n');

const routesPath = () => `/api/studies/${studyId}/routes`;
const routePath = (id: string) => `${routesPath()}/${id}`;
const window = { windowStart: '2027-04-05', windowEnd: '2027-04-09' };

async function importPoints(agent: SignedInAgent, study: string): Promise<SamplingPoint[]> {
  const response = await agent
    .post(`/api/studies/${study}/sampling-points/import`)
    .set('Content-Type', 'text/csv')
    .send(pointsCsv);
  expect(response.status).toBe(200);
  return response.body.points as SamplingPoint[];
}

async function routeCount(): Promise<number> {
  const [row] = await deps.db
    .select({ n: count() })
    .from(routes)
    .where(eq(routes.studyId, studyId));
  return row.n;
}

/** Waits for a message to `address` whose subject contains `subject` (delivery is asynchronous). */
async function mailTo(address: string, subject: string): Promise<SinkMessage> {
  for (let attempt = 0; attempt < 50; attempt += 1) {
    const found = (await sinkMessages()).find(
      (m) => m.to.includes(address) && m.subject.includes(subject),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No message "${subject}" reached ${address}`);
}

beforeAll(async () => {
  organisation = await createTestOrganisation(deps.db, 'Field routes');
  const { people } = organisation;
  secondEnumerator = await insertPerson(deps.db, organisation.id, 'enumerator', 'second');
  studyId = await insertStudy(deps.db, organisation.id, [
    { person: people.supervisor, roles: ['supervisor'] },
    { person: people.researcher, roles: ['researcher'] },
    { person: people.enumerator, roles: ['enumerator'] },
    { person: secondEnumerator, roles: ['enumerator'] },
    { person: people.client, roles: ['client'] },
  ]);
  otherStudyId = await insertStudy(deps.db, organisation.id, [
    { person: people.supervisor, roles: ['supervisor'] },
  ]);
  const sign = (who: { userId: string }) =>
    signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
      userId: who.userId,
      organisationId: organisation.id,
    });
  for (const role of roles) agents[role] = await sign(people[role]);
  secondEnumeratorAgent = await sign(secondEnumerator);
  const imported = await importPoints(agents.supervisor, studyId);
  points = Object.fromEntries(imported.map((p) => [p.code, p]));
  [foreignPoint] = await importPoints(agents.supervisor, otherStudyId);
});

afterAll(async () => {
  await deps.db.$client.end();
});

const harbourLoop = () => ({
  name: 'Riverside morning',
  ...window,
  stops: [
    { pointId: points['RV-02'].id, quota: 3 },
    { pointId: points['RV-01'].id, quota: 2 },
  ],
});

describe('building routes', () => {
  it('creates a route with its stops in the given order', async () => {
    const response = await agents.supervisor.post(routesPath(), harbourLoop());
    expect(response.status).toBe(201);
    const route = response.body as FieldRoute;
    expect(route).toMatchObject({ name: 'Riverside morning', ...window, enumerator: null });
    expect(route.stops.map((s) => [s.position, s.code, s.quota])).toEqual([
      [1, 'RV-02', 3],
      [2, 'RV-01', 2],
    ]);
  });

  it('refuses a point from another study, naming the stop, and stores nothing', async () => {
    const before = await routeCount();
    const body = harbourLoop();
    body.stops.push({ pointId: foreignPoint.id, quota: 1 });
    const response = await agents.supervisor.post(routesPath(), body);
    expect(response.status).toBe(400);
    expect(response.body.error.issues).toEqual([
      { path: 'stops.2.pointId', message: 'This point is not a sampling point of this study.' },
    ]);
    expect(await routeCount()).toBe(before);
  });

  it('refuses a quota of zero and stores nothing', async () => {
    const before = await routeCount();
    const body = harbourLoop();
    body.stops[1].quota = 0;
    const response = await agents.supervisor.post(routesPath(), body);
    expect(response.status).toBe(400);
    expect(response.body.error.issues).toEqual([
      { path: 'stops.1.quota', message: 'The quota must be at least 1 interview.' },
    ]);
    expect(await routeCount()).toBe(before);
  });

  it('refuses a window that ends before it starts', async () => {
    const body = { ...harbourLoop(), windowEnd: '2027-04-01' };
    const response = await agents.supervisor.post(routesPath(), body);
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('windowEnd');
  });

  it('replaces a route’s stops and reorders them', async () => {
    const created = (await agents.supervisor.post(routesPath(), harbourLoop())).body as FieldRoute;
    const stops = [
      { pointId: points['RV-01'].id, quota: 1 },
      { pointId: points['RV-03'].id, quota: 4 },
      { pointId: points['RV-02'].id, quota: 2 },
    ];
    const response = await agents.supervisor.put(routePath(created.id), {
      ...harbourLoop(),
      name: 'Riverside afternoon',
      stops,
    });
    expect(response.status).toBe(200);
    expect(response.body.name).toBe('Riverside afternoon');
    expect(response.body.stops.map((s: { code: string }) => s.code)).toEqual([
      'RV-01',
      'RV-03',
      'RV-02',
    ]);
    expect((await agents.supervisor.delete(routePath(created.id))).status).toBe(204);
    expect((await agents.supervisor.get(routePath(created.id))).status).toBe(404);
  });

  it('answers 404 for a route of another study', async () => {
    const other = await agents.supervisor.post(`/api/studies/${otherStudyId}/routes`, {
      name: 'Elsewhere',
      ...window,
      stops: [{ pointId: foreignPoint.id, quota: 1 }],
    });
    expect(other.status).toBe(201);
    expect((await agents.supervisor.get(routePath((other.body as FieldRoute).id))).status).toBe(
      404,
    );
  });
});

describe('who may read and write routes', () => {
  it.each([
    ['supervisor', 200],
    ['researcher', 200],
    ['enumerator', 200],
    ['client', 403],
    ['admin', 403],
  ] as const)('answers a %s listing the routes with %i', async (role, status) => {
    expect((await agents[role].get(routesPath())).status).toBe(status);
  });

  it.each(['researcher', 'enumerator', 'client'] as const)(
    'refuses a route created by a %s',
    async (role) => {
      const before = await routeCount();
      expect((await agents[role].post(routesPath(), harbourLoop())).status).toBe(403);
      expect(await routeCount()).toBe(before);
    },
  );

  it('lists only the study’s enumerators for the assignment menu', async () => {
    const response = await agents.supervisor.get(`/api/studies/${studyId}/enumerators`);
    expect(response.status).toBe(200);
    const ids = response.body.map((e: { userId: string }) => e.userId).sort();
    expect(ids).toEqual([organisation.people.enumerator.userId, secondEnumerator.userId].sort());
  });
});

describe('assigning a route', () => {
  let route: FieldRoute;

  beforeAll(async () => {
    route = (await agents.supervisor.post(routesPath(), { ...harbourLoop(), name: 'Jetty round' }))
      .body as FieldRoute;
  });

  it('keeps an unassigned route hidden from enumerators', async () => {
    const listed = await agents.enumerator.get(routesPath());
    expect(listed.body).toEqual([]);
    expect((await agents.enumerator.get(routePath(route.id))).status).toBe(404);
  });

  it('refuses someone who is not an enumerator of the study, changing nothing', async () => {
    const response = await agents.supervisor.put(`${routePath(route.id)}/assignment`, {
      enumeratorId: organisation.people.researcher.userId,
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues).toEqual([
      { path: 'enumeratorId', message: 'This person is not an enumerator of this study.' },
    ]);
    expect((await agents.supervisor.get(routePath(route.id))).body.enumerator).toBeNull();
  });

  it('refuses an assignment by a researcher', async () => {
    const response = await agents.researcher.put(`${routePath(route.id)}/assignment`, {
      enumeratorId: organisation.people.enumerator.userId,
    });
    expect(response.status).toBe(403);
  });

  it('e-mails the enumerator the route, its window, its stops and a link to it', async () => {
    const enumerator = organisation.people.enumerator;
    const response = await agents.supervisor.put(`${routePath(route.id)}/assignment`, {
      enumeratorId: enumerator.userId,
    });
    expect(response.status).toBe(200);
    expect(response.body.enumerator).toEqual({
      userId: enumerator.userId,
      name: enumerator.name,
      email: enumerator.email,
    });
    const mail = await mailTo(enumerator.email, 'Route "Jetty round" is assigned to you');
    expect(mail.text).toContain('Dates: 2027-04-05 to 2027-04-09');
    expect(mail.text).toContain('1. RV-02 · River stall (Market stall, Riverside) — 3 interviews');
    expect(mail.text).toContain('2. RV-01 · River shop (Shop, Riverside) — 2 interviews');
    expect(firstLink(mail)).toBe(`${deps.config.APP_URL}/field/routes/${route.id}`);
    const seen = await agents.enumerator.get(routesPath());
    expect(seen.body.map((r: FieldRoute) => r.id)).toEqual([route.id]);
  });

  it('reassigns the route and tells both enumerators', async () => {
    const response = await agents.supervisor.put(`${routePath(route.id)}/assignment`, {
      enumeratorId: secondEnumerator.userId,
    });
    expect(response.status).toBe(200);
    const mail = await mailTo(secondEnumerator.email, 'Route "Jetty round" is assigned to you');
    expect(firstLink(mail)).toBe(`${deps.config.APP_URL}/field/routes/${route.id}`);
    await mailTo(organisation.people.enumerator.email, 'is no longer assigned to you');
    expect((await agents.enumerator.get(routesPath())).body).toEqual([]);
    expect((await secondEnumeratorAgent.get(routePath(route.id))).status).toBe(200);
  });

  it('assigns a new route in the same request that creates it', async () => {
    const response = await agents.supervisor.post(routesPath(), {
      ...harbourLoop(),
      name: 'Dawn round',
      enumeratorId: secondEnumerator.userId,
    });
    expect(response.status).toBe(201);
    expect(response.body.assignedAt).not.toBeNull();
    await mailTo(secondEnumerator.email, 'Route "Dawn round" is assigned to you');
  });
});

describe('progress against quota', () => {
  let route: FieldRoute;
  let versionId: string;

  async function recordInterviews(
    pointId: string,
    statuses: InterviewStatus[],
    routeId = route.id,
  ) {
    const now = new Date();
    await deps.db.insert(interviews).values(
      statuses.map((status) => ({
        id: randomUUID(),
        studyId,
        questionnaireVersionId: versionId,
        routeId,
        pointId,
        enumeratorId: organisation.people.enumerator.userId,
        status,
        answers: {},
        startedAt: now,
        finishedAt: now,
      })),
    );
  }

  beforeAll(async () => {
    const [questionnaire] = await deps.db
      .insert(questionnaires)
      .values({ studyId, title: 'Lamp survey' })
      .returning({ id: questionnaires.id });
    const [version] = await deps.db
      .insert(questionnaireVersions)
      .values({ questionnaireId: questionnaire.id, version: 1, definition: {} })
      .returning({ id: questionnaireVersions.id });
    versionId = version.id;
    route = (
      await agents.supervisor.post(routesPath(), {
        ...harbourLoop(),
        name: 'Counted round',
        enumeratorId: organisation.people.enumerator.userId,
      })
    ).body as FieldRoute;
    // RV-02 (quota 3): 2 accepted, 1 flagged, 1 received count; returned and rejected do not.
    await recordInterviews(points['RV-02'].id, [
      'accepted',
      'accepted',
      'flagged',
      'received',
      'returned',
      'rejected',
    ]);
    // RV-01 (quota 2): one accepted.
    await recordInterviews(points['RV-01'].id, ['accepted']);
    // RV-03 is not a stop of this route: its interview counts nowhere.
    await recordInterviews(points['RV-03'].id, ['accepted']);
  });

  it('counts completed, accepted and flagged interviews per stop and per route', async () => {
    const response = await agents.researcher.get(`/api/studies/${studyId}/progress`);
    expect(response.status).toBe(200);
    const counted = response.body.routes.find((r: { routeId: string }) => r.routeId === route.id);
    // Expected counts worked out by hand from the rows inserted above.
    expect(counted).toMatchObject({
      name: 'Counted round',
      enumeratorName: organisation.people.enumerator.name,
      quota: 5,
      completed: 5,
      accepted: 3,
      flagged: 1,
    });
    expect(counted.points).toEqual([
      {
        pointId: points['RV-02'].id,
        position: 1,
        code: 'RV-02',
        name: 'River stall',
        quota: 3,
        completed: 4,
        accepted: 2,
        flagged: 1,
      },
      {
        pointId: points['RV-01'].id,
        position: 2,
        code: 'RV-01',
        name: 'River shop',
        quota: 2,
        completed: 1,
        accepted: 1,
        flagged: 0,
      },
    ]);
  });

  it('sums every visible route into the study totals', async () => {
    const body = (await agents.supervisor.get(`/api/studies/${studyId}/progress`))
      .body as StudyProgress;
    const sum = (key: keyof ProgressCounts) => body.routes.reduce((total, r) => total + r[key], 0);
    expect(body.totals).toEqual({
      quota: sum('quota'),
      completed: sum('completed'),
      accepted: sum('accepted'),
      flagged: sum('flagged'),
    });
    expect(body.totals.completed).toBe(5);
  });

  it('shows an enumerator only the progress of their own routes', async () => {
    const { body } = await agents.enumerator.get(`/api/studies/${studyId}/progress`);
    expect(body.routes.map((r: { routeId: string }) => r.routeId)).toEqual([route.id]);
    expect(body.totals).toEqual({ quota: 5, completed: 5, accepted: 3, flagged: 1 });
  });

  it('refuses progress to a client', async () => {
    expect((await agents.client.get(`/api/studies/${studyId}/progress`)).status).toBe(403);
  });

  it('refuses to delete a route that has interviews', async () => {
    const response = await agents.supervisor.delete(routePath(route.id));
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('route-has-interviews');
  });
});
