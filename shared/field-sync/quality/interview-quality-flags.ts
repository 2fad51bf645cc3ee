import type { InterviewAnswers } from '../../questionnaire/answer';
import type { QuestionnaireDefinition } from '../../questionnaire/questionnaire-definition';
import type { GpsFix } from '../field-interview';
import { gpsFarFlag, interviewFix } from './gps-far-flag';
import type { LatLng } from './great-circle-distance';
import type { QualityFlag } from './quality-flag';
import { straightLiningFlags } from './straight-lining-flags';
import { thresholdOrderFlags } from './threshold-order-flags';
import { tooShortFlag } from './too-short-flag';

/** What the checks look at: the interview, its questionnaire and its point. */
export interface QualityInput {
  definition: QuestionnaireDefinition;
  answers: InterviewAnswers;
  startedAt: string;
  finishedAt: string;
  gps?: GpsFix;
  point: LatLng;
  /** Other interviews of the study with the same respondent key (found by the server). */
  sameRespondentIds: readonly string[];
}

/**
 * Every automatic quality flag of one interview, in a fixed order: too short, straight-lining,
 * GPS far from the point, thresholds out of order, duplicate respondent. An interview with any
 * flag goes to the review queue as `flagged`.
 */
export function interviewQualityFlags(input: QualityInput): QualityFlag[] {
  const { blocks } = input.definition;
  const answered = blocks.filter((block) => input.answers[block.id] !== undefined).length;
  const flags: (QualityFlag | null)[] = [
    tooShortFlag(input.startedAt, input.finishedAt, answered),
    ...straightLiningFlags(blocks, input.answers),
    gpsFarFlag(interviewFix(input.gps, blocks, input.answers), input.point),
    ...thresholdOrderFlags(blocks, input.answers),
    input.sameRespondentIds.length > 0
      ? { kind: 'duplicate-respondent', otherInterviewIds: [...input.sameRespondentIds] }
      : null,
  ];
  return flags.filter((flag): flag is QualityFlag => flag !== null);
}
