import { z } from 'zod';
import { blockCommonShape } from '../block-common';

/**
 * Photo: pictures of what `subject` describes — price tags, shelves, packs; never people (the
 * capture screen says so).
 */
export const photoBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('photo'),
  subject: z.string().trim().min(1, 'Say what to photograph').max(300),
  maxPhotos: z.int('A whole number').min(1, 'Allow at least one photo').max(5, 'At most 5 photos'),
});
export type PhotoBlock = z.infer<typeof photoBlockSchema>;

/** The ids of the photos taken (uploaded separately), one to `maxPhotos`. */
export function photoAnswerSchema(block: PhotoBlock) {
  return z.strictObject({
    photoIds: z
      .array(z.uuid('A photo is recorded by its id'))
      .min(1, 'Take at least one photo')
      .max(block.maxPhotos, `At most ${block.maxPhotos} photos`),
  });
}
export type PhotoAnswer = z.infer<ReturnType<typeof photoAnswerSchema>>;
