import { spawnSync } from 'node:child_process';
import { eq, sql } from 'drizzle-orm';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { connectDatabase, type Database } from '../../server/db/database';
import { applyMigrations } from '../../server/db/migrate';
import { fits, organisations, samplingPoints, studies } from '../../server/db/schema';
import { householdBlocks } from '../../server/demo/lantern/lantern-questionnaires';
import { insertPublishedVersion } from '../../tests/support/analysis-study';
import { checkoutRoot } from '../stack/state-dir';
import type { BenchContext, BenchPart } from './bench-part';
import { seedStatedInterviews } from './stated-study-seed';

const common = {
  filters: { flagged: 'include' as const },
  weighting: null,
  priceGrid: { from: 900, to: 2500, steps: 9 },
  unitCost: 600,
  confidenceLevel: 0.95,
};

/** One spec per stated method, named as the figures are. */
const specs: Record<string, FitSpec> = {
  ladder: { method: 'price-ladder', ...common },
  thresholds: { method: 'price-thresholds', ...common },
  'payment-card': { method: 'payment-card', ...common, distribution: 'logistic' },
  bids: { method: 'dichotomous-choice', ...common },
  'open-wtp': { method: 'wtp-open', ...common, bootstrap: { replicates: 2000, seed: 11 } },
};

/**
 * Stated-preference fits on one million interviews, each from the queued fit to its stored
 * result in a fresh process running the worker's job (`stated-fit-1m-METHOD-s`, target < 10 s),
 * and the worker's peak memory on one million interviews over that on ten thousand
 * (`worker-peak-rss-ratio`, the largest over the methods; target ≤ 1.5). Interviews are seeded
 * set by set (generate_series); their typed rows follow from the interviews' trigger.
 */
export const statedFitBench: BenchPart = {
  name: 'stated-fit',
  async run(context) {
    const db = connectDatabase(context.databaseUrl, 2);
    try {
      await applyMigrations(db);
      const small = await measure(db, context, 10_000, '10k');
      const large = await measure(db, context, 1_000_000, '1m');
      for (const name of Object.keys(specs)) {
        context.report(`stated-fit-1m-${name}-s`, large[name].seconds, 's');
      }
      const ratios = Object.keys(specs).map((name) => large[name].rss / small[name].rss);
      context.report('worker-peak-rss-ratio', Math.max(...ratios), 'x');
      for (const name of Object.keys(specs)) {
        context.log(
          `${name}: ${small[name].rss.toFixed(0)} MB at 10k, ${large[name].rss.toFixed(0)} MB at 1M, ` +
            `${small[name].seconds.toFixed(2)} s at 10k`,
        );
      }
    } finally {
      await db.$client.end();
    }
  },
};

async function measure(
  db: Database,
  context: BenchContext,
  interviews: number,
  label: string,
): Promise<Record<string, { seconds: number; rss: number }>> {
  const studyId = await createStudy(db, label);
  try {
    const versionId = await insertPublishedVersion(db, studyId, 'Household', householdBlocks);
    const points = await db
      .insert(samplingPoints)
      .values(
        ['North', 'South', 'Hill'].map((stratum, i) => ({
          studyId,
          code: `BENCH-${i}`,
          name: `Bench point ${i}`,
          kind: 'household',
          latitude: -1,
          longitude: 36,
          stratum,
        })),
      )
      .returning({ id: samplingPoints.id });
    context.log(`seeding ${interviews} interviews`);
    const started = performance.now();
    await seedStatedInterviews(
      db,
      { studyId, versionId, pointIds: points.map((p) => p.id) },
      interviews,
    );
    await db.execute(sql`ANALYZE`);
    context.report(`stated-seed-${label}-s`, (performance.now() - started) / 1000, 's');
    const figures: Record<string, { seconds: number; rss: number }> = {};
    for (const [name, spec] of Object.entries(specs)) {
      figures[name] = await timedJob(db, context, studyId, spec);
      context.log(`${name} at ${label}: ${figures[name].seconds.toFixed(2)} s`);
    }
    return figures;
  } finally {
    // The bench's database is made afresh for every run and dropped after it.
    await db.execute(sql`TRUNCATE stated_ladder_steps, stated_thresholds, stated_wtp_amounts,
      stated_card_intervals, stated_bid_answers, stated_interviews`);
  }
}

async function createStudy(db: Database, label: string): Promise<string> {
  const [organisation] = await db
    .insert(organisations)
    .values({ name: `Stated bench ${label}` })
    .returning({ id: organisations.id });
  const [study] = await db
    .insert(studies)
    .values({
      organisationId: organisation.id,
      name: `Stated bench ${label}`,
      productName: 'Solar lamp',
      currency: 'KES',
      locale: 'en-KE',
      market: 'An invented market',
      targetSample: 1000,
      priceMinMinor: 50000,
      priceMaxMinor: 250000,
      status: 'draft',
    })
    .returning({ id: studies.id });
  return study.id;
}

/**
 * Queues the fit as the API does and runs its job in a fresh process: the job's time from
 * claiming the fit to its stored result (the API's POST and the queue's pick-up, a few
 * milliseconds each, are not in it) and the process's peak RSS.
 */
async function timedJob(
  db: Database,
  context: BenchContext,
  studyId: string,
  spec: FitSpec,
): Promise<{ seconds: number; rss: number }> {
  const [row] = await db.insert(fits).values({ studyId, spec }).returning({ id: fits.id });
  const run = spawnSync(
    'npx',
    ['tsx', 'tools/bench/stated-fit-job.ts', context.databaseUrl, row.id],
    { cwd: checkoutRoot, encoding: 'utf8' },
  );
  const [done] = await db.select().from(fits).where(eq(fits.id, row.id));
  if (done.status !== 'done') {
    throw new Error(
      `the ${spec.method} fit ended ${done.status}: ${JSON.stringify(done.error)} ${run.stderr}`,
    );
  }
  const read = (name: string) => Number(new RegExp(`${name} ([\\d.]+)`).exec(run.stdout)?.[1]);
  return { seconds: read('job-seconds'), rss: read('peak-rss-mb') };
}
