import type { Response } from 'express';
import type { Role } from '@shared/auth/role';
import { actorOf } from '../auth/actor';

/** Which routes of a study a caller sees: all of them, or only those assigned to one person. */
export interface RouteVisibility {
  readonly onlyAssignedTo?: string;
}

/**
 * Supervisors and researchers of the study see every route; someone who is only an enumerator
 * there sees the routes assigned to them. Reads the study roles the access guard stored.
 */
export function routeVisibilityOf(res: Response): RouteVisibility {
  const studyRoles = (res.locals['studyRoles'] as Role[] | undefined) ?? [];
  const seesAll = studyRoles.includes('supervisor') || studyRoles.includes('researcher');
  return seesAll ? {} : { onlyAssignedTo: actorOf(res).userId };
}
