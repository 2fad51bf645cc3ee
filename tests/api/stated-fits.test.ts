import { jest } from '@jest/globals';
import { eq, sql } from 'drizzle-orm';
import type { FitResult } from '@shared/analysis/fit-result';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { loadFitInput } from '../../server/analysis/load-fit-input';
import { respondentWeights } from '../../server/analysis/respondent-weights';
import { estimateFit, prepareFit, runFit } from '../../server/analysis/run-fit';
import {
  isStated,
  prepareTabulatedFit,
} from '../../server/analysis/tabulated/prepare-tabulated-fit';
import { tabulateDataset } from '../../server/analysis/tabulated/tabulate-dataset';
import { fits, interviews, samplingPoints } from '../../server/db/schema';
import { householdBlocks } from '../../server/demo/lantern/lantern-questionnaires';
import { runFitJob } from '../../server/fits/run-fit-job';
import { seededTruth, seedStatedInterviews } from '../../tools/bench/stated-study-seed';
import { insertLanternData, insertPublishedVersion } from '../support/analysis-study';
import { fixedFigureDifferences } from '../support/compare-fit-results';
import { commonSpec, lanternMargins, manySpecs } from '../support/fit-specs';
import { insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation } from '../support/test-organisation';

const { deps } = createTestApp();
const db = deps.db;
let organisationId: string;
let lanternStudy: string;

jest.setTimeout(900_000);

beforeAll(async () => {
  const organisation = await createTestOrganisation(db, 'Stated fits');
  organisationId = organisation.id;
  lanternStudy = await insertStudy(db, organisationId, [], 'Lantern stated fits');
  await insertLanternData(db, lanternStudy);
});

afterAll(async () => {
  await db.$client.end();
});

/** Today's path on the same data: every matched interview read and extracted in memory. */
async function inMemory(studyId: string, spec: FitSpec) {
  const input = await loadFitInput(db, studyId, spec.filters);
  const prepared = prepareFit(input, spec);
  const table = tabulateDataset(prepared.dataset as never, spec);
  return {
    today: runFit(input, spec),
    tabulated: estimateFit(
      { ...prepared, dataset: table, weights: respondentWeights(table, spec.weighting) },
      spec,
    ),
  };
}

const statedSpecs: FitSpec[] = [
  ...manySpecs.filter(isStated),
  {
    method: 'price-ladder',
    ...commonSpec,
    filters: { flagged: 'exclude', regions: ['North shore'] },
  },
  { method: 'price-thresholds', ...commonSpec, weighting: lanternMargins },
  {
    method: 'wtp-open',
    ...commonSpec,
    bootstrap: { replicates: 300, seed: 5 },
    weighting: lanternMargins,
  },
  {
    method: 'payment-card',
    ...commonSpec,
    distribution: 'normal',
    blockId: 'card',
    filters: { flagged: 'exclude', from: '2026-11-10' },
  },
  { method: 'dichotomous-choice', ...commonSpec, weighting: lanternMargins },
];

describe('stated-preference fits from the database’s frequency table', () => {
  it.each(statedSpecs.map((spec, i) => [i, spec.method, spec] as const))(
    'spec %d (%s) gives exactly the in-memory table’s result, and today’s fixed figures to 1e-9',
    async (_i, _method, spec) => {
      const prepared = await prepareTabulatedFit(db, lanternStudy, spec as never);
      const fromDatabase = estimateFit(prepared, spec);
      const { today, tabulated } = await inMemory(lanternStudy, spec);
      // The same frequency table, whether summed in SQL or from the rows in memory: identical
      // results, resampled intervals included (the same cells, order and seed).
      expect({ ...fromDatabase, dataHash: '' }).toEqual({ ...tabulated, dataHash: '' });
      // Today's per-respondent path: every figure not drawn from resamples agrees to 1e-9
      // relative (only the order of floating-point sums differs).
      expect(fixedFigureDifferences(today, fromDatabase)).toEqual([]);
      // Resampled figures come from multinomial draws over the table instead of one-by-one
      // draws: each interval still holds its estimate.
      for (const figure of fromDatabase.keyFigures) {
        if (figure.ciLow === null || figure.ciHigh === null) continue;
        expect(figure.ciLow).toBeLessThanOrEqual(figure.estimate + 1e-9);
        expect(figure.ciHigh).toBeGreaterThanOrEqual(figure.estimate - 1e-9);
      }
    },
  );

  it('hashes exactly the rows used: the same again, another filter or one changed answer differ', async () => {
    const spec: FitSpec = {
      method: 'wtp-open',
      ...commonSpec,
      bootstrap: { replicates: 50, seed: 1 },
    };
    const hash = async (s: FitSpec) =>
      (await prepareTabulatedFit(db, lanternStudy, s as never)).dataHash;
    const first = await hash(spec);
    expect(await hash(spec)).toBe(first);
    expect(await hash({ ...spec, filters: { flagged: 'exclude' } })).not.toBe(first);
    // A weighting does not change the amounts but adds the raking levels to the rows hashed.
    expect(await hash({ ...spec, weighting: lanternMargins })).not.toBe(first);
    const [one] = await db
      .execute<{ id: string; answers: Record<string, { amountMinor: number }> }>(
        sql`SELECT i.id, i.answers FROM interviews i JOIN stated_wtp_amounts w ON w.interview_id = i.id
          WHERE i.study_id = ${lanternStudy} AND i.status = 'accepted' LIMIT 1`,
      )
      .then((r) => r.rows);
    const amount = one.answers['most_pay'].amountMinor;
    const changed = { ...one.answers, most_pay: { amountMinor: amount + 100 } };
    await db.update(interviews).set({ answers: changed }).where(eq(interviews.id, one.id));
    expect(await hash(spec)).not.toBe(first);
    await db.update(interviews).set({ answers: one.answers }).where(eq(interviews.id, one.id));
    expect(await hash(spec)).toBe(first);
  });
});

describe('typed analysis rows', () => {
  it('follow their interview: written with it, rewritten on correction and review, removed with it', async () => {
    const count = async (table: string, id: string) =>
      Number(
        (
          await db.execute<{ n: string }>(
            sql`SELECT count(*) AS n FROM ${sql.identifier(table)} WHERE interview_id = ${id}`,
          )
        ).rows[0].n,
      );
    const [row] = await db
      .select({ id: interviews.id, answers: interviews.answers })
      .from(interviews)
      .where(sql`${interviews.studyId} = ${lanternStudy} AND ${interviews.answers} ? 'ladder'`)
      .limit(1);
    const answers = row.answers as Record<string, { steps?: unknown[] }>;
    // One row per ladder step answered; one per other stated block (the demo household
    // questionnaire asks each once).
    expect(await count('stated_ladder_steps', row.id)).toBe(answers['ladder'].steps!.length);
    for (const table of [
      'stated_thresholds',
      'stated_wtp_amounts',
      'stated_card_intervals',
      'stated_bid_answers',
      'stated_interviews',
    ]) {
      expect(await count(table, row.id)).toBe(1);
    }
    // A correction without the ladder answer leaves no ladder rows; review moves the status.
    const withoutLadder = Object.fromEntries(
      Object.entries(answers).filter(([block]) => block !== 'ladder'),
    );
    await db
      .update(interviews)
      .set({ answers: withoutLadder, status: 'returned' })
      .where(eq(interviews.id, row.id));
    expect(await count('stated_ladder_steps', row.id)).toBe(0);
    const status = await db.execute<{ status: string }>(
      sql`SELECT status FROM stated_wtp_amounts WHERE interview_id = ${row.id}`,
    );
    expect(status.rows[0].status).toBe('returned');
    await db.delete(interviews).where(eq(interviews.id, row.id));
    for (const table of [
      'stated_thresholds',
      'stated_wtp_amounts',
      'stated_card_intervals',
      'stated_bid_answers',
      'stated_interviews',
    ]) {
      expect(await count(table, row.id)).toBe(0);
    }
  });
});

describe('200,000 answers per stated method through the fit job', () => {
  const size = 200_000;
  let studyId: string;

  beforeAll(async () => {
    studyId = await insertStudy(db, organisationId, [], 'Stated fits at scale');
    const versionId = await insertPublishedVersion(db, studyId, 'Household', householdBlocks);
    const points = await db
      .insert(samplingPoints)
      .values(
        ['North', 'South', 'Hill'].map((stratum, i) => ({
          studyId,
          code: `SCALE-${i}`,
          name: `Scale point ${i}`,
          kind: 'household',
          latitude: -1,
          longitude: 36,
          stratum,
        })),
      )
      .returning({ id: samplingPoints.id });
    await seedStatedInterviews(db, { studyId, versionId, pointIds: points.map((p) => p.id) }, size);
  });

  const runJob = async (spec: FitSpec): Promise<FitResult> => {
    const [queued] = await db.insert(fits).values({ studyId, spec }).returning({ id: fits.id });
    await runFitJob(db, queued.id, 'test-scale');
    const [done] = await db.select().from(fits).where(eq(fits.id, queued.id));
    expect(done.error).toBeNull();
    expect(done.status).toBe('done');
    return done.result as FitResult;
  };
  const figure = (result: FitResult, label: string) =>
    result.keyFigures.find((k) => k.label.startsWith(label))!.estimate;
  const { median, scale } = seededTruth;

  it('recovers the logistic WTP from the ladder: half buy at the median', async () => {
    const result = await runJob({ method: 'price-ladder', ...commonSpec });
    expect(result.n).toBe(size);
    expect(result.observations).toBe(7 * size);
    // Seeded truth: P(buy at p) = 1/(1 + e^((p − 1500)/300)), so a = 5, b = −1/300 and the
    // half-share price −a/b = 1500; with 200,000 respondents its SE is a few KES.
    expect(Math.abs(figure(result, 'Price at which half would buy') - median)).toBeLessThan(15);
    const slope = result.coefficients[1].estimate;
    expect(Math.abs(slope - -1 / scale) / (1 / scale)).toBeLessThan(0.03);
  });

  it('finds the threshold price points the seeded curves cross at', async () => {
    const result = await runJob({ method: 'price-thresholds', ...commonSpec });
    expect(result.n).toBe(size);
    // Exact arithmetic on the seeded answers: too cheap 0.4·W and too expensive 1.2·W cross
    // where 1 − F(p/0.4) = F(p/1.2), i.e. p/0.4 + p/1.2 = 2·1500 (logistic symmetry): p = 900;
    // cheap 0.6·W and expensive 0.9·W where p/0.6 + p/0.9 = 3000: p = 1080. Answers are
    // rounded to 10 KES.
    expect(Math.abs(figure(result, 'Optimal price point') - 900)).toBeLessThan(15);
    expect(Math.abs(figure(result, 'Indifference price point') - 1080)).toBeLessThan(15);
  });

  it('gives the open WTP mean and median of the seeded distribution, 2,000 resamples', async () => {
    const result = await runJob({
      method: 'wtp-open',
      ...commonSpec,
      bootstrap: { replicates: 2000, seed: 11 },
    });
    expect(result.n).toBe(size);
    // Logistic with median 1500: mean 1500 too (symmetry); amounts rounded to 50 KES and
    // kept ≥ 0 (the cut-off moves the mean by about 300·ln(1 + e^−5) ≈ 2 KES).
    expect(Math.abs(figure(result, 'Mean willingness to pay') - median)).toBeLessThan(10);
    expect(Math.abs(figure(result, 'Median willingness to pay') - median)).toBeLessThanOrEqual(50);
  });

  it.each([
    ['payment card', { method: 'payment-card', ...commonSpec, distribution: 'logistic' }],
    ['double-bounded bids', { method: 'dichotomous-choice', ...commonSpec }],
  ] as [string, FitSpec][])('estimates the median WTP from %s', async (_name, spec) => {
    const result = await runJob(spec);
    expect(result.n).toBe(size);
    // Interval-censored logistic WTP (seeded truth: median 1500, β = 1/300).
    expect(Math.abs(figure(result, 'Median willingness to pay') - median)).toBeLessThan(15);
  });
});
