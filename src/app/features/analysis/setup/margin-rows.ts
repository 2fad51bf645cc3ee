import {
  householdSizeGroup,
  notStatedLevel,
  type RakingVariable,
} from '@shared/analysis/weighting-spec';
import type { MarginRow } from './fit-setup-values';

/** A level a respondent can fall in, with words to show for it. */
export interface LevelChoice {
  readonly value: string;
  readonly label: string;
}

/** Household sizes in the groups population figures use (see `householdSizeGroup`). */
export const householdLevels: readonly LevelChoice[] = [1, 3, 5, 7].map((people) => {
  const value = householdSizeGroup(people);
  return { value, label: `${value} people` };
});

/** The levels known for each variable, given the study's income bands and regions. */
export function knownLevels(
  variable: RakingVariable,
  incomeBands: readonly LevelChoice[],
  regions: readonly string[],
): readonly LevelChoice[] {
  switch (variable) {
    case 'income-band':
      return incomeBands;
    case 'region':
      return regions.map((region) => ({ value: region, label: region }));
    case 'household-size':
      return householdLevels;
  }
}

/**
 * The table with a margin for `variable` added: one row per known level with no target yet, or
 * a single empty row when no level is known. A variable already in the table is left as it is.
 */
export function withMarginFor(
  rows: readonly MarginRow[],
  variable: RakingVariable,
  levels: readonly LevelChoice[],
): MarginRow[] {
  if (rows.some((row) => row.variable === variable)) return [...rows];
  const added = (levels.length ? levels.map((l) => l.value) : ['']).map(
    (level): MarginRow => ({ variable, level, targetPercent: null }),
  );
  return [...rows, ...added];
}

/** Sum of the targets entered per variable, in table order: they should come to 100 %. */
export function targetTotals(
  rows: readonly MarginRow[],
): { variable: RakingVariable; total: number }[] {
  const totals = new Map<RakingVariable, number>();
  for (const row of rows) {
    totals.set(row.variable, (totals.get(row.variable) ?? 0) + (row.targetPercent ?? 0));
  }
  return [...totals].map(([variable, total]) => ({ variable, total }));
}

/** The level respondents without an answer fall in, offered alongside the known levels. */
export const notStatedChoice: LevelChoice = { value: notStatedLevel, label: 'Not stated' };
