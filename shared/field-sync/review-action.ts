import { z } from 'zod';
import { storableText } from '../storable/storable-text';

/** What a supervisor can do with a received or flagged interview. */
export const reviewActions = ['accept', 'return', 'reject'] as const;
export type ReviewAction = (typeof reviewActions)[number];

/** The status each action leaves the interview in. */
export const statusAfterReview = {
  accept: 'accepted',
  return: 'returned',
  reject: 'rejected',
} as const satisfies Record<ReviewAction, string>;

/**
 * Body of `POST /api/studies/:studyId/interviews/:interviewId/review`. Returning or rejecting
 * needs a note: it is what the enumerator reads on their device.
 */
export const reviewActionSchema = z
  .strictObject({
    action: z.enum(reviewActions, { error: 'Choose accept, return or reject' }),
    note: storableText().trim().max(2000, 'Keep the note under 2000 characters').optional(),
  })
  .superRefine((body, ctx) => {
    if (body.action !== 'accept' && !body.note) {
      ctx.addIssue({
        code: 'custom',
        path: ['note'],
        message: `Write a note for the enumerator: say why you ${body.action} it`,
      });
    }
  });
export type ReviewActionBody = z.infer<typeof reviewActionSchema>;
