import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Block } from '@shared/questionnaire/block';
import { validateQuestionnaire } from '@shared/questionnaire/validate-questionnaire';
import type { Database } from '../../../server/db/database';
import {
  memberships,
  questionnaireVersions,
  questionnaires,
  routeStops,
  routes,
  samplingPoints,
  studies,
  studyMembers,
  users,
} from '../../../server/db/schema';

/** The questionnaire an enumerator runs in the field test: consent, a skip, a bid, a photo. */
export const fieldTestBlocks: Block[] = [
  {
    id: 'consent',
    kind: 'consent',
    required: true,
    prompt: 'May I ask you a few questions about lamps? It takes five minutes.',
    statement: 'Your answers are used only for this study. You may stop at any time.',
  },
  {
    id: 'owns-lamp',
    kind: 'single-choice',
    required: true,
    prompt: 'Does the household own a solar lamp?',
    options: [
      { value: 'yes', label: 'Yes, it owns one' },
      { value: 'no', label: 'No, it does not' },
    ],
  },
  {
    id: 'lamps',
    kind: 'number',
    required: true,
    prompt: 'How many solar lamps does it own?',
    min: 1,
    max: 20,
    wholeNumber: true,
    showIf: { blockId: 'owns-lamp', test: 'equals', value: 'yes' },
  },
  {
    id: 'bid',
    kind: 'dichotomous-choice',
    required: true,
    prompt: 'Would the household buy this lamp at this price?',
    bounds: 'single',
    bidDesign: { levels: [{ bidMinor: 50000 }, { bidMinor: 75000 }, { bidMinor: 100000 }] },
  },
  {
    id: 'tag-photo',
    kind: 'photo',
    required: true,
    prompt: 'Photograph the price tag of the lamp on the shelf.',
    subject: 'The lamp’s price tag and shelf',
    maxPhotos: 1,
  },
  {
    id: 'ladder',
    kind: 'price-ladder',
    required: true,
    prompt: 'Would the household buy it at each of these prices?',
    pricesMinor: [40000, 60000, 80000],
    order: 'ascending',
    scale: 'yes-no',
  },
];

/** Two invented places; the second is about 600 m north-east of the first. */
export const fieldTestPoints = [
  { code: 'E2E-K1', name: 'Reedbank kiosk', latitude: 1.2345, longitude: 30.9876 },
  { code: 'E2E-S2', name: 'Quayside shop', latitude: 1.2385, longitude: 30.9918 },
];

export interface FieldTestStudy {
  studyId: string;
  routeId: string;
  routeName: string;
  pointIds: string[];
  enumeratorId: string;
  supervisorId: string;
}

async function userIdOf(db: Database, email: string): Promise<{ id: string; org: string }> {
  const [row] = await db
    .select({ id: users.id, org: memberships.organisationId })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .where(eq(users.email, email));
  if (!row) throw new Error(`The demo person ${email} is missing: was the demo seeded?`);
  return row;
}

/**
 * A study in the field, written straight into the tables: the demo enumerator and supervisor as
 * members, a published questionnaire, two points and a route assigned to the enumerator.
 */
export async function insertFieldTestStudy(db: Database): Promise<FieldTestStudy> {
  const problems = validateQuestionnaire({ blocks: fieldTestBlocks });
  if (problems.length > 0) throw new Error(`Bad test questionnaire: ${JSON.stringify(problems)}`);
  const enumerator = await userIdOf(db, 'enumerator@tidewater.test');
  const supervisor = await userIdOf(db, 'supervisor@tidewater.test');
  const suffix = randomUUID().slice(0, 6);
  const [study] = await db
    .insert(studies)
    .values({
      organisationId: enumerator.org,
      name: `Lamp prices on the lake shore ${suffix}`,
      productName: 'Solar lamp',
      currency: 'KES',
      locale: 'en-KE',
      market: 'Two invented lake-shore villages',
      targetSample: 40,
      priceMinMinor: 30000,
      priceMaxMinor: 150000,
      status: 'in_field',
    })
    .returning({ id: studies.id });
  await db.insert(studyMembers).values([
    { studyId: study.id, userId: enumerator.id, roles: ['enumerator'] },
    { studyId: study.id, userId: supervisor.id, roles: ['supervisor'] },
  ]);
  const [questionnaire] = await db
    .insert(questionnaires)
    .values({ studyId: study.id, title: 'Lamp demand' })
    .returning({ id: questionnaires.id });
  await db.insert(questionnaireVersions).values({
    questionnaireId: questionnaire.id,
    version: 1,
    status: 'published',
    definition: { blocks: fieldTestBlocks },
    publishedAt: new Date(),
  });
  const points = await db
    .insert(samplingPoints)
    .values(
      fieldTestPoints.map((p) => ({ ...p, studyId: study.id, kind: 'kiosk', stratum: 'Shore' })),
    )
    .returning({ id: samplingPoints.id });
  const routeName = `Reedbank round ${suffix}`;
  const today = new Date().toISOString().slice(0, 10);
  const [route] = await db
    .insert(routes)
    .values({
      studyId: study.id,
      name: routeName,
      enumeratorId: enumerator.id,
      windowStart: today,
      windowEnd: today,
      assignedAt: new Date(),
    })
    .returning({ id: routes.id });
  await db.insert(routeStops).values(
    points.map((point, i) => ({
      routeId: route.id,
      studyId: study.id,
      pointId: point.id,
      position: i + 1,
      quota: 3,
    })),
  );
  return {
    studyId: study.id,
    routeId: route.id,
    routeName,
    pointIds: points.map((p) => p.id),
    enumeratorId: enumerator.id,
    supervisorId: supervisor.id,
  };
}
