import { householdSizeGroup, notStatedLevel } from '@shared/analysis/weighting-spec';
import type { RakingVariable } from '@shared/analysis/weighting-spec';
import type { IncomeBandAnswer } from '@shared/questionnaire/blocks/income-band-block';
import type { HouseholdSizeAnswer } from '@shared/questionnaire/blocks/household-size-block';
import { answeredBlock, toMajor, type AnalysisInterview } from './analysis-interview';

/** What the analysis knows of a respondent apart from their pricing answers. */
export interface RespondentProfile {
  /** Midpoint of the income band in major units per the band's period; null when not stated. */
  readonly income: number | null;
  readonly householdSize: number | null;
  /** The level of each raking variable (`not-stated` when unanswered). */
  readonly levels: Readonly<Record<RakingVariable, string>>;
}

/**
 * Reads income band, household size and region. An open top band has no midpoint: it is taken
 * as 1.5 × its lower bound (a stated rule of the product, common practice; change it here).
 */
export function respondentProfile(interview: AnalysisInterview, digits: number): RespondentProfile {
  const income = answeredBlock(interview, 'income-band');
  const household = answeredBlock(interview, 'household-size');
  const bandValue = (income?.answer as IncomeBandAnswer | undefined)?.band ?? null;
  const band = income?.block.bands.find((b) => b.value === bandValue);
  const midpointMinor = band
    ? band.toMinor === undefined
      ? band.fromMinor * 1.5
      : (band.fromMinor + band.toMinor) / 2
    : null;
  const people = (household?.answer as HouseholdSizeAnswer | undefined)?.people ?? null;
  return {
    income: midpointMinor === null ? null : toMajor(midpointMinor, digits),
    householdSize: people,
    levels: {
      'income-band': band?.value ?? notStatedLevel,
      region: interview.region ?? notStatedLevel,
      'household-size': people === null ? notStatedLevel : householdSizeGroup(people),
    },
  };
}
