import { z } from 'zod';
import { storableDay } from '../storable/storable-day';
import { storableText } from '../storable/storable-text';

/**
 * Which accepted interviews of a study a fit uses: finished within a date range (UTC dates,
 * both ends included), on some routes, at points of some regions (the points' strata), and with
 * or without interviews that carry quality flags. An empty or absent list means "all".
 */
export const interviewFilterSchema = z
  .strictObject({
    from: storableDay('Give the first day as YYYY-MM-DD').optional(),
    to: storableDay('Give the last day as YYYY-MM-DD').optional(),
    routeIds: z
      .array(z.uuid({ error: 'A route is named by its id' }))
      .max(500)
      .optional(),
    regions: z.array(storableText().trim().min(1, 'A region name is empty')).max(500).optional(),
    flagged: z.enum(['include', 'exclude'], { error: 'Choose include or exclude' }),
  })
  .refine((f) => !(f.from && f.to && f.from > f.to), {
    error: 'The first day must not be after the last day',
    path: ['to'],
  });
export type InterviewFilter = z.infer<typeof interviewFilterSchema>;

/** Every accepted interview, flagged or not. */
export const allInterviews: InterviewFilter = { flagged: 'include' };
