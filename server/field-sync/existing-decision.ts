import type { InterviewStatus } from '@shared/interviews/interview-status';
import type { ExistingInterview } from './existing-interviews';
import { rejection, type Rejection } from './sync-rejection';

const takenMessage =
  'This id is already stored with different content; it is not overwritten — make a new id on the device';

/** What to do with a synced interview whose id is already stored. */
export type ExistingDecision =
  | { kind: 'duplicate'; status: InterviewStatus }
  | { kind: 'resubmit' }
  | { kind: 'rejected'; rejection: Rejection };

/**
 * Nothing stored is ever overwritten, with one exception: an interview a supervisor returned
 * takes its enumerator's corrected submission — one whose content differs, or which names the
 * return it answers (`returnedAt`), so unchanged answers can be confirmed. The same content
 * again is a duplicate; anything else reusing the id is refused as an id conflict.
 *
 * An id held by another enumerator's interview is answered word for word like any other
 * conflict, so a device cannot learn from the answer that someone else's interview exists.
 */
export function decideOnExisting(
  existing: ExistingInterview,
  submission: { enumeratorId: string; studyId: string; fingerprint: string; returnedAt?: string },
): ExistingDecision {
  const conflict = (message: string): ExistingDecision => ({
    kind: 'rejected',
    rejection: rejection('id-conflict', [{ path: 'id', message }]),
  });
  if (
    existing.enumeratorId !== submission.enumeratorId ||
    existing.studyId !== submission.studyId
  ) {
    return conflict(takenMessage);
  }
  const same = existing.fingerprint === submission.fingerprint;
  const answersReturn =
    submission.returnedAt !== undefined &&
    existing.reviewedAt !== null &&
    Date.parse(submission.returnedAt) === existing.reviewedAt.getTime();
  if (existing.status === 'returned' && (!same || answersReturn)) return { kind: 'resubmit' };
  if (same) return { kind: 'duplicate', status: existing.status };
  return conflict(
    existing.status === 'returned'
      ? 'This interview was returned; send the correction with the same id'
      : takenMessage,
  );
}
