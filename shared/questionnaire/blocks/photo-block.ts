import { z } from 'zod';
import { storableText } from '../../storable/storable-text';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/**
 * Photo: pictures of what `subject` describes — price tags, shelves, packs; never people (the
 * capture screen says so).
 */
export const photoBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('photo'),
  subject: storableText().trim().min(1, 'Say what to photograph').max(300),
  maxPhotos: z.int('A whole number').min(1, 'Allow at least one photo').max(5, 'At most 5 photos'),
});
export type PhotoBlock = z.infer<typeof photoBlockSchema>;

const photoIdSchema = z.uuid('A photo is recorded by its id');

/** The ids of the photos taken (uploaded separately), one to `maxPhotos`. */
export function photoAnswerSchema(block: PhotoBlock) {
  return z.strictObject({
    photoIds: z
      .array(photoIdSchema)
      .min(1, 'Take at least one photo')
      .max(block.maxPhotos, `At most ${block.maxPhotos} photos`),
  });
}
export type PhotoAnswer = z.infer<ReturnType<typeof photoAnswerSchema>>;

const photoKeys = ['photoIds'];

/** The quick test of a photo answer (see `answerFitsFor`). */
export function photoAnswerFits(block: PhotoBlock) {
  return (answer: unknown) => {
    if (!isRecordWith(answer, photoKeys)) return false;
    const ids = answer['photoIds'];
    if (!Array.isArray(ids) || ids.length < 1 || ids.length > block.maxPhotos) return false;
    for (let i = 0; i < ids.length; i++) {
      if (!photoIdSchema.safeParse(ids[i]).success) return false;
    }
    return true;
  };
}
