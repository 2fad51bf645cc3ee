import { createHash, randomBytes, randomUUID } from 'node:crypto';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { Database } from '../../server/db/database';
import {
  questionnaireVersions,
  questionnaires,
  routeStops,
  routes,
  samplingPoints,
} from '../../server/db/schema';
import { signedInAgent, type SignedInAgent } from './signed-in-agent';
import { insertPerson, insertStudy } from './study-rows';
import type { createTestApp } from './test-app';
import {
  createTestOrganisation,
  type TestOrganisation,
  type TestPerson,
} from './test-organisation';

/** The questionnaire field tests run: consent, ladder, thresholds, location, photos, size, remarks. */
export function fieldDefinition(): { blocks: Block[] } {
  return {
    blocks: [
      starterBlock('consent', 'consent'),
      starterBlock('price-ladder', 'ladder'), // 100, 150, 200, 250, 300; yes/no
      starterBlock('price-thresholds', 'psm'),
      { ...starterBlock('location', 'where'), required: false } as Block,
      { ...starterBlock('photo', 'tags'), maxPhotos: 3 } as Block, // optional
      starterBlock('household-size', 'size'),
      { ...starterBlock('text', 'remarks'), maxLength: 4000 } as Block, // optional
    ],
  };
}

export interface FieldPoint {
  id: string;
  latitude: number;
  longitude: number;
}

/** A study in the field: one enumerator's route of two points, another's of one. */
export interface FieldSetup {
  organisation: TestOrganisation;
  studyId: string;
  otherStudyId: string;
  versionId: string;
  draftVersionId: string;
  otherStudyVersionId: string;
  routeId: string;
  otherRouteId: string;
  points: [FieldPoint, FieldPoint];
  otherPoint: FieldPoint;
  secondEnumerator: TestPerson;
  agents: {
    enumerator: SignedInAgent;
    second: SignedInAgent;
    supervisor: SignedInAgent;
    researcher: SignedInAgent;
    client: SignedInAgent;
  };
}

async function insertVersion(db: Database, studyId: string, status: 'draft' | 'published') {
  const [questionnaire] = await db
    .insert(questionnaires)
    .values({ studyId, title: `Field survey (${status})` })
    .returning({ id: questionnaires.id });
  const [version] = await db
    .insert(questionnaireVersions)
    .values({
      questionnaireId: questionnaire.id,
      version: 1,
      status,
      definition: fieldDefinition(),
      publishedAt: status === 'published' ? new Date() : null,
    })
    .returning({ id: questionnaireVersions.id });
  return version.id;
}

async function insertPoint(
  db: Database,
  studyId: string,
  code: string,
  latitude: number,
  longitude: number,
): Promise<FieldPoint> {
  const [point] = await db
    .insert(samplingPoints)
    .values({
      studyId,
      code,
      name: `Stall ${code}`,
      kind: 'shop',
      latitude,
      longitude,
      stratum: 'Lakeside',
    })
    .returning({ id: samplingPoints.id });
  return { id: point.id, latitude, longitude };
}

async function insertRoute(
  db: Database,
  studyId: string,
  enumeratorId: string,
  pointIds: string[],
) {
  const [route] = await db
    .insert(routes)
    .values({
      studyId,
      name: `Route ${randomUUID().slice(0, 4)}`,
      enumeratorId,
      windowStart: '2027-03-01',
      windowEnd: '2027-03-31',
      assignedAt: new Date(),
    })
    .returning({ id: routes.id });
  await db.insert(routeStops).values(
    pointIds.map((pointId, i) => ({
      routeId: route.id,
      studyId,
      pointId,
      position: i + 1,
      quota: 5,
    })),
  );
  return route.id;
}

/** Writes the whole setting straight into the tables (the APIs that make it have their own tests). */
export async function createFieldSetup(
  { app, deps }: ReturnType<typeof createTestApp>,
  label: string,
): Promise<FieldSetup> {
  const { db } = deps;
  const organisation = await createTestOrganisation(db, label);
  const { people } = organisation;
  const secondEnumerator = await insertPerson(db, organisation.id, 'enumerator', 'second');
  const studyId = await insertStudy(db, organisation.id, [
    { person: people.supervisor, roles: ['supervisor'] },
    { person: people.researcher, roles: ['researcher'] },
    { person: people.enumerator, roles: ['enumerator'] },
    { person: secondEnumerator, roles: ['enumerator'] },
    { person: people.client, roles: ['client'] },
  ]);
  const otherStudyId = await insertStudy(db, organisation.id, [
    { person: people.enumerator, roles: ['enumerator'] },
  ]);
  const points: [FieldPoint, FieldPoint] = [
    await insertPoint(db, studyId, 'LK-01', -0.1012, 34.7521),
    await insertPoint(db, studyId, 'LK-02', -0.1033, 34.7544),
  ];
  const otherPoint = await insertPoint(db, studyId, 'LK-03', -0.1101, 34.7602);
  const sign = (who: TestPerson) =>
    signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId: who.userId,
      organisationId: organisation.id,
    });
  return {
    organisation,
    studyId,
    otherStudyId,
    versionId: await insertVersion(db, studyId, 'published'),
    draftVersionId: await insertVersion(db, studyId, 'draft'),
    otherStudyVersionId: await insertVersion(db, otherStudyId, 'published'),
    routeId: await insertRoute(
      db,
      studyId,
      people.enumerator.userId,
      points.map((p) => p.id),
    ),
    otherRouteId: await insertRoute(db, studyId, secondEnumerator.userId, [otherPoint.id]),
    points,
    otherPoint,
    secondEnumerator,
    agents: {
      enumerator: await sign(people.enumerator),
      second: await sign(secondEnumerator),
      supervisor: await sign(people.supervisor),
      researcher: await sign(people.researcher),
      client: await sign(people.client),
    },
  };
}

/** A respondent key as a device would make it: a hash, never a name. */
export const respondentKey = () => randomBytes(16).toString('hex');

/**
 * An honest interview (consented, ordered answers, 8 minutes, GPS on the spot) at the route's
 * first point, or at the point `overrides.pointId` names.
 */
export function fieldInterview(
  setup: FieldSetup,
  overrides: Partial<FieldInterview> = {},
): FieldInterview {
  const pointId = overrides.pointId ?? setup.points[0].id;
  const point =
    [...setup.points, setup.otherPoint].find((p) => p.id === pointId) ?? setup.points[0];
  const finished = Date.now() - 60_000;
  return {
    id: randomUUID(),
    studyId: setup.studyId,
    questionnaireVersionId: setup.versionId,
    routeId: setup.routeId,
    pointId,
    startedAt: new Date(finished - 8 * 60_000).toISOString(),
    finishedAt: new Date(finished).toISOString(),
    answers: {
      consent: { agreed: true },
      ladder: {
        steps: [
          { priceMinor: 100, response: 'yes' },
          { priceMinor: 150, response: 'yes' },
          { priceMinor: 200, response: 'no' },
        ],
      },
      psm: { tooCheapMinor: 50, cheapMinor: 120, expensiveMinor: 220, tooExpensiveMinor: 320 },
      size: { people: 4 },
    },
    gps: { latitude: point.latitude, longitude: point.longitude, accuracyM: 9 },
    respondentKey: respondentKey(),
    photos: [],
    ...overrides,
  };
}

/** Bytes that are a JPEG by signature (SOI, APP0 "JFIF", EOI) around random content. */
export function fakeJpeg(size: number): Buffer {
  const head = Buffer.from('ffd8ffe000104a46494600010100000100010000', 'hex');
  const tail = Buffer.from('ffd9', 'hex');
  return Buffer.concat([head, randomBytes(Math.max(0, size - head.length - tail.length)), tail]);
}

export const sha256Hex = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/** The interview with these bytes as photos of its photo block, declared in its manifest. */
export function withPhotos(
  interview: FieldInterview,
  photos: Buffer[],
): { interview: FieldInterview; photoIds: string[] } {
  const photoIds = photos.map(() => randomUUID());
  return {
    photoIds,
    interview: {
      ...interview,
      answers: { ...interview.answers, tags: { photoIds } },
      photos: photos.map((bytes, i) => ({
        photoId: photoIds[i],
        sha256: sha256Hex(bytes),
        byteSize: bytes.length,
        contentType: 'image/jpeg',
      })),
    },
  };
}
