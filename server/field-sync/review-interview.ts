import { and, eq } from 'drizzle-orm';
import { statusAfterReview, type ReviewActionBody } from '@shared/field-sync/review-action';
import type { Actor } from '../auth/actor';
import type { Executor } from '../db/database';
import { interviews } from '../db/schema';
import { notFound } from '../http/http-error';

/**
 * Records a supervisor's decision: accepted, returned to the enumerator's device with the note,
 * or rejected with it. A later decision replaces an earlier one (the enumerator may have sent a
 * correction meanwhile); the note, the reviewer and the time are kept with the interview.
 */
export async function reviewInterview(
  db: Executor,
  studyId: string,
  interviewId: string,
  body: ReviewActionBody,
  reviewer: Actor,
): Promise<void> {
  const updated = await db
    .update(interviews)
    .set({
      status: statusAfterReview[body.action],
      reviewNote: body.note ?? null,
      reviewedBy: reviewer.userId,
      reviewedAt: new Date(),
    })
    .where(and(eq(interviews.studyId, studyId), eq(interviews.id, interviewId)))
    .returning({ id: interviews.id });
  if (updated.length === 0) throw notFound('That interview');
}
