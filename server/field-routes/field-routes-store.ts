import { and, count, eq, inArray } from 'drizzle-orm';
import type { FieldRouteInput, RouteStopInput } from '@shared/routes/field-route-input';
import type { Executor } from '../db/database';
import { interviews, routeStops, routes, samplingPoints } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';

/**
 * Refuses stops whose point is not a sampling point of this study (another study's, or none),
 * naming each bad stop as `stops.N.pointId`. The foreign key on (study, point) backs this up.
 */
export async function checkStopPoints(
  db: Executor,
  studyId: string,
  stops: readonly RouteStopInput[],
): Promise<void> {
  const ids = stops.map((stop) => stop.pointId);
  const found = await db
    .select({ id: samplingPoints.id })
    .from(samplingPoints)
    .where(and(eq(samplingPoints.studyId, studyId), inArray(samplingPoints.id, ids)));
  const known = new Set(found.map((row) => row.id));
  const issues = stops.flatMap((stop, index) =>
    known.has(stop.pointId)
      ? []
      : [
          {
            path: `stops.${index}.pointId`,
            message: 'This point is not a sampling point of this study.',
          },
        ],
  );
  if (issues.length > 0) {
    const summary = issues.map((issue) => issue.path).join(', ');
    throw new HttpError(
      400,
      'invalid-input',
      `The body is not valid — ${summary}: not a point of this study.`,
      issues,
    );
  }
}

async function writeStops(
  db: Executor,
  studyId: string,
  routeId: string,
  stops: readonly RouteStopInput[],
) {
  await db.delete(routeStops).where(eq(routeStops.routeId, routeId));
  await db.insert(routeStops).values(
    stops.map((stop, index) => ({
      routeId,
      studyId,
      pointId: stop.pointId,
      quota: stop.quota,
      position: index + 1,
    })),
  );
}

/** Stores a new route with its stops (unassigned); answers its id. */
export async function insertRoute(
  db: Executor,
  studyId: string,
  input: FieldRouteInput,
): Promise<string> {
  const [row] = await db
    .insert(routes)
    .values({
      studyId,
      name: input.name,
      windowStart: input.windowStart,
      windowEnd: input.windowEnd,
    })
    .returning({ id: routes.id });
  await writeStops(db, studyId, row.id, input.stops);
  return row.id;
}

/** Replaces a route's name, window and stops; the assignment is handled on its own. */
export async function replaceRoute(
  db: Executor,
  studyId: string,
  routeId: string,
  input: FieldRouteInput,
) {
  const updated = await db
    .update(routes)
    .set({ name: input.name, windowStart: input.windowStart, windowEnd: input.windowEnd })
    .where(and(eq(routes.studyId, studyId), eq(routes.id, routeId)))
    .returning({ id: routes.id });
  if (updated.length === 0) throw notFound('That route');
  await writeStops(db, studyId, routeId, input.stops);
}

/** Deletes a route unless interviews were already recorded on it (their progress would be lost). */
export async function deleteRoute(db: Executor, studyId: string, routeId: string): Promise<void> {
  const [recorded] = await db
    .select({ n: count() })
    .from(interviews)
    .where(eq(interviews.routeId, routeId));
  if (recorded.n > 0) {
    throw new HttpError(
      409,
      'route-has-interviews',
      `This route already has ${recorded.n} interview${recorded.n === 1 ? '' : 's'}; it cannot be deleted.`,
    );
  }
  const deleted = await db
    .delete(routes)
    .where(and(eq(routes.studyId, studyId), eq(routes.id, routeId)))
    .returning({ id: routes.id });
  if (deleted.length === 0) throw notFound('That route');
}
