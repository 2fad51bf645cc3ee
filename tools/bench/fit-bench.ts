import { sql } from 'drizzle-orm';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import { connectDatabase, type Database } from '../../server/db/database';
import { fitInDatabase } from '../../server/estimation/in-database-least-squares';
import type { InDatabaseModelSpec } from '../../server/estimation/in-database-model-spec';
import type { BenchContext, BenchPart } from './bench-part';
import { naivePath, type NaiveRuns } from './naive-path';
import { createSyntheticStudy, dropSyntheticStudy, STUDY_COVARIATES } from './synthetic-study';
import { timedRounds } from './timed-rounds';

const ROUNDS = 7;
const NAIVE_RUNS = 3;
const COVARIATES = Object.keys(STUDY_COVARIATES);
/** ln q on ln p and five log covariates: six regressors, so 36 sums (n, 7 linear, 28 products). */
const REGRESSORS = ['ln_price', ...COVARIATES.slice(0, 5)];
/** All six covariates beside the price: seven regressors, 45 sums. */
const WIDER_REGRESSORS = ['ln_price', ...COVARIATES];

/** Median seconds of each measurement on one study size. */
type SizeFigures = Record<string, number>;

/**
 * The fitting part: on synthetic studies of 1M and 10M rows, side by side in one run, the floor
 * (one plain regr_slope pass with ln() over the same table), the in-database fit with classical
 * and with HC1 errors, and at 1M the naive path (every row pulled into Node and fitted there).
 */
export const fitBench: BenchPart = {
  name: 'fit',
  async run(context) {
    const db = connectDatabase(context.databaseUrl, 2);
    try {
      const small = await measureSize(db, context, 1_000_000, '1m');
      const large = await measureSize(db, context, 10_000_000, '10m');
      context.report('fit-floor-ratio', large['classical'] / large['floor'], 'x');
      context.report('fit-hc1-floor-ratio', large['hc1'] / large['floor'], 'x');
      context.report('fit-naive-speedup', small['naive'] / small['classical'], 'x');
      context.report('fit-floor-ratio-7-regressors', large['wider'] / large['floor'], 'x');
      printTable(context, small, large);
    } finally {
      await db.$client.end();
    }
  },
};

async function measureSize(
  db: Database,
  context: BenchContext,
  rows: number,
  label: string,
): Promise<SizeFigures> {
  const table = `bench_study_${label}`;
  context.log(`generating ${rows} rows`);
  const loadStarted = performance.now();
  await createSyntheticStudy(db, table, rows);
  context.report(`fit-load-${label}`, (performance.now() - loadStarted) / 1000, 's');
  try {
    const spec = (regressors: string[]): InDatabaseModelSpec => ({
      source: { table },
      response: 'ln_qty',
      regressors,
    });
    let classical: LinearFit | undefined;
    const figures = await timedRounds(
      {
        floor: () =>
          db.execute(sql`SELECT regr_slope(ln(qty), ln(price)) FROM ${sql.identifier(table)}`),
        classical: async () => (classical = await fitInDatabase(db, spec(REGRESSORS))),
        hc1: () => fitInDatabase(db, { ...spec(REGRESSORS), standardErrors: { type: 'hc1' } }),
        ...(label === '10m' ? { wider: () => fitInDatabase(db, spec(WIDER_REGRESSORS)) } : {}),
      },
      ROUNDS,
    );
    for (const [name, seconds] of Object.entries(figures)) {
      context.report(
        `fit-${name === 'wider' ? 'classical-7-regressors' : name}-${label}`,
        seconds,
        's',
      );
    }
    context.log(
      `elasticity at ${label}: ${classical!.coefficients[1].estimate.toFixed(4)} (true −1.3)`,
    );
    if (label !== '1m') return figures;
    const naive = naivePath(
      context.databaseUrl,
      table,
      { response: 'ln_qty', regressors: REGRESSORS },
      NAIVE_RUNS,
    );
    reportNaive(context, naive, classical!, label);
    return { ...figures, naive: naive.seconds };
  } finally {
    await dropSyntheticStudy(db, table);
  }
}

function reportNaive(context: BenchContext, naive: NaiveRuns, fit: LinearFit, label: string) {
  context.report(`fit-naive-${label}`, naive.seconds, 's');
  context.report(`fit-naive-pull-${label}`, naive.pullSeconds, 's');
  context.report(`fit-naive-peak-rss-${label}`, naive.peakRssMegabytes, 'MB');
  const differences = fit.coefficients.flatMap((c, j) => {
    const [estimate, stdError] = naive.coefficients[j];
    return [
      Math.abs(c.estimate - estimate) / Math.abs(estimate),
      Math.abs(c.stdError - stdError) / stdError,
    ];
  });
  context.report(`fit-naive-agreement-${label}`, Math.max(...differences), 'relative');
}

function printTable(context: BenchContext, small: SizeFigures, large: SizeFigures) {
  const cell = (figures: SizeFigures, name: string) =>
    (figures[name] === undefined ? '–' : `${figures[name].toFixed(3)} s`).padStart(10);
  const rows: [string, string][] = [
    ['floor: regr_slope(ln q, ln p)', 'floor'],
    ['in-database fit, classical', 'classical'],
    ['in-database fit, HC1', 'hc1'],
    ['in-database fit, 7 regressors', 'wider'],
    ['naive: pull rows, fit in Node', 'naive'],
  ];
  context.log(
    `${'median of rounds'.padEnd(32)}${'1M rows'.padStart(10)}${'10M rows'.padStart(10)}`,
  );
  for (const [title, name] of rows)
    context.log(`${title.padEnd(32)}${cell(small, name)}${cell(large, name)}`);
}
