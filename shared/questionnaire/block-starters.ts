import type { Block } from './block';
import type { BlockKind } from './block-kind';

type Starter = { [K in BlockKind]: Omit<Extract<Block, { kind: K }>, 'id' | 'kind'> };

/**
 * The settings a newly added block starts with: each passes validation as it stands, so the
 * editor never shows a fresh block as broken, and only the words need the researcher's care.
 * Money amounts are minor units; without a price range they are only placeholders.
 */
const starters: Starter = {
  consent: {
    prompt: 'May I ask you some questions about what you buy? It takes about ten minutes.',
    statement:
      'Your answers are used only for this study. You may stop at any time or skip any question.',
    required: true,
  },
  'price-ladder': {
    prompt: 'Would you buy it at this price?',
    required: true,
    pricesMinor: [100, 150, 200, 250, 300],
    order: 'ascending',
    scale: 'yes-no',
  },
  'price-thresholds': {
    prompt: 'Think about the price of the product.',
    required: true,
    askLikelihood: false,
    maxPriceMinor: 100000,
  },
  'wtp-open': {
    prompt: 'What is the most you would pay for it?',
    required: true,
    minMinor: 0,
    maxMinor: 100000,
  },
  'payment-card': {
    prompt: 'Which is the highest amount you would surely pay?',
    required: true,
    amountsMinor: [50, 100, 200, 400, 800],
  },
  'dichotomous-choice': {
    prompt: 'Would you buy it at this price?',
    required: true,
    bounds: 'single',
    bidDesign: { levels: [{ bidMinor: 100 }, { bidMinor: 200 }, { bidMinor: 300 }] },
  },
  'shelf-observation': {
    prompt: 'Record the product as it is on the shelf.',
    required: true,
    packUnit: 'piece',
    measure: 'units-sold',
    periodDays: 7,
    photo: 'optional',
  },
  'purchase-recall': {
    prompt: 'How many did your household buy in the last 30 days?',
    required: true,
    periodDays: 30,
    askPricePaid: true,
    maxUnits: 1000,
  },
  'household-size': {
    prompt: 'How many people live and eat in this household?',
    required: true,
    maxPeople: 30,
  },
  'income-band': {
    prompt: 'Which band is the household’s income in, per month?',
    required: false,
    period: 'month',
    allowDecline: true,
    bands: [
      { value: 'low', label: 'Below 100,000', fromMinor: 0, toMinor: 10000000 },
      { value: 'middle', label: '100,000 to 300,000', fromMinor: 10000000, toMinor: 30000000 },
      { value: 'high', label: 'Above 300,000', fromMinor: 30000000 },
    ],
  },
  location: {
    prompt: 'Record where this interview takes place.',
    required: true,
    targetAccuracyMetres: 50,
  },
  photo: {
    prompt: 'Photograph the price tag.',
    required: false,
    subject: 'The price tag and the shelf — no people',
    maxPhotos: 1,
  },
  'single-choice': {
    prompt: 'Choose one.',
    required: true,
    options: [
      { value: 'yes', label: 'Yes' },
      { value: 'no', label: 'No' },
    ],
  },
  'multiple-choice': {
    prompt: 'Choose all that apply.',
    required: true,
    options: [
      { value: 'first', label: 'First option' },
      { value: 'second', label: 'Second option' },
      { value: 'third', label: 'Third option' },
    ],
    minChosen: 1,
    maxChosen: 3,
  },
  number: { prompt: 'How many?', required: true, min: 0, max: 1000, wholeNumber: true },
  text: { prompt: 'Anything else to add?', required: false, maxLength: 500, multiline: true },
};

/** The study's price range (minor units, lowest below highest) that money starters follow. */
export interface StarterPriceRange {
  readonly priceMinMinor: number;
  readonly priceMaxMinor: number;
}

/**
 * A fresh block of `kind` with the given id. With the study's price range, the amounts of the
 * money blocks are laid out from it, so a researcher who keeps them still asks about the
 * prices the study is about, and open answers are not capped below the study's top price.
 */
export function starterBlock(kind: BlockKind, id: string, prices?: StarterPriceRange): Block {
  const fitted = prices && isRange(prices) ? rangeStarters(prices)[kind] : undefined;
  return structuredClone({ id, kind, ...starters[kind], ...fitted }) as Block;
}

type MoneyKind = 'price-ladder' | 'payment-card' | 'dichotomous-choice' | 'wtp-open';
type RangeStarter = { [K in MoneyKind | 'price-thresholds']: Partial<Starter[K]> };

function rangeStarters({ priceMinMinor: low, priceMaxMinor: high }: StarterPriceRange) {
  // Open answers reach well past the top price: a cap at it would censor the very answers
  // that say the product is worth more than the study assumed.
  const ceiling = tidy(high * 3, 'up');
  const fitted: RangeStarter = {
    'price-ladder': { pricesMinor: tidySpread(low, high, 6) },
    'payment-card': {
      amountsMinor: tidySpread(tidy(low / 2, 'down'), tidy(high * 1.5, 'up'), 8),
    },
    'dichotomous-choice': {
      bidDesign: { levels: tidySpread(low, high, 5).map((bidMinor) => ({ bidMinor })) },
    },
    'wtp-open': { minMinor: 0, maxMinor: ceiling },
    'price-thresholds': { maxPriceMinor: ceiling },
  };
  return fitted as Partial<Record<BlockKind, object>>;
}

function isRange({ priceMinMinor: low, priceMaxMinor: high }: StarterPriceRange): boolean {
  return Number.isSafeInteger(low) && Number.isSafeInteger(high) && low >= 1 && high > low;
}

/** `amount` to two significant digits, rounded the given way, within what can be stored. */
function tidy(amount: number, way: 'up' | 'down'): number {
  const unit = 10 ** Math.max(0, Math.floor(Math.log10(Math.max(amount, 1))) - 1);
  const rounded = (way === 'up' ? Math.ceil(amount / unit) : Math.floor(amount / unit)) * unit;
  return Math.min(Math.max(1, rounded), Number.MAX_SAFE_INTEGER);
}

/**
 * `low`, `high`, and between them the multiples of the finest tidy step (1, 2, 2.5, 5 × 10ⁿ)
 * that keeps the list to `most` amounts; a multiple crowding either end is left out.
 */
function tidySpread(low: number, high: number, most: number): number[] {
  for (const step of tidySteps(Math.floor((high - low) / (2 * most)))) {
    const amounts = [low];
    for (let at = (Math.floor(low / step) + 1) * step; at < high; at += step) {
      if (at - low >= step / 3 && high - at >= step / 3) amounts.push(at);
    }
    amounts.push(high);
    if (amounts.length <= most) return amounts;
  }
  return [low, high];
}

function* tidySteps(from: number): Generator<number> {
  for (let scale = 1; scale <= Number.MAX_SAFE_INTEGER; scale *= 10) {
    for (const step of [scale, 2 * scale, 2.5 * scale, 5 * scale]) {
      if (Number.isInteger(step) && step >= from) yield step;
    }
  }
}

/** The first id of the form `price-ladder-2` that no block uses yet. */
export function freshBlockId(kind: BlockKind, taken: readonly string[]): string {
  const base = kind === 'consent' ? 'consent' : kind;
  if (!taken.includes(base)) return base;
  let n = 2;
  while (taken.includes(`${base}-${n}`)) n++;
  return `${base}-${n}`;
}
