import { z } from 'zod';
import { fieldIssueSchema } from '../http/api-error';
import { interviewStatuses } from '../interviews/interview-status';
import type { FieldInterview } from './field-interview';

/** The most interviews one `POST /api/field/sync` may carry. */
export const maxSyncBatchSize = 200;

/**
 * Body of `POST /api/field/sync`. Only the envelope is checked as a whole; each interview is
 * checked on its own, so one bad interview is refused with its reasons while the rest are kept.
 */
export const syncBatchSchema = z.strictObject({
  interviews: z
    .array(z.unknown(), { error: 'Send the interviews as a list' })
    .min(1, 'Send at least one interview')
    .max(maxSyncBatchSize, `Send at most ${maxSyncBatchSize} interviews per batch`),
  /** How many interviews the device still holds unsent besides this batch (for supervisors). */
  outboxCount: z
    .number({ error: 'The outbox count must be a number' })
    .int('The outbox count must be a whole number')
    .min(0, 'The outbox count cannot be negative')
    .max(1_000_000, 'The outbox count is implausibly large')
    .optional(),
});

/** What the device sends: the typed form of `syncBatchSchema`. */
export interface SyncBatch {
  interviews: FieldInterview[];
  outboxCount?: number;
}

/** Why the server refused one interview of a batch. */
export const syncRejectionCodes = [
  'invalid-interview',
  'unknown-version',
  'not-assigned',
  'invalid-answers',
  'no-consent',
  'photo-manifest',
  'id-conflict',
  'repeated-in-batch',
  'unstorable',
] as const;
export type SyncRejectionCode = (typeof syncRejectionCodes)[number];

const itemBase = {
  /** Position of the interview in the batch, from 0. */
  index: z.number().int().nonnegative(),
};

/** Stored now: newly, or as the correction of a returned interview (`resubmitted`). */
export const syncAcceptedSchema = z.object({
  ...itemBase,
  id: z.uuid(),
  outcome: z.literal('accepted'),
  status: z.enum(['received', 'flagged']),
  resubmitted: z.boolean(),
});

/** The server already had exactly this interview; nothing changed. */
export const syncDuplicateSchema = z.object({
  ...itemBase,
  id: z.uuid(),
  outcome: z.literal('duplicate'),
  status: z.enum(interviewStatuses),
});

/**
 * Refused and not stored, with every reason: `issues` name the field (e.g.
 * `answers.ladder.steps.0.priceMinor`) and what is wrong. `id` is null when none could be read.
 */
export const syncRejectedSchema = z.object({
  ...itemBase,
  id: z.string().nullable(),
  outcome: z.literal('rejected'),
  code: z.enum(syncRejectionCodes),
  message: z.string(),
  issues: z.array(fieldIssueSchema),
});

/** The server's answer for one interview of a batch. */
export const syncItemResultSchema = z.discriminatedUnion('outcome', [
  syncAcceptedSchema,
  syncDuplicateSchema,
  syncRejectedSchema,
]);
export type SyncItemResult = z.infer<typeof syncItemResultSchema>;
export type SyncRejected = z.infer<typeof syncRejectedSchema>;

/** Response of `POST /api/field/sync`: one result per interview, in the order sent. */
export const syncBatchResultSchema = z.object({
  results: z.array(syncItemResultSchema),
  receivedAt: z.string(),
});
export type SyncBatchResult = z.infer<typeof syncBatchResultSchema>;
