import { sql, type SQL } from 'drizzle-orm';
import { goodnessOfFit } from '@shared/estimation/least-squares/goodness-of-fit';
import type { InstrumentalFit } from '@shared/estimation/least-squares/instrumental-fit';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import { waldF } from '@shared/estimation/least-squares/wald-test';
import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';
import type { FitDatabase, InDatabaseStandardErrors, SqlRunner } from '../in-database-model-spec';
import { fitInDatabase } from '../in-database-least-squares';

/** What every stage shares: the response, weights, errors and level. */
interface StageOptions {
  readonly response: string;
  readonly weights?: string;
  readonly standardErrors: InDatabaseStandardErrors;
  readonly confidenceLevel: number;
}

/** The roles of the columns in the instrumented model. */
interface InstrumentedTerms {
  readonly exogenous: readonly string[];
  readonly endogenous: string;
  readonly instruments: readonly string[];
}

/**
 * Two-stage least squares where the rows are stored, with three runs of the in-database engine
 * (each one aggregate pass, plus its residual pass for robust errors):
 *
 * 1. the first stage p = Zπ + v on the exogenous regressors and the instruments (its sums hold
 *    every instrument × regressor cross-product), giving p̂ = Zπ in SQL;
 * 2. y on the exogenous regressors and p̂, giving the 2SLS coefficients β;
 * 3. y* = y − β_p·(p − p̂) on the same regressors. Since p − p̂ is orthogonal to every column
 *    of Z, and so to X̂, this regression has the same coefficients β, and its residuals
 *    y* − X̂β = y − Xβ are the structural residuals. Its classical, HC1 or cluster covariance is
 *    therefore exactly the 2SLS one: bread (X̂ᵀWX̂)⁻¹, meat from the structural residuals.
 *
 * R² is 1 − RSS/TSS of y (not y*), and the F test is a Wald test, as the in-memory 2SLS reports.
 */
export async function twoStageInDatabase(
  db: FitDatabase & SqlRunner,
  source: SQL,
  options: StageOptions,
  terms: InstrumentedTerms,
): Promise<InstrumentalFit> {
  const firstRegressors = [...terms.exogenous, ...terms.instruments];
  const first = await fitInDatabase(db, {
    ...options,
    source: { query: source },
    response: terms.endogenous,
    regressors: firstRegressors,
  });
  const predicted = linearCombination(first);
  const p = sql.identifier(terms.endogenous);
  const y = sql.identifier(options.response);
  const fittedSource = sql`SELECT s.*, ${predicted} AS __fitted FROM (${source}) AS s`;
  const regressors = [...terms.exogenous, terms.endogenous];
  const carried = [
    ...terms.exogenous,
    ...(options.weights ? [options.weights] : []),
    ...(options.standardErrors.type === 'cluster' ? [options.standardErrors.column] : []),
  ].map((column) => sql`f.${sql.identifier(column)}`);
  // The stage's rows: the response replaced, the price replaced by its prediction, the rest as is.
  const stage = (response: SQL) => ({
    query: sql`SELECT ${sql.join([sql`${response} AS ${y}`, sql`f.__fitted AS ${p}`, ...carried], sql`, `)}
               FROM (${fittedSource}) AS f`,
  });
  const secondStage = await fitInDatabase(db, {
    ...options,
    standardErrors: { type: 'classical' },
    source: stage(sql`f.${y}`),
    regressors,
  });
  const beta = secondStage.coefficients.find((c) => c.term === terms.endogenous)!.estimate;
  const structural = await fitInDatabase(db, {
    ...options,
    source: stage(sql`f.${y} - ${beta}::float8 * (f.${p} - f.__fitted)`),
    regressors,
  });
  const totalSumOfSquares = secondStage.residualSumOfSquares / (1 - secondStage.rSquared);
  const excluded = terms.instruments.map(
    (_, i) => firstRegressors.length - terms.instruments.length + i + 1,
  );
  const statistic = waldF(
    first.coefficients.map((c) => c.estimate),
    first.covariance,
    excluded,
  );
  return {
    ...structural,
    ...goodnessOfFit({
      n: structural.n,
      totalSumOfSquares,
      intercept: structural.intercept,
      residualSumOfSquares: structural.residualSumOfSquares,
      estimates: structural.coefficients.map((c) => c.estimate),
      covariance: structural.covariance,
      robust: true,
      fDenominatorDf: structural.standardErrors.df,
    }),
    assumptions: [
      ...structural.assumptions,
      `two-stage least squares: ${terms.endogenous} instrumented by ${terms.instruments.join(', ')}`,
    ],
    instruments: [...terms.instruments],
    endogenous: [terms.endogenous],
    firstStages: [
      {
        endogenous: terms.endogenous,
        fStatistic: Number.isFinite(statistic) ? statistic : null,
        fDf: [terms.instruments.length, first.standardErrors.df],
        coefficients: first.coefficients,
      },
    ],
  };
}

/** The first stage's prediction Σπⱼzⱼ as SQL over the source's columns. */
function linearCombination(fit: LinearFit): SQL {
  const parts = fit.coefficients.map((c) =>
    c.term === INTERCEPT_TERM
      ? sql`${c.estimate}::float8`
      : sql`${c.estimate}::float8 * s.${sql.identifier(c.term)}`,
  );
  return sql.join(parts, sql` + `);
}
