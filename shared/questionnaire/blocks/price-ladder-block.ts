import { z } from 'zod';
import { positiveMinorSchema } from '../../money/minor-amount';
import type { AmountWords } from '../../money/amount-words';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape, requireIncreasing } from '../block-common';

/** The order in which the ladder's prices are put to the respondent. */
export const ladderOrders = ['ascending', 'descending', 'random-start'] as const;
/** A yes/no answer at each price, or purchase intent on a 5-point scale. */
export const ladderScales = ['yes-no', 'intent-5'] as const;

/**
 * Price ladder (Gabor–Granger): purchase intent at successive prices. The prices are listed
 * once, strictly increasing, in minor units; `order` says how the device walks them.
 */
export const priceLadderBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('price-ladder'),
    pricesMinor: z
      .array(positiveMinorSchema)
      .min(2, 'A ladder needs at least two prices')
      .max(20, 'A ladder has at most 20 prices'),
    order: z.enum(ladderOrders, { error: 'Choose ascending, descending or random start' }),
    scale: z.enum(ladderScales, { error: 'Choose a yes/no or a 5-point intent scale' }),
  })
  .superRefine((block, ctx) => requireIncreasing(block.pricesMinor, 'pricesMinor', 'Price', ctx));
export type PriceLadderBlock = z.infer<typeof priceLadderBlockSchema>;

const intentError = 'Choose an intent from 1 to 5 at each price';

/**
 * The answers given at the prices asked. Each price is answered at most once, and every price
 * must be settled: answered, or implied by the monotone rule the ladder is asked by (see
 * `openLadderPrices`), so a ladder may stop after the first "no" going up, and no sooner.
 * `words` writes the first price left open in the study's currency.
 */
export function priceLadderAnswerSchema(block: PriceLadderBlock, words?: AmountWords) {
  const response =
    block.scale === 'yes-no'
      ? z.enum(['yes', 'no'], { error: 'Answer yes or no at each price' })
      : z.int({ error: intentError }).min(1, intentError).max(5, intentError);
  const step = z.strictObject({
    priceMinor: z.int().refine((price) => block.pricesMinor.includes(price), {
      error: 'This price is not on the ladder',
    }),
    response,
  });
  return z.strictObject({
    steps: z
      .array(step, { error: 'Answer the prices on the ladder' })
      .refine((steps) => new Set(steps.map((s) => s.priceMinor)).size === steps.length, {
        error: 'A price is answered twice',
      })
      .superRefine((steps, ctx) => {
        const open = openLadderPrices(block, steps);
        if (open.length > 0) {
          ctx.addIssue({ code: 'custom', message: openPricesMessage(block, open, words) });
        }
      }),
  });
}
export type PriceLadderAnswer = z.infer<ReturnType<typeof priceLadderAnswerSchema>>;

const ladderKeys = ['steps'];
const stepKeys = ['priceMinor', 'response'];

/** The quick test of a price-ladder answer (see `answerFitsFor`). */
export function priceLadderAnswerFits(block: PriceLadderBlock) {
  const prices = new Set(block.pricesMinor);
  const fitsResponse =
    block.scale === 'yes-no'
      ? (response: unknown) => response === 'yes' || response === 'no'
      : (response: unknown) => isWholeBetween(response, 1, 5);
  return (answer: unknown) => {
    if (!isRecordWith(answer, ladderKeys)) return false;
    const steps = answer['steps'];
    if (!Array.isArray(steps) || steps.length === 0) return false;
    const asked = new Set<number>();
    for (let i = 0; i < steps.length; i++) {
      const step: unknown = steps[i];
      if (!isRecordWith(step, stepKeys) || !fitsResponse(step['response'])) return false;
      const price = step['priceMinor'];
      if (!Number.isSafeInteger(price) || !prices.has(price as number)) return false;
      asked.add(price as number);
    }
    return asked.size === steps.length && openLadderPrices(block, steps as Step[]).length === 0;
  };
}

type Step = PriceLadderAnswer['steps'][number];

/**
 * The ladder's prices, lowest first, that the steps leave open. Purchase intent does not rise
 * with the price, so a "no" (or intent 1) at one price holds at every higher price and a "yes"
 * (or intent 5) at every lower one: those need no asking. Every other price needs an answer.
 */
export function openLadderPrices(
  block: PriceLadderBlock,
  steps: readonly { readonly priceMinor: number; readonly response: unknown }[],
): number[] {
  const [lowest, highest] = block.scale === 'yes-no' ? ['no', 'yes'] : [1, 5];
  const answered = new Set<number>();
  let lowestRefused = Infinity;
  let highestCertain = -Infinity;
  for (const { priceMinor, response } of steps) {
    answered.add(priceMinor);
    if (response === lowest) lowestRefused = Math.min(lowestRefused, priceMinor);
    if (response === highest) highestCertain = Math.max(highestCertain, priceMinor);
  }
  return block.pricesMinor.filter(
    (price) => !answered.has(price) && price < lowestRefused && price > highestCertain,
  );
}

/** Names the open price asked first (the lowest but on a descending ladder) and counts the rest. */
function openPricesMessage(block: PriceLadderBlock, open: number[], words?: AmountWords): string {
  const rest = open.length - 1;
  if (!words) {
    return `Ask every price on the ladder: ${open.length} ${open.length === 1 ? 'price has' : 'prices have'} no answer`;
  }
  const first = block.order === 'descending' ? open[open.length - 1] : open[0];
  const more = rest === 0 ? ' has' : ` and ${rest} more have`;
  return `Ask every price on the ladder: ${words(first)}${more} no answer`;
}
