import { EstimationError } from '@shared/estimation/estimation-error';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import { classicalFit } from './classical-fit';
import { inFitSession } from './fit-session';
import type { FitDatabase, InDatabaseModelSpec, SqlRunner } from './in-database-model-spec';
import { exactInDatabaseFit } from './exact-in-database-fit';
import { diagnoseInputs } from './input-diagnosis';
import { InputProblem, isDataException } from './input-problem';
import { residualSquares } from './meat-pass';
import { momentPass } from './moment-pass';
import { resolveModel } from './model-source';
import { robustFit } from './robust-fit';
import { solveShifted } from './shifted-solution';

/** 1 − R² below which the one-pass RSS has lost 3+ digits and a residual pass recomputes it. */
const NEAR_PERFECT_FIT = 1e-3;

/**
 * Scaled condition number of the float8 XᵀX above which robust errors are taken from exact
 * numeric sums: the meat's float8 roundings reach the sandwich multiplied by about this much,
 * so up to it they keep 9+ digits (the design's own condition number is its square root).
 */
const EXACT_ROBUST_ABOVE = 1e4;

/**
 * Fits y = Xβ + e by (weighted) least squares where the observations are stored, for studies too
 * large to pull into Node. One aggregate query computes every sum the normal equations need
 * (about a shift near each column's mean, so the products lose no digits to cancellation);
 * Node solves the small system exactly. HC1 and cluster-robust errors take a second aggregate
 * pass over the residuals computed in SQL. Designs whose float8 sums fall short (see
 * exactInDatabaseFit) are summed in exact numeric instead. Only sums leave the database. Returns the same
 * LinearFit as fitLinearModel, and refuses bad input with an EstimationError naming the column:
 * 'missing-column', 'missing-table', 'too-few-observations', 'non-positive-log' (ln of a value
 * ≤ 0), 'invalid-value' (NULL, NaN or infinite values, weights ≤ 0), 'too-few-clusters',
 * 'singular-design'.
 */
export async function fitInDatabase(
  db: FitDatabase,
  spec: InDatabaseModelSpec,
): Promise<LinearFit> {
  checkSpec(spec);
  try {
    return await inFitSession(db, (tx) => fitPasses(tx, spec));
  } catch (error) {
    if (!(error instanceof InputProblem) && !isDataException(error)) throw error;
    // The failed pass aborted its transaction: find the column at fault in a fresh one.
    const refusal = await db.transaction(async (tx) =>
      diagnoseInputs(tx, await resolveModel(tx, spec)),
    );
    throw refusal ?? error;
  }
}

async function fitPasses(tx: SqlRunner, spec: InDatabaseModelSpec): Promise<LinearFit> {
  const model = await resolveModel(tx, spec);
  const sums = await momentPass(tx, model);
  const parameters = model.regressors.length + (model.intercept ? 1 : 0);
  if (sums.n <= parameters) {
    throw new EstimationError(
      'too-few-observations',
      `${sums.n} observations in ${model.label} cannot estimate ${parameters} coefficients with ` +
        `any residual degrees of freedom; need at least ${parameters + 1}`,
      model.response.column,
    );
  }
  const options = {
    regressors: model.regressors.map((r) => r.name),
    response: model.response.name,
    intercept: model.intercept,
    confidenceLevel: spec.confidenceLevel ?? 0.95,
    maxConditionNumber: spec.maxConditionNumber,
  };
  const classical = (spec.standardErrors?.type ?? 'classical') === 'classical';
  let base: LinearFit;
  try {
    base = classicalFit(sums, options);
  } catch (error) {
    // Float8 sums cannot pin this design down; numeric sums can, exactly.
    if (error instanceof EstimationError && error.code === 'ill-conditioned') {
      return exactInDatabaseFit(tx, model, spec, sums.n);
    }
    throw error;
  }
  if (!classical && base.conditionNumber ** 2 > EXACT_ROBUST_ABOVE) {
    return exactInDatabaseFit(tx, model, spec, sums.n);
  }
  const refine = 1 - base.rSquared < NEAR_PERFECT_FIT;
  if (classical && !refine) return base;
  const shifted = solveShifted(sums, model);
  const refined = refine
    ? classicalFit(sums, options, await residualSquares(tx, model, shifted))
    : base;
  return classical ? refined : robustFit(tx, model, shifted, refined);
}

function checkSpec(spec: InDatabaseModelSpec): void {
  const level = spec.confidenceLevel ?? 0.95;
  if (!(level > 0 && level < 1)) {
    throw new EstimationError(
      'invalid-option',
      `confidence level must lie strictly between 0 and 1, got ${level}`,
      'confidenceLevel',
    );
  }
  const names = [...spec.regressors, spec.response].map((t) =>
    typeof t === 'string' ? t : `ln(${t.log})`,
  );
  const duplicate = names.find((name, i) => names.indexOf(name) !== i);
  if (duplicate !== undefined) {
    throw new EstimationError(
      'duplicate-column',
      `${duplicate} appears twice in the model`,
      duplicate,
    );
  }
}
