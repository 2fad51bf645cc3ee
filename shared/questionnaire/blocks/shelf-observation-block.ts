import { z } from 'zod';
import { amountAnswerSchema } from '../../money/amount-answer';
import type { AmountWords } from '../../money/amount-words';
import { positiveMinorSchema } from '../../money/minor-amount';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

export const packUnits = ['g', 'kg', 'ml', 'l', 'piece'] as const;
export const shelfMeasures = ['units-sold', 'stock-on-hand'] as const;
export const photoRules = ['required', 'optional', 'none'] as const;

/**
 * Shelf observation: what a shop actually charges and sells. The enumerator records the shelf
 * price, the pack size, and either units sold over the last `periodDays` or the stock on hand,
 * with a photo of the price tag when `photo` asks for one. `maxPriceMinor` bounds the price the
 * device accepts, to catch a slipped digit (`defaultShelfPriceCapMinor` when not set).
 */
export const shelfObservationBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('shelf-observation'),
    packUnit: z.enum(packUnits, { error: 'Choose the unit of the pack size' }),
    measure: z.enum(shelfMeasures, { error: 'Choose units sold or stock on hand' }),
    periodDays: z.int().min(1, 'At least one day').max(366, 'At most 366 days').optional(),
    photo: z.enum(photoRules, { error: 'Say whether a price-tag photo is needed' }),
    maxPriceMinor: positiveMinorSchema.optional(),
  })
  .superRefine((block, ctx) => {
    if (block.measure === 'units-sold' && block.periodDays === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['periodDays'],
        message: 'Say over how many days units sold are counted',
      });
    }
    if (block.measure === 'stock-on-hand' && block.periodDays !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['periodDays'],
        message: 'Stock on hand is counted at the visit; leave the period out',
      });
    }
  });
export type ShelfObservationBlock = z.infer<typeof shelfObservationBlockSchema>;

/**
 * The highest shelf price accepted when the block sets none: 100 million minor units (a million
 * in a two-decimal currency), far above a shelf price anywhere, yet it stops a run of extra
 * zeros. A rule of thumb, not a sourced figure.
 */
export const defaultShelfPriceCapMinor = 100_000_000;

/** The labels of the answer's parts, as the enumerator sees them. */
export function shelfObservationFieldNames(block: ShelfObservationBlock) {
  return {
    priceMinor: 'Shelf price',
    packSize: `Pack size (${packUnitWords[block.packUnit]})`,
    quantity:
      block.measure === 'units-sold'
        ? `Units sold in the last ${block.periodDays ?? 0} days`
        : 'Units in stock now',
  } as const;
}

export const packUnitWords: Readonly<Record<ShelfObservationBlock['packUnit'], string>> = {
  g: 'grams',
  kg: 'kilograms',
  ml: 'millilitres',
  l: 'litres',
  piece: 'pieces',
};

const tagPhotoIdSchema = z.uuid('Take the photo of the price tag');

/**
 * Price, pack size, the count the block asks for, and the tag photo when the block wants it.
 * `words` writes the price limit in the study's currency.
 */
export function shelfObservationAnswerSchema(block: ShelfObservationBlock, words?: AmountWords) {
  const names = shelfObservationFieldNames(block);
  const shape = {
    priceMinor: amountAnswerSchema({
      name: names.priceMinor,
      min: 1,
      max: block.maxPriceMinor ?? defaultShelfPriceCapMinor,
      words,
    }),
    packSize: z
      .number({ error: `${names.packSize}: type the pack size` })
      .finite(`${names.packSize}: type the pack size`)
      .positive(`${names.packSize}: must be more than zero`),
    quantity: z
      .int({
        error: (issue) =>
          issue.input === undefined
            ? `${names.quantity}: type the count`
            : `${names.quantity}: count whole units`,
      })
      .nonnegative(`${names.quantity}: a count cannot be negative`),
  };
  const photoId = tagPhotoIdSchema;
  if (block.photo === 'required') return z.strictObject({ ...shape, photoId });
  if (block.photo === 'optional') return z.strictObject({ ...shape, photoId: photoId.optional() });
  return z.strictObject(shape);
}
export interface ShelfObservationAnswer {
  priceMinor: number;
  packSize: number;
  quantity: number;
  photoId?: string;
}

const shelfKeys = ['priceMinor', 'packSize', 'quantity'];
const shelfKeysWithPhoto = [...shelfKeys, 'photoId'];

/** The quick test of a shelf-observation answer (see `answerFitsFor`). */
export function shelfObservationAnswerFits(block: ShelfObservationBlock) {
  const keys = block.photo === 'none' ? shelfKeys : shelfKeysWithPhoto;
  return (answer: unknown) => {
    if (!isRecordWith(answer, keys)) return false;
    const packSize = answer['packSize'];
    if (
      !isWholeBetween(answer['priceMinor'], 1, block.maxPriceMinor ?? defaultShelfPriceCapMinor) ||
      !Number.isFinite(packSize) ||
      (packSize as number) <= 0 ||
      !isWholeBetween(answer['quantity'], 0, Number.MAX_SAFE_INTEGER)
    ) {
      return false;
    }
    const photoId = answer['photoId'];
    if (photoId === undefined) return block.photo !== 'required';
    return tagPhotoIdSchema.safeParse(photoId).success;
  };
}
