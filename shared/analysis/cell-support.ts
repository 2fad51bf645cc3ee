import { smallest } from '../estimation/numerics/extent';
/** No published cell may rest on fewer respondents than this (the product's privacy rule). */
export const minimumCellRespondents = 5;

/**
 * What one respondent's answers say about prices: the prices they were asked at or stated
 * (`points`), or a price range their answers describe (`range`, e.g. too cheap … too expensive).
 */
export interface RespondentEvidence {
  readonly points?: readonly number[];
  readonly range?: { readonly low: number; readonly high: number };
  /** Respondents with exactly this evidence (default 1): a frequency table's cell. */
  readonly count?: number;
}

const respondentsIn = (evidence: readonly RespondentEvidence[]) =>
  evidence.reduce((s, e) => s + (e.count ?? 1), 0);

/**
 * How many respondents each grid price of a schedule rests on. The rule:
 * - every grid price owns a cell reaching halfway to its neighbours (the end cells reach as far
 *   outwards as inwards); a respondent informs the price when one of their `points` lies in the
 *   cell (cells are half-open, so a point counts in one cell only);
 * - with `designLevels` (ladder prices, bids, card amounts: prices fixed by the questionnaire) a
 *   cell holding no design level borrows the nearest level (the smaller count on a tie), so a fine
 *   grid between two ladder prices rests on the respondents asked at the nearer one;
 * - a respondent with a `range` informs every grid price inside it (a Newton–Miller–Smith trial
 *   curve at a price is the mean over the respondents whose thresholds span it).
 */
export function cellSupport(
  grid: readonly number[],
  evidence: readonly RespondentEvidence[],
  designLevels?: readonly number[],
): number[] {
  return grid.map((price, i) => {
    const { low, high, last } = cellOf(grid, i);
    const inCell = (p: number) => p >= low && (last ? p <= high : p < high);
    const ranged = evidence.filter((e) => e.range && e.range.low <= price && price <= e.range.high);
    const pointed = evidence.filter((e) => !e.range);
    if (!designLevels)
      return respondentsIn(ranged) + respondentsIn(pointed.filter((e) => e.points?.some(inCell)));
    const levels = designLevels.filter(inCell);
    const askedAt = (level: number) =>
      respondentsIn(pointed.filter((e) => e.points?.includes(level)));
    if (levels.length > 0) {
      return (
        respondentsIn(ranged) +
        respondentsIn(pointed.filter((e) => e.points?.some((p) => levels.includes(p))))
      );
    }
    const distance = smallest(designLevels.map((level) => Math.abs(level - price)));
    const nearest = designLevels.filter((level) => Math.abs(level - price) === distance);
    return respondentsIn(ranged) + smallest(nearest.map(askedAt));
  });
}

function cellOf(grid: readonly number[], i: number) {
  const step = (j: number) => grid[j + 1] - grid[j];
  const below = i > 0 ? step(i - 1) : step(0);
  const above = i < grid.length - 1 ? step(i) : step(grid.length - 2);
  return { low: grid[i] - below / 2, high: grid[i] + above / 2, last: i === grid.length - 1 };
}

/** The rows of a schedule that rest on too few respondents to publish. */
export function cellsBelowMinimum<R extends { price: number; respondents: number }>(
  rows: readonly R[],
): R[] {
  return rows.filter((row) => row.respondents < minimumCellRespondents);
}
