import { z } from 'zod';
import { positiveMinorSchema } from '../../money/minor-amount';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

export const packUnits = ['g', 'kg', 'ml', 'l', 'piece'] as const;
export const shelfMeasures = ['units-sold', 'stock-on-hand'] as const;
export const photoRules = ['required', 'optional', 'none'] as const;

/**
 * Shelf observation: what a shop actually charges and sells. The enumerator records the shelf
 * price, the pack size, and either units sold over the last `periodDays` or the stock on hand,
 * with a photo of the price tag when `photo` asks for one.
 */
export const shelfObservationBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('shelf-observation'),
    packUnit: z.enum(packUnits, { error: 'Choose the unit of the pack size' }),
    measure: z.enum(shelfMeasures, { error: 'Choose units sold or stock on hand' }),
    periodDays: z.int().min(1, 'At least one day').max(366, 'At most 366 days').optional(),
    photo: z.enum(photoRules, { error: 'Say whether a price-tag photo is needed' }),
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

const tagPhotoIdSchema = z.uuid('A photo is recorded by its id');

/** Price, pack size, the count the block asks for, and the tag photo when the block wants it. */
export function shelfObservationAnswerSchema(block: ShelfObservationBlock) {
  const shape = {
    priceMinor: positiveMinorSchema,
    packSize: z.number().finite().positive('The pack size must be more than zero'),
    quantity: z.int('Count whole units').nonnegative('A count cannot be negative'),
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
      !isWholeBetween(answer['priceMinor'], 1, Number.MAX_SAFE_INTEGER) ||
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
