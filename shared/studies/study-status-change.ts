import { z } from 'zod';
import { type StudyStatus, studyStatuses } from './study-status';

export const studyStatusSchema = z.enum(studyStatuses, {
  error: 'Use draft, in_field or closed',
});

/** Body of `POST /api/studies/:studyId/status`. */
export const studyStatusChangeSchema = z.strictObject({ status: studyStatusSchema });
export type StudyStatusChange = z.infer<typeof studyStatusChangeSchema>;

/** Words people read for each status. */
export const studyStatusLabels: Readonly<Record<StudyStatus, string>> = {
  draft: 'Draft',
  in_field: 'In the field',
  closed: 'Closed',
};

/** The one status each status may move to: draft → in the field → closed. */
export const nextStudyStatus: Readonly<Record<StudyStatus, StudyStatus | null>> = {
  draft: 'in_field',
  in_field: 'closed',
  closed: null,
};

/**
 * Why a study may not move from `from` to `to`, or null when it may. Going into the field
 * needs a published questionnaire version, since every interview points at one.
 */
export function studyStatusChangeProblem(
  from: StudyStatus,
  to: StudyStatus,
  hasPublishedQuestionnaire: boolean,
): string | null {
  if (from === to) return `The study is already ${studyStatusLabels[to].toLowerCase()}`;
  if (nextStudyStatus[from] !== to) {
    return from === 'closed'
      ? 'A closed study cannot be reopened'
      : `A study that is ${studyStatusLabels[from].toLowerCase()} can only move to ${studyStatusLabels[nextStudyStatus[from] ?? from].toLowerCase()}`;
  }
  if (to === 'in_field' && !hasPublishedQuestionnaire) {
    return 'Publish a questionnaire version before the study goes into the field';
  }
  return null;
}
