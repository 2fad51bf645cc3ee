import type { FieldIssue } from '@shared/http/api-error';
import type { SyncRejectionCode, SyncRejected } from '@shared/field-sync/sync-batch';

/** Why one interview of a batch is refused, before its position in the batch is added. */
export type Rejection = Omit<SyncRejected, 'index' | 'id' | 'outcome'>;

const summaries: Record<SyncRejectionCode, string> = {
  'invalid-interview': 'The interview record is not valid',
  'unknown-version': 'The questionnaire version is not a published version of this study',
  'not-assigned': 'The interview is not on a route assigned to you',
  'invalid-answers': 'Some answers do not fit their questions',
  'no-consent': 'The respondent did not consent, so nothing may be kept',
  'photo-manifest': 'The photo list does not match the answers',
  'id-conflict': 'Another interview already has this id',
  'repeated-in-batch': 'This interview id is sent twice in the batch',
  unstorable: 'The database could not store this interview',
};

/** A rejection whose message sums up its issues: "Some answers … — answers.ladder: …". */
export function rejection(code: SyncRejectionCode, issues: FieldIssue[]): Rejection {
  const detail = issues
    .slice(0, 3)
    .map((issue) => `${issue.path}: ${issue.message}`)
    .join('; ');
  const more = issues.length > 3 ? ` (and ${issues.length - 3} more)` : '';
  return {
    code,
    message: detail ? `${summaries[code]} — ${detail}${more}` : summaries[code],
    issues,
  };
}
