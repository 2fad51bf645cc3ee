import type { AnalysisMethod } from '@shared/analysis/analysis-method';
import { notStatedLevel, type RakingVariable } from '@shared/analysis/weighting-spec';
import type { RowsByMethod } from '../analysis-dataset';
import type { RespondentProfile } from '../respondent-profile';

/** The stated-preference methods, the ones a frequency table serves. */
export type StatedMethod = Exclude<AnalysisMethod, 'observed-prices'>;

/** A row's answers without the respondent: what respondents in one cell have in common. */
export type StatedPattern<M extends StatedMethod> = Omit<RowsByMethod[M], 'interviewId' | 'count'>;

/** One respondent's answers and raking levels (levels null when the fit does not rake). */
export interface StatedRespondent<M extends StatedMethod> {
  readonly pattern: StatedPattern<M>;
  readonly levels: Readonly<Record<RakingVariable, string>> | null;
  readonly count: number;
}

/** Levels of a respondent that the fit does not rake: never read, stated as such. */
const unusedLevels: Readonly<Record<RakingVariable, string>> = {
  'income-band': notStatedLevel,
  region: notStatedLevel,
  'household-size': notStatedLevel,
};

/**
 * The frequency table of a method's answers: respondents who answered alike and share their
 * raking levels merged into one cell, cells in a fixed order (by their canonical key), each a
 * row named `cell N` that stands for `count` respondents. The database and the in-memory oracle
 * both end here, so the same answers give the same table and so the same resamples.
 */
export function frequencyTable<M extends StatedMethod>(
  respondents: Iterable<StatedRespondent<M>>,
): { rows: RowsByMethod[M][]; profiles: Map<string, RespondentProfile> } {
  const cells = new Map<string, StatedRespondent<M>>();
  for (const respondent of respondents) {
    const key = JSON.stringify([respondent.pattern, respondent.levels]);
    const cell = cells.get(key);
    cells.set(key, cell ? { ...cell, count: cell.count + respondent.count } : respondent);
  }
  const keys = [...cells.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const rows: RowsByMethod[M][] = [];
  const profiles = new Map<string, RespondentProfile>();
  keys.forEach((key, k) => {
    const cell = cells.get(key)!;
    const interviewId = `cell ${k + 1}`;
    rows.push({ ...cell.pattern, interviewId, count: cell.count } as unknown as RowsByMethod[M]);
    profiles.set(interviewId, {
      income: null,
      householdSize: null,
      levels: cell.levels ?? unusedLevels,
    });
  });
  return { rows, profiles };
}
