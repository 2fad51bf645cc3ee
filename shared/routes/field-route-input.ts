import { z } from 'zod';
import { storableDay } from '../storable/storable-day';
import { storableText } from '../storable/storable-text';

/** One stop of a route as the supervisor plans it: which point, and how many interviews there. */
export const routeStopInputSchema = z.object({
  pointId: z.uuid({ error: 'Choose a sampling point of this study.' }),
  quota: z
    .number({ error: 'The quota must be a number.' })
    .int({ error: 'The quota must be a whole number of interviews.' })
    .min(1, { error: 'The quota must be at least 1 interview.' })
    .max(1000, { error: 'The quota may be at most 1000 interviews.' }),
});
export type RouteStopInput = z.infer<typeof routeStopInputSchema>;

// API callers type these days by hand: the message names the format, not just an example.
const isoDate = (what: string) =>
  storableDay(`${what} must be a real day written YYYY-MM-DD, such as 2027-03-01.`);
const isDay = (value: unknown) => isoDate('A day').safeParse(value).success;

/**
 * Body of creating (`POST`) or replacing (`PUT`) a route. Stops are in visiting order, each point
 * at most once. `enumeratorId`: a study enumerator assigns the route (and e-mails them), `null`
 * leaves it unassigned; when omitted on `PUT` the current assignment stays.
 */
export const fieldRouteInputSchema = z
  .object({
    name: storableText({ error: 'Give the route a name.' })
      .trim()
      .min(1, { error: 'Give the route a name.' })
      .max(120, { error: 'The name may be at most 120 characters.' }),
    stops: z
      .array(routeStopInputSchema, { error: 'List the route’s stops.' })
      .min(1, { error: 'A route needs at least one stop.' })
      .max(300, { error: 'A route may have at most 300 stops.' }),
    windowStart: isoDate('The first day'),
    windowEnd: isoDate('The last day'),
    enumeratorId: z.uuid({ error: 'Choose an enumerator of this study.' }).nullable().optional(),
  })
  .strict()
  .superRefine((route, context) => {
    // zod still runs this when a day is unreadable; comparing then would add a second, wrong
    // complaint about the order of the days.
    const bothDays = isDay(route.windowStart) && isDay(route.windowEnd);
    if (bothDays && route.windowEnd < route.windowStart) {
      context.addIssue({
        code: 'custom',
        path: ['windowEnd'],
        message: 'The last day must be on or after the first day.',
      });
    }
    const positionOf = new Map<string, number>();
    route.stops.forEach((stop, index) => {
      const earlier = positionOf.get(stop.pointId);
      if (earlier === undefined) positionOf.set(stop.pointId, index);
      else
        context.addIssue({
          code: 'custom',
          path: ['stops', index, 'pointId'],
          message: `This point is already stop ${earlier + 1} of the route.`,
        });
    });
  });
export type FieldRouteInput = z.infer<typeof fieldRouteInputSchema>;

/** Body of assigning or reassigning a route: the enumerator, or `null` to take it back. */
export const routeAssignmentSchema = z
  .object({
    enumeratorId: z.uuid({ error: 'Choose an enumerator of this study.' }).nullable(),
  })
  .strict();
export type RouteAssignment = z.infer<typeof routeAssignmentSchema>;
