import { z } from 'zod';

const thresholdFields = [
  'tooCheapMinor',
  'cheapMinor',
  'expensiveMinor',
  'tooExpensiveMinor',
] as const;

/** Faster than `minSecondsPerBlock` seconds per answered block. */
export const tooShortFlagSchema = z.object({
  kind: z.literal('too-short'),
  durationSeconds: z.number(),
  answeredBlocks: z.number().int(),
  secondsPerBlock: z.number(),
  minSecondsPerBlock: z.number(),
});

/** Every answered price of a ladder got the same answer (all yes, all no, or one intent level). */
export const straightLiningFlagSchema = z.object({
  kind: z.literal('straight-lining'),
  blockId: z.string(),
  steps: z.number().int(),
  response: z.union([z.string(), z.number()]),
});

/** The device's fix lies `distanceM` metres (great circle) from the assigned point. */
export const gpsFarFlagSchema = z.object({
  kind: z.literal('gps-far'),
  distanceM: z.number(),
  accuracyM: z.number().nullable(),
  maxDistanceM: z.number(),
});

/** Thresholds that break too cheap ≤ cheap ≤ expensive ≤ too expensive, pair by pair. */
export const thresholdsOutOfOrderFlagSchema = z.object({
  kind: z.literal('thresholds-out-of-order'),
  blockId: z.string(),
  violations: z.array(
    z.object({ lower: z.enum(thresholdFields), higher: z.enum(thresholdFields) }),
  ),
});

/** Another interview of the study has the same respondent key. */
export const duplicateRespondentFlagSchema = z.object({
  kind: z.literal('duplicate-respondent'),
  otherInterviewIds: z.array(z.uuid()),
});

/** One automatic quality finding on an interview; any of them puts it in the review queue. */
export const qualityFlagSchema = z.discriminatedUnion('kind', [
  tooShortFlagSchema,
  straightLiningFlagSchema,
  gpsFarFlagSchema,
  thresholdsOutOfOrderFlagSchema,
  duplicateRespondentFlagSchema,
]);
export type QualityFlag = z.infer<typeof qualityFlagSchema>;
export type QualityFlagKind = QualityFlag['kind'];
export type GpsFarFlag = z.infer<typeof gpsFarFlagSchema>;

export const qualityFlagKinds = [
  'too-short',
  'straight-lining',
  'gps-far',
  'thresholds-out-of-order',
  'duplicate-respondent',
] as const satisfies readonly QualityFlagKind[];

/** Words supervisors read in the review queue. */
export const qualityFlagLabels: Readonly<Record<QualityFlagKind, string>> = {
  'too-short': 'Quicker than the questions allow',
  'straight-lining': 'Same answer at every price',
  'gps-far': 'Recorded away from the point',
  'thresholds-out-of-order': 'Price thresholds out of order',
  'duplicate-respondent': 'Respondent interviewed before',
};
