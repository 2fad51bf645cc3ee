import { randomUUID } from 'node:crypto';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { Database } from '../../server/db/database';
import { interviewPhotos, interviews, routes, samplingPoints } from '../../server/db/schema';
import { insertPublishedVersion } from './analysis-study';
import { insertStudy } from './study-rows';
import type { TestOrganisation } from './test-organisation';

/** Blocks whose answers spread over several columns, a photo and free text (invented). */
export const rawDataBlocks: Block[] = [
  starterBlock('consent', 'consent'),
  starterBlock('price-ladder', 'ladder'), // 1, 1.5, 2, 2.5, 3 KES; yes/no
  starterBlock('multiple-choice', 'uses'), // first, second, third
  starterBlock('income-band', 'income'), // low, middle, high
  starterBlock('household-size', 'size'),
  starterBlock('shelf-observation', 'shelf'), // photo optional
  starterBlock('text', 'remarks'),
];

export interface RawDataStudy {
  studyId: string;
  versionId: string;
  routeId: string;
  north: string;
  south: string;
  /** Interview ids by the letter the tests call them. */
  ids: Record<'a' | 'b' | 'c' | 'd' | 'e', string>;
  photoId: string;
  photoKey: string;
}

const ladder = (answers: ('yes' | 'no')[]) => ({
  steps: answers.map((response, i) => ({ priceMinor: 100 + 50 * i, response })),
});

/**
 * A study of five interviews in the organisation, written straight into the tables: a researcher,
 * supervisor, client and enumerator as its members; points in the North and the South.
 */
export async function insertRawDataStudy(
  db: Database,
  organisation: TestOrganisation,
): Promise<RawDataStudy> {
  const { people } = organisation;
  const studyId = await insertStudy(db, organisation.id, [
    { person: people.researcher, roles: ['researcher'] },
    { person: people.supervisor, roles: ['supervisor'] },
    { person: people.client, roles: ['client'] },
    { person: people.enumerator, roles: ['enumerator'] },
  ]);
  const versionId = await insertPublishedVersion(db, studyId, 'Household', rawDataBlocks);
  const [north, south] = await db
    .insert(samplingPoints)
    .values(
      (['North', 'South'] as const).map((stratum, i) => ({
        studyId,
        code: `P${i + 1}`,
        name: `Kiosk ${stratum}`,
        kind: 'shop',
        latitude: -1 - i,
        longitude: 36 + i,
        stratum,
      })),
    )
    .returning({ id: samplingPoints.id });
  const [route] = await db
    .insert(routes)
    .values({
      studyId,
      name: 'Lake road',
      enumeratorId: people.enumerator.userId,
      windowStart: '2027-03-01',
      windowEnd: '2027-03-31',
    })
    .returning({ id: routes.id });
  const ids = {
    a: randomUUID(),
    b: randomUUID(),
    c: randomUUID(),
    d: randomUUID(),
    e: randomUUID(),
  };
  const photoId = randomUUID();
  const base = {
    studyId,
    questionnaireVersionId: versionId,
    routeId: route.id,
    enumeratorId: people.enumerator.userId,
  };
  const at = (day: number, minutes = 0) =>
    new Date(Date.UTC(2027, 2, day, 9, minutes)).toISOString();
  const times = (day: number) => ({
    startedAt: new Date(at(day)),
    finishedAt: new Date(at(day, 12)),
  });
  await db.insert(interviews).values([
    {
      ...base,
      ...times(1),
      id: ids.a,
      pointId: north.id,
      status: 'accepted',
      latitude: -1.0001,
      longitude: 36.0002,
      gpsAccuracyM: 8,
      photoCount: 1,
      answers: {
        consent: { agreed: true },
        ladder: ladder(['yes', 'yes', 'no']),
        uses: { values: ['first', 'third'] },
        income: { band: 'low' },
        size: { people: 4 },
        shelf: { priceMinor: 250, packSize: 1, quantity: 12, photoId },
        remarks: { value: '=HYPERLINK("http://example.test","open")' },
      },
    },
    {
      ...base,
      ...times(5),
      id: ids.b,
      pointId: south.id,
      status: 'flagged',
      reviewNote: '+1 call back',
      flags: [
        {
          kind: 'too-short',
          durationSeconds: 60,
          answeredBlocks: 6,
          secondsPerBlock: 10,
          minSecondsPerBlock: 20,
        },
      ],
      answers: {
        consent: { agreed: true },
        uses: { values: ['second'] },
        income: { band: null },
        size: { people: 2 },
        remarks: { value: '@SUM(1)' },
      },
    },
    {
      ...base,
      ...times(10),
      id: ids.c,
      pointId: south.id,
      status: 'accepted',
      answers: {
        consent: { agreed: true },
        income: { band: 'high' },
        size: { people: 7 },
        remarks: { value: '-2+3' },
      },
    },
    {
      ...base,
      ...times(12),
      id: ids.d,
      pointId: north.id,
      status: 'rejected',
      reviewNote: 'Not a household',
      answers: { consent: { agreed: false } },
    },
    {
      ...base,
      ...times(15),
      id: ids.e,
      pointId: south.id,
      status: 'accepted',
      answers: { consent: { agreed: true }, income: { band: 'low' }, size: { people: 3 } },
    },
  ]);
  const photoKey = `studies/${studyId}/photos/${photoId}.jpg`;
  await db.insert(interviewPhotos).values({
    id: photoId,
    interviewId: ids.a,
    sha256: 'a'.repeat(64),
    byteSize: 1000,
    contentType: 'image/jpeg',
    receivedBytes: 1000,
    objectKey: photoKey,
    storedAt: new Date(),
  });
  return {
    studyId,
    versionId,
    routeId: route.id,
    north: north.id,
    south: south.id,
    ids,
    photoId,
    photoKey,
  };
}
