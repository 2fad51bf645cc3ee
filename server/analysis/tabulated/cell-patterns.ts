import {
  householdSizeGroup,
  notStatedLevel,
  type RakingVariable,
} from '@shared/analysis/weighting-spec';
import { toMajor } from '../analysis-interview';
import type { CellRecord } from './stated-cells-query';
import type { StatedMethod, StatedPattern, StatedRespondent } from './stated-cell';

type Read = (cell: CellRecord, digits: number) => StatedPattern<StatedMethod>;

const major = (value: unknown, digits: number) => toMajor(Number(value), digits);
const majorOrNull = (value: unknown, digits: number) =>
  value === null ? null : major(value, digits);

/** A cell's answers as the in-memory rows hold them (major units, the same property order). */
const readers: Readonly<Record<StatedMethod, Read>> = {
  'price-ladder': (cell, digits) => ({
    scale: cell['scale'] as 'yes-no' | 'intent-5',
    steps: String(cell['steps'])
      .split(',')
      .map((pair) => {
        const [price, buy] = pair.split(':');
        return { price: major(price, digits), buy: Number(buy) };
      }),
  }),
  'price-thresholds': (cell, digits) => ({
    tooCheap: major(cell['too_cheap'], digits),
    cheap: major(cell['cheap'], digits),
    expensive: major(cell['expensive'], digits),
    tooExpensive: major(cell['too_expensive'], digits),
    likelihoodCheap: cell['likelihood_cheap'] as number | null,
    likelihoodExpensive: cell['likelihood_expensive'] as number | null,
  }),
  'wtp-open': (cell, digits) => ({ amount: major(cell['amount'], digits) }),
  'payment-card': (cell, digits) => ({
    lower: major(cell['lower'], digits),
    upper: majorOrNull(cell['upper'], digits),
  }),
  'dichotomous-choice': (cell, digits) => ({
    bid: major(cell['bid'], digits),
    yes: cell['yes'] as boolean,
    bid2: majorOrNull(cell['bid2'], digits),
    yes2: cell['yes2'] as boolean | null,
  }),
};

/** The database's cells as respondents of the frequency table (levels only when raking). */
export function cellRespondents<M extends StatedMethod>(
  method: M,
  cells: readonly CellRecord[],
  digits: number,
  rakes: boolean,
): StatedRespondent<M>[] {
  return cells.map((cell) => ({
    pattern: readers[method](cell, digits) as StatedPattern<M>,
    levels: rakes ? levelsOf(cell) : null,
    count: cell.n,
  }));
}

/** The raking levels as the respondent profile names them. */
function levelsOf(cell: CellRecord): Record<RakingVariable, string> {
  return {
    'income-band': cell.income_band ?? notStatedLevel,
    region: cell.region ?? notStatedLevel,
    'household-size':
      cell.household_people === null ? notStatedLevel : householdSizeGroup(cell.household_people),
  };
}
