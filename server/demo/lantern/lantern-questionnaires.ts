import type { Block } from '@shared/questionnaire/block';

const consent = (prompt: string): Block => ({
  id: 'consent',
  kind: 'consent',
  prompt,
  statement:
    'Your answers are used only for this study of solar lantern prices. You may stop at any time or skip any question.',
  required: true,
});

/** The shop visit: the lantern's shelf price and units sold over the last 7 days. */
export const shelfCheckBlocks: Block[] = [
  consent('May I record the price and sales of solar lanterns in this shop?'),
  {
    id: 'lantern_shelf',
    kind: 'shelf-observation',
    prompt: 'Record the single-LED solar lantern as it is on the shelf.',
    required: true,
    packUnit: 'piece',
    measure: 'units-sold',
    periodDays: 7,
    photo: 'none',
  },
];

/** KES amounts in minor units (cents). */
const kes = (amount: number) => amount * 100;

export const ladderPrices = [800, 1100, 1400, 1700, 2000, 2300, 2600];
export const cardAmounts = [500, 750, 1000, 1250, 1500, 1750, 2000, 2500, 3000];
export const bidLevels = [
  { bid: 900, afterYes: 1300, afterNo: 600 },
  { bid: 1200, afterYes: 1600, afterNo: 900 },
  { bid: 1500, afterYes: 1900, afterNo: 1100 },
  { bid: 1800, afterYes: 2300, afterNo: 1400 },
  { bid: 2100, afterYes: 2700, afterNo: 1600 },
];
export const incomeBands = [
  { value: 'under-10k', label: 'Below 10,000', from: 0, to: 10000 },
  { value: '10k-25k', label: '10,000 to 25,000', from: 10000, to: 25000 },
  { value: '25k-50k', label: '25,000 to 50,000', from: 25000, to: 50000 },
  { value: 'over-50k', label: 'Above 50,000', from: 50000 },
];

/** The household interview: who they are, then every stated-preference question once. */
export const householdBlocks: Block[] = [
  consent('May I ask you some questions about solar lanterns? It takes about ten minutes.'),
  {
    id: 'household',
    kind: 'household-size',
    prompt: 'How many people live and eat in this household?',
    required: true,
    maxPeople: 20,
  },
  {
    id: 'income',
    kind: 'income-band',
    prompt: 'Which band is the household’s income in, per month (KES)?',
    required: false,
    period: 'month',
    allowDecline: true,
    bands: incomeBands.map((b) => ({
      value: b.value,
      label: b.label,
      fromMinor: kes(b.from),
      ...(b.to === undefined ? {} : { toMinor: kes(b.to) }),
    })),
  },
  {
    id: 'ladder',
    kind: 'price-ladder',
    prompt: 'Would you buy this solar lantern at this price?',
    required: true,
    pricesMinor: ladderPrices.map(kes),
    order: 'ascending',
    scale: 'yes-no',
  },
  {
    id: 'thresholds',
    kind: 'price-thresholds',
    prompt: 'Think about the price of this solar lantern.',
    required: true,
    askLikelihood: true,
    maxPriceMinor: kes(20000),
  },
  {
    id: 'most_pay',
    kind: 'wtp-open',
    prompt: 'What is the most you would pay for it?',
    required: true,
    minMinor: 0,
    maxMinor: kes(20000),
  },
  {
    id: 'card',
    kind: 'payment-card',
    prompt: 'Which is the highest amount on this card you would surely pay?',
    required: true,
    amountsMinor: cardAmounts.map(kes),
  },
  {
    id: 'bid',
    kind: 'dichotomous-choice',
    prompt: 'Would you buy it at this price?',
    required: true,
    bounds: 'double',
    bidDesign: {
      levels: bidLevels.map((l) => ({
        bidMinor: kes(l.bid),
        afterYesMinor: kes(l.afterYes),
        afterNoMinor: kes(l.afterNo),
      })),
    },
  },
];
