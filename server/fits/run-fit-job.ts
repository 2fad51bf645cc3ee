import { and, eq, ne, sql } from 'drizzle-orm';
import { logger } from '../http/logger';
import { ZodError } from 'zod';
import type { FitError } from '@shared/analysis/fit-resource';
import { fitSpecSchema } from '@shared/analysis/fit-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import { loadFitInput } from '../analysis/load-fit-input';
import { estimateFit, prepareFit } from '../analysis/run-fit';
import { isStated, prepareTabulatedFit } from '../analysis/tabulated/prepare-tabulated-fit';
import type { Database } from '../db/database';
import { fits } from '../db/schema';

/**
 * Runs one fit job: claims the fit (unless it is already done, so a job delivered twice stores
 * one result), loads its data, raking and estimation with progress along the way, and stores
 * the result or a clear error. Refusals of the data are the fit's outcome, not the job's: only
 * unexpected failures are thrown, for pg-boss to retry.
 */
export async function runFitJob(db: Database, fitId: string, workerId: string): Promise<void> {
  const notDone = and(eq(fits.id, fitId), ne(fits.status, 'done'));
  const [claimed] = await db
    .update(fits)
    .set({
      status: 'running',
      progress: 5,
      attempts: sql`${fits.attempts} + 1`,
      workerId,
      startedAt: new Date(),
      error: null,
    })
    .where(notDone)
    .returning({ spec: fits.spec, studyId: fits.studyId });
  if (!claimed) return;
  const progress = (value: number, dataHash?: string) =>
    db
      .update(fits)
      .set({ progress: value, ...(dataHash ? { dataHash } : {}) })
      .where(notDone);
  try {
    const spec = fitSpecSchema.parse(claimed.spec);
    // Stated-preference methods fit from the frequency table the database sums up; the
    // observed-price fit still reads its matched interviews.
    const prepared = isStated(spec)
      ? await prepareTabulatedFit(db, claimed.studyId, spec)
      : prepareFit(await loadFitInput(db, claimed.studyId, spec.filters), spec);
    await progress(30);
    await progress(50, prepared.dataHash);
    const result = estimateFit(prepared, spec);
    await progress(90);
    await db
      .update(fits)
      .set({
        status: 'done',
        progress: 100,
        result,
        dataHash: result.dataHash,
        finishedAt: new Date(),
      })
      .where(notDone);
  } catch (error) {
    const problem = describe(error);
    await db
      .update(fits)
      .set({ status: 'failed', error: problem, finishedAt: new Date() })
      .where(notDone);
    if (problem.code === 'internal') throw error;
  }
}

function describe(error: unknown): FitError {
  if (error instanceof EstimationError) {
    return { code: error.code, message: error.message, field: error.field ?? null };
  }
  if (error instanceof ZodError) {
    const issue = error.issues[0];
    return {
      code: 'invalid-result',
      message:
        `the estimate could not be stored: ${issue?.path.join('.') ?? ''} ${issue?.message ?? ''}`.trim(),
      field: null,
    };
  }
  logger.error({ err: error }, 'fit job failed');
  return {
    code: 'internal',
    message: 'The fit failed on the server; it has been logged and will be retried.',
    field: null,
  };
}
