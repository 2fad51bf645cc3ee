import { randomUUID } from 'node:crypto';
import type { Block } from '@shared/questionnaire/block';
import type { Database } from '../../server/db/database';
import { interviews, samplingPoints } from '../../server/db/schema';
import {
  householdBlocks,
  shelfCheckBlocks,
} from '../../server/demo/lantern/lantern-questionnaires';
import { insertPublishedVersion } from './analysis-study';

const recallBlocks: Block[] = [
  ...householdBlocks.slice(0, 3),
  {
    id: 'recall',
    kind: 'purchase-recall',
    prompt: 'How many lantern batteries did you buy in 30 days?',
    required: true,
    periodDays: 30,
    askPricePaid: true,
    maxUnits: 100,
  },
];

/**
 * A small invented study whose data trip each refusal: a shop that sold nothing (no logarithm),
 * households whose income band is the same within a region (a singular design there) and whose
 * region and income band coincide (margins that raking cannot meet together).
 */
export async function insertAwkwardData(db: Database, studyId: string): Promise<void> {
  const points = await db
    .insert(samplingPoints)
    .values(
      ['East', 'East', 'West', 'West'].map((stratum, i) => ({
        studyId,
        code: `AW-${i + 1}`,
        name: `Awkward point ${i + 1}`,
        kind: 'shop',
        latitude: -1 - i * 0.01,
        longitude: 36,
        stratum,
      })),
    )
    .returning({ id: samplingPoints.id });
  const shelf = await insertPublishedVersion(db, studyId, 'Shelf', shelfCheckBlocks);
  const recall = await insertPublishedVersion(db, studyId, 'Recall', recallBlocks);
  const when = new Date('2026-11-10T10:00:00Z');
  const row = (versionId: string, point: number, answers: Record<string, unknown>) => ({
    id: randomUUID(),
    studyId,
    questionnaireVersionId: versionId,
    pointId: points[point].id,
    status: 'accepted' as const,
    answers: { consent: { agreed: true }, ...answers },
    startedAt: when,
    finishedAt: when,
  });
  const shelfRows = [0, 5, 7, 9].map((units, i) =>
    row(shelf, i, {
      lantern_shelf: { priceMinor: 100000 + i * 20000, packSize: 1, quantity: units },
    }),
  );
  const recallRows = Array.from({ length: 8 }, (_, i) =>
    row(recall, i < 4 ? i % 2 : 2 + (i % 2), {
      household: { people: 2 + (i % 5) },
      income: { band: i < 4 ? 'under-10k' : 'over-50k' },
      recall: { units: 2 + ((i * 3) % 5), pricePaidMinor: 90000 + ((i * 7) % 6) * 10000 },
    }),
  );
  await db.insert(interviews).values([...shelfRows, ...recallRows]);
}
