import { interviewFilterSchema, type InterviewFilter } from '@shared/analysis/interview-filter';
import type { InterviewStatus } from '@shared/interviews/interview-status';
import { rawDataPath, rawDataQuery, type RawDataFormat } from '@shared/raw-data/raw-data-request';

/** What the raw-data card holds, as the form gives it (empty dates mean "no limit"). */
export interface RawDataChoices {
  readonly format: RawDataFormat;
  readonly states: readonly InterviewStatus[];
  readonly from: string;
  readonly to: string;
  readonly flagged: InterviewFilter['flagged'];
}

/** The download addresses for the choices, or why there is none yet. */
export type RawDataLinks =
  | { readonly ok: true; readonly file: string; readonly dictionary: string }
  | { readonly ok: false; readonly problem: string };

/**
 * The addresses of the interviews file and its dictionary, checked with the same schema the
 * server applies, so a choice the server would refuse never becomes a link.
 */
export function rawDataLinks(studyId: string, choices: RawDataChoices): RawDataLinks {
  if (choices.states.length === 0)
    return { ok: false, problem: 'Choose at least one review state' };
  const parsed = interviewFilterSchema.safeParse({
    flagged: choices.flagged,
    ...(choices.from ? { from: choices.from } : {}),
    ...(choices.to ? { to: choices.to } : {}),
  });
  if (!parsed.success) {
    return { ok: false, problem: parsed.error.issues[0]?.message ?? 'Check the dates' };
  }
  const query = rawDataQuery({ filter: parsed.data, states: choices.states });
  return {
    ok: true,
    file: `${rawDataPath(studyId, choices.format)}?${query}`,
    dictionary: `${rawDataPath(studyId, 'dictionary')}?${query}`,
  };
}
