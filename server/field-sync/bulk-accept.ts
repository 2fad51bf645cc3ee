import { and, eq, inArray, ne } from 'drizzle-orm';
import type { BulkAcceptBody, BulkAcceptResult } from '@shared/field-sync/review-queue';
import type { Actor } from '../auth/actor';
import type { Database } from '../db/database';
import { interviews } from '../db/schema';
import { HttpError } from '../http/http-error';

/**
 * Accepts several interviews of one study in one decision. Every id must be an interview of the
 * study, or nothing is accepted (the answer names the first stranger); interviews already
 * accepted keep their earlier reviewer and time.
 */
export async function bulkAccept(
  db: Database,
  studyId: string,
  body: BulkAcceptBody,
  reviewer: Actor,
): Promise<BulkAcceptResult> {
  const ids = [...new Set(body.interviewIds.map((id) => id.toLowerCase()))];
  return db.transaction(async (tx) => {
    const found = await tx
      .select({ id: interviews.id })
      .from(interviews)
      .where(and(eq(interviews.studyId, studyId), inArray(interviews.id, ids)))
      .for('update');
    const known = new Set(found.map((row) => row.id));
    const strangerIndex = body.interviewIds.findIndex((id) => !known.has(id.toLowerCase()));
    if (strangerIndex >= 0) {
      const message = 'No interview of this study has that id.';
      throw new HttpError(400, 'invalid-input', message, [
        { path: `interviewIds.${strangerIndex}`, message },
      ]);
    }
    const accepted = await tx
      .update(interviews)
      .set({
        status: 'accepted',
        reviewNote: null,
        reviewedBy: reviewer.userId,
        reviewedAt: new Date(),
      })
      .where(
        and(
          eq(interviews.studyId, studyId),
          inArray(interviews.id, ids),
          ne(interviews.status, 'accepted'),
        ),
      )
      .returning({ id: interviews.id });
    return { accepted: accepted.length, alreadyAccepted: ids.length - accepted.length };
  });
}
