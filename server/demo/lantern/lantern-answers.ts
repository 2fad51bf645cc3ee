import { gaussian } from '@shared/estimation/random/gaussian';
import { bidLevels, cardAmounts, incomeBands, ladderPrices } from './lantern-questionnaires';
import { lanternTruths, type LanternRegion } from './lantern-truths';

type Uniform = () => number;
const cents = (kes: number) => Math.round(kes * 100);
const roundTo = (value: number, step: number) => Math.round(value / step) * step;
const between = (uniform: Uniform, low: number, high: number) => low + (high - low) * uniform();

/** One shop visit's answers: a shelf price and units sold in 7 days from the constant-elasticity truth. */
export function shelfAnswers(uniform: Uniform, region: LanternRegion): Record<string, unknown> {
  const normal = gaussian(uniform);
  const { min, max } = lanternTruths.shelfPriceRange;
  const price = roundTo(between(uniform, min, max), 10);
  const mean =
    lanternTruths.shelfScaleByRegion[region] * (price / 1000) ** lanternTruths.shelfElasticity;
  const units = Math.max(1, Math.round(mean * Math.exp(lanternTruths.shelfNoiseSd * normal())));
  return {
    consent: { agreed: true },
    lantern_shelf: { priceMinor: cents(price), packSize: 1, quantity: units },
  };
}

/** Income-band shares of the sample by region (the sample over-represents some bands). */
const incomeMix: Record<LanternRegion, number[]> = {
  'North shore': [0.15, 0.35, 0.35, 0.15],
  'South shore': [0.3, 0.4, 0.2, 0.1],
  'Hill villages': [0.5, 0.3, 0.15, 0.05],
};

function pick<T>(uniform: Uniform, items: readonly T[], shares: readonly number[]): T {
  let u = uniform();
  for (let i = 0; i < items.length; i++) {
    u -= shares[i];
    if (u < 0) return items[i];
  }
  return items[items.length - 1];
}

/**
 * One household's answers, every stated-preference question answered from the same logistic
 * willingness to pay (median and scale in `lanternTruths`), so each method can recover it.
 */
export function householdAnswers(
  uniform: Uniform,
  region: LanternRegion,
  index: number,
): Record<string, unknown> {
  const u = Math.min(Math.max(uniform(), 1e-9), 1 - 1e-9);
  const wtp = lanternTruths.wtpMedian + lanternTruths.wtpScale * Math.log(u / (1 - u));
  const people = 1 + Math.floor(uniform() * 8);
  const band = uniform() < 0.08 ? null : pick(uniform, incomeBands, incomeMix[region]).value;
  const level = bidLevels[index % bidLevels.length];
  const firstYes = wtp >= level.bid;
  const followUp = firstYes ? level.afterYes : level.afterNo;
  const highest = cardAmounts.filter((a) => a <= wtp).pop();
  return {
    consent: { agreed: true },
    household: { people },
    income: { band },
    ladder: {
      steps: ladderPrices.map((price) => ({
        priceMinor: cents(price),
        response: wtp >= price ? 'yes' : 'no',
      })),
    },
    thresholds: thresholdAnswers(uniform, wtp),
    most_pay: { amountMinor: cents(Math.min(20000, Math.max(0, roundTo(wtp, 50)))) },
    card: { highestYesMinor: highest === undefined ? null : cents(highest) },
    bid: {
      bidMinor: cents(level.bid),
      firstResponse: firstYes ? 'yes' : 'no',
      followUpMinor: cents(followUp),
      secondResponse: wtp >= followUp ? 'yes' : 'no',
    },
  };
}

/** Thresholds around the respondent's WTP: expensive near it, the others in proportion. */
function thresholdAnswers(uniform: Uniform, wtp: number) {
  const base = Math.max(wtp, 200);
  const tooCheap = roundTo(base * between(uniform, 0.3, 0.45), 50);
  const cheap = Math.max(tooCheap, roundTo(base * between(uniform, 0.6, 0.75), 50));
  const expensive = Math.max(cheap, roundTo(base * between(uniform, 0.95, 1.05), 50));
  const tooExpensive = Math.max(expensive, roundTo(base * between(uniform, 1.2, 1.4), 50));
  return {
    tooCheapMinor: cents(tooCheap),
    cheapMinor: cents(cheap),
    expensiveMinor: cents(expensive),
    tooExpensiveMinor: cents(Math.min(tooExpensive, 20000)),
    likelihoodCheap: uniform() < 0.6 ? 5 : 4,
    likelihoodExpensive: uniform() < 0.5 ? 3 : 2,
  };
}
