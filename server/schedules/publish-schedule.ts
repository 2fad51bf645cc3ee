import { and, eq, max } from 'drizzle-orm';
import { cellsBelowMinimum, minimumCellRespondents } from '@shared/analysis/cell-support';
import type { PublishScheduleRequest } from '@shared/analysis/schedule-version';
import type { Database } from '../db/database';
import { scheduleVersions, studies } from '../db/schema';
import { findFit } from '../fits/fits-repository';
import { HttpError, notFound } from '../http/http-error';
import { countOf, priceWriter } from '../analysis/price-text';
import type { PublishedSchedule } from './published-schedule';
import { refuseRepublishing } from './refuse-republishing';

/**
 * Publishes a finished fit's schedule as the study's next version. Refuses a fit that is not
 * done or has no schedule (409), a fit already published in a version still in force, or a title
 * a version in force already has without saying it replaces that version (409), a schedule with
 * a cell resting on fewer than five respondents (422, naming the cells), and a `replaces` that is
 * not this study's or is already replaced.
 */
export async function publishSchedule(
  db: Database,
  studyId: string,
  request: PublishScheduleRequest,
  publisher: { userId: string; name: string },
): Promise<string> {
  const fit = await findFit(db, studyId, request.fitId);
  if (fit.status !== 'done' || !fit.result) {
    throw new HttpError(
      409,
      'fit-not-done',
      `That fit is ${fit.status}; only a finished fit can be published.`,
    );
  }
  const { result } = fit;
  if (!result.schedule) {
    throw new HttpError(
      409,
      'no-schedule',
      `That fit has no demand schedule: ${result.noScheduleReason ?? 'no curve'}.`,
    );
  }
  refuseThinCells(result.schedule.rows, result.currency);
  return db.transaction(async (tx) => {
    const [study] = await tx
      .select({ name: studies.name, productName: studies.productName })
      .from(studies)
      .where(eq(studies.id, studyId))
      .for('update');
    if (request.replaces) await checkReplaceable(tx, studyId, request.replaces);
    await refuseRepublishing(tx, studyId, fit.id, request);
    const [{ latest }] = await tx
      .select({ latest: max(scheduleVersions.version) })
      .from(scheduleVersions)
      .where(eq(scheduleVersions.studyId, studyId));
    const schedule: PublishedSchedule = {
      ...result.schedule!,
      studyName: study.name,
      productName: study.productName,
      methodLabel: result.methodLabel,
      currency: result.currency,
      weighting: result.weighting,
    };
    const [row] = await tx
      .insert(scheduleVersions)
      .values({
        studyId,
        fitId: fit.id,
        version: (latest ?? 0) + 1,
        title: request.title,
        replacesId: request.replaces ?? null,
        method: result.method,
        spec: fit.spec,
        n: result.n,
        dataHash: result.dataHash,
        schedule,
        publishedBy: publisher.userId,
        publishedByName: publisher.name,
      })
      .returning({ id: scheduleVersions.id });
    return row.id;
  });
}

function refuseThinCells(
  rows: readonly { price: number; respondents: number }[],
  currency: string,
): void {
  const thin = cellsBelowMinimum(rows);
  if (thin.length === 0) return;
  const money = priceWriter(currency);
  throw new HttpError(
    422,
    'too-few-respondents',
    `${countOf(thin.length, 'price')} of the schedule ${thin.length === 1 ? 'rests' : 'rest'} on ` +
      `fewer than ${minimumCellRespondents} respondents; narrow the price grid to where the ` +
      'answers are, or collect more interviews.',
    thin.map((row) => ({
      path: `price:${row.price}`,
      message: `At ${money(row.price)} the schedule rests on ${countOf(row.respondents, 'respondent')}; at least ${minimumCellRespondents} are needed.`,
    })),
  );
}

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

async function checkReplaceable(tx: Tx, studyId: string, replaces: string): Promise<void> {
  const [target] = await tx
    .select({ id: scheduleVersions.id })
    .from(scheduleVersions)
    .where(and(eq(scheduleVersions.id, replaces), eq(scheduleVersions.studyId, studyId)));
  if (!target) throw notFound('The version to replace');
  const [already] = await tx
    .select({ id: scheduleVersions.id, version: scheduleVersions.version })
    .from(scheduleVersions)
    .where(eq(scheduleVersions.replacesId, replaces));
  if (already) {
    throw new HttpError(
      409,
      'already-replaced',
      `That version is already corrected by version ${already.version}; correct the newest version instead.`,
    );
  }
}
