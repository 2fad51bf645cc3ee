import { z } from 'zod';
import { positiveMinorSchema } from '../money/minor-amount';
import type { BlockIssueSink } from './block-common';

/**
 * One bid of a dichotomous-choice design. With double bounds, the follow-up bid asked after a
 * "yes" (higher) and after a "no" (lower) belong to the bid, so each respondent's pair is fixed
 * when the bid is assigned.
 */
export const bidLevelSchema = z.strictObject({
  bidMinor: positiveMinorSchema,
  afterYesMinor: positiveMinorSchema.optional(),
  afterNoMinor: positiveMinorSchema.optional(),
});
export type BidLevel = z.infer<typeof bidLevelSchema>;

/** The bids assigned across respondents, balanced by site (see `assignBid`). */
export const bidDesignSchema = z.strictObject({
  levels: z
    .array(bidLevelSchema)
    .min(1, 'A bid design needs at least one bid')
    .max(40, 'A bid design has at most 40 bids'),
});
export type BidDesign = z.infer<typeof bidDesignSchema>;

export type BidBounds = 'single' | 'double';

/**
 * Checks a design against its bounds: no bid twice; with double bounds every bid has a higher
 * follow-up after yes and a lower (positive) one after no; with single bounds, none.
 */
export function checkBidDesign(design: BidDesign, bounds: BidBounds, ctx: BlockIssueSink): void {
  design.levels.forEach((level, i) => {
    const at = (field: string) => ['bidDesign', 'levels', i, field];
    const first = design.levels.findIndex((l) => l.bidMinor === level.bidMinor);
    if (first < i) {
      ctx.addIssue({
        code: 'custom',
        path: at('bidMinor'),
        message: `Bid ${i + 1} repeats bid ${first + 1}`,
      });
    }
    if (bounds === 'single') {
      for (const field of ['afterYesMinor', 'afterNoMinor'] as const) {
        if (level[field] !== undefined) {
          ctx.addIssue({
            code: 'custom',
            path: at(field),
            message: 'Only a double-bounded design has follow-up bids',
          });
        }
      }
      return;
    }
    checkFollowUps(level, i, at, ctx);
  });
}

function checkFollowUps(
  level: BidLevel,
  i: number,
  at: (field: string) => (string | number)[],
  ctx: BlockIssueSink,
): void {
  // Stored amounts are minor units; the researcher typed major ones, so none are quoted.
  const name = `bid ${i + 1}`;
  if (level.afterYesMinor === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: at('afterYesMinor'),
      message: `Give the higher follow-up bid after a yes to ${name}`,
    });
  } else if (level.afterYesMinor <= level.bidMinor) {
    ctx.addIssue({
      code: 'custom',
      path: at('afterYesMinor'),
      message: `The follow-up after a yes must be higher than ${name}`,
    });
  }
  if (level.afterNoMinor === undefined) {
    ctx.addIssue({
      code: 'custom',
      path: at('afterNoMinor'),
      message: `Give the lower follow-up bid after a no to ${name}`,
    });
  } else if (level.afterNoMinor >= level.bidMinor) {
    ctx.addIssue({
      code: 'custom',
      path: at('afterNoMinor'),
      message: `The follow-up after a no must be lower than ${name}`,
    });
  }
}
