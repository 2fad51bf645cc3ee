import { randomBytes, randomUUID } from 'node:crypto';
import signature from 'cookie-signature';
import type { Database } from '../../server/db/database';
import {
  memberships,
  organisations,
  questionnaireVersions,
  questionnaires,
  routeStops,
  routes,
  samplingPoints,
  sessions,
  studies,
  studyMembers,
  users,
} from '../../server/db/schema';
import { sessionCookieName } from '../../server/http/session-middleware';
import { benchDefinition } from './sync-bench-interviews';

/** One simulated device: an enumerator's signed session and their route. */
export interface BenchDevice {
  cookie: string;
  csrfToken: string;
  routeId: string;
  points: { id: string; latitude: number; longitude: number }[];
}

export interface BenchStudy {
  organisationId: string;
  studyId: string;
  versionId: string;
  devices: BenchDevice[];
}

/** A member of the study in one role, with a signed session (as the sign-in callback makes). */
export async function insertBenchMember(
  db: Database,
  organisationId: string,
  studyId: string,
  secret: string,
  role: 'enumerator' | 'supervisor' = 'enumerator',
) {
  const [user] = await db
    .insert(users)
    .values({ email: `bench.${randomUUID()}@example.test`, name: `Bench ${role}` })
    .returning({ id: users.id });
  await db.insert(memberships).values({ organisationId, userId: user.id, roles: [role] });
  await db.insert(studyMembers).values({ studyId, userId: user.id, roles: [role] });
  const sid = randomUUID();
  const csrfToken = randomBytes(32).toString('base64url');
  const expire = new Date(Date.now() + 3 * 60 * 60 * 1000);
  const cookieData = {
    originalMaxAge: 10800000,
    expires: expire.toISOString(),
    httpOnly: true,
    path: '/',
  };
  await db.insert(sessions).values({
    sid,
    expire,
    sess: { cookie: cookieData, userId: user.id, organisationId, csrfToken },
  });
  const cookie = `${sessionCookieName}=${encodeURIComponent(`s:${signature.sign(sid, secret)}`)}`;
  return { userId: user.id, cookie, csrfToken };
}

async function insertRoute(db: Database, studyId: string, enumeratorId: string, index: number) {
  const points = await db
    .insert(samplingPoints)
    .values(
      [0, 1, 2].map((i) => ({
        studyId,
        code: `B${index}-${i}`,
        name: `Bench stall ${index}-${i}`,
        kind: 'shop',
        latitude: -0.1 - index * 0.01 - i * 0.001,
        longitude: 34.7 + i * 0.001,
        stratum: 'Bench',
      })),
    )
    .returning({
      id: samplingPoints.id,
      latitude: samplingPoints.latitude,
      longitude: samplingPoints.longitude,
    });
  const [route] = await db
    .insert(routes)
    .values({
      studyId,
      name: `Bench route ${index}`,
      enumeratorId,
      windowStart: '2027-01-01',
      windowEnd: '2027-12-31',
      assignedAt: new Date(),
    })
    .returning({ id: routes.id });
  await db.insert(routeStops).values(
    points.map((p, i) => ({
      routeId: route.id,
      studyId,
      pointId: p.id,
      position: i + 1,
      quota: 1000,
    })),
  );
  return { routeId: route.id, points };
}

/**
 * An invented organisation and study in the field, a published questionnaire version, and one
 * enumerator per device with a route of three stops and a signed session (written straight into
 * the tables, as the sign-in callback would).
 */
export async function createBenchStudy(
  db: Database,
  deviceCount: number,
  secret: string,
): Promise<BenchStudy> {
  const [organisation] = await db
    .insert(organisations)
    .values({ name: `Bench organisation ${randomUUID().slice(0, 8)}` })
    .returning({ id: organisations.id });
  const [study] = await db
    .insert(studies)
    .values({
      organisationId: organisation.id,
      name: 'Bench lamp study',
      productName: 'Solar lamp',
      currency: 'KES',
      locale: 'en-KE',
      market: 'An invented lakeside market',
      targetSample: 100000,
      priceMinMinor: 100,
      priceMaxMinor: 100000,
      status: 'in_field',
    })
    .returning({ id: studies.id });
  const [questionnaire] = await db
    .insert(questionnaires)
    .values({ studyId: study.id, title: 'Bench survey' })
    .returning({ id: questionnaires.id });
  const [version] = await db
    .insert(questionnaireVersions)
    .values({
      questionnaireId: questionnaire.id,
      version: 1,
      status: 'published',
      definition: benchDefinition(),
      publishedAt: new Date(),
    })
    .returning({ id: questionnaireVersions.id });
  const devices: BenchDevice[] = [];
  for (let index = 0; index < deviceCount; index += 1) {
    const person = await insertBenchMember(db, organisation.id, study.id, secret);
    const route = await insertRoute(db, study.id, person.userId, index);
    devices.push({ cookie: person.cookie, csrfToken: person.csrfToken, ...route });
  }
  return { organisationId: organisation.id, studyId: study.id, versionId: version.id, devices };
}
