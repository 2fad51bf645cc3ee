import type { FieldRoute } from '@shared/routes/field-route';
import type { FieldRouteInput } from '@shared/routes/field-route-input';
import type { AppDependencies } from '../app-dependencies';
import type { Actor } from '../auth/actor';
import { getFieldRoute } from './field-routes-query';
import { checkStopPoints, insertRoute, replaceRoute } from './field-routes-store';
import { assignRoute } from './route-assignment';

/**
 * Creates a route (no `routeId`) or replaces one, in one transaction with its stops and, when the
 * body names an enumerator, the assignment and its e-mail: any failure leaves nothing changed.
 */
export async function saveRoute(
  deps: Pick<AppDependencies, 'db' | 'mailer' | 'config'>,
  change: { studyId: string; routeId?: string; input: FieldRouteInput; actor: Actor },
): Promise<FieldRoute> {
  const { studyId, input } = change;
  return deps.db.transaction(async (tx) => {
    await checkStopPoints(tx, studyId, input.stops);
    let routeId = change.routeId;
    if (routeId === undefined) routeId = await insertRoute(tx, studyId, input);
    else await replaceRoute(tx, studyId, routeId, input);
    if (input.enumeratorId !== undefined) {
      const { enumeratorId } = input;
      await assignRoute(tx, deps, {
        studyId,
        routeId,
        enumeratorId,
        assignedBy: change.actor,
        resend: false,
      });
    }
    return getFieldRoute(tx, studyId, routeId, {});
  });
}
