import { z } from 'zod';
import { samplingPointKindSchema } from '../sampling/sampling-point-kind';

/** A person a route can be assigned to: a study member holding the enumerator role there. */
export const studyEnumeratorSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
});
export type StudyEnumerator = z.infer<typeof studyEnumeratorSchema>;

/** One stop of a stored route, with enough of its point to show it without another request. */
export const routeStopSchema = z.object({
  position: z.number().int().min(1),
  pointId: z.uuid(),
  code: z.string(),
  name: z.string(),
  kind: samplingPointKindSchema,
  stratum: z.string(),
  latitude: z.number(),
  longitude: z.number(),
  quota: z.number().int().min(1),
});
export type RouteStop = z.infer<typeof routeStopSchema>;

/** A stored route as the routes API answers it; stops in visiting order from position 1. */
export const fieldRouteSchema = z.object({
  id: z.uuid(),
  studyId: z.uuid(),
  name: z.string(),
  windowStart: z.string(),
  windowEnd: z.string(),
  enumerator: studyEnumeratorSchema.nullable(),
  assignedAt: z.string().nullable(),
  stops: z.array(routeStopSchema),
});
export type FieldRoute = z.infer<typeof fieldRouteSchema>;

/** The link an enumerator's e-mail carries: the route in the field app. */
export function fieldRoutePath(routeId: string): string {
  return `/field/routes/${routeId}`;
}
