import { z } from 'zod';
import { positiveMinorSchema } from '../../money/minor-amount';
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

/**
 * The answers given at the prices asked. A ladder may stop early (after the first "no" going
 * up, say), so not every price needs an answer, but each price is answered at most once.
 */
export function priceLadderAnswerSchema(block: PriceLadderBlock) {
  const response =
    block.scale === 'yes-no'
      ? z.enum(['yes', 'no'], { error: 'Answer yes or no' })
      : z.int().min(1, 'Intent runs from 1 to 5').max(5, 'Intent runs from 1 to 5');
  const step = z.strictObject({
    priceMinor: z.int().refine((price) => block.pricesMinor.includes(price), {
      error: 'This price is not on the ladder',
    }),
    response,
  });
  return z.strictObject({
    steps: z
      .array(step)
      .min(1, 'Answer at least one price')
      .refine((steps) => new Set(steps.map((s) => s.priceMinor)).size === steps.length, {
        error: 'A price is answered twice',
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
    return asked.size === steps.length;
  };
}
