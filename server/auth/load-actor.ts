import type { RequestHandler } from 'express';
import { and, eq, isNull } from 'drizzle-orm';
import type { Database } from '../db/database';
import { memberships, organisations, users } from '../db/schema';
import type { Actor } from './actor';
import { isSessionEndReason, sessionEnded } from './ended-session';

/**
 * Loads the session's person and their current roles. Reading the roles on every request means an
 * admin's change takes effect at once; a removed or deactivated membership ends the session's
 * access, and a session ended from elsewhere answers why.
 */
export function loadActor(db: Database): RequestHandler {
  return async (req, res, next) => {
    const { userId, organisationId, endedReason } = req.session;
    // The access guard answers with it where a route needs a signed-in person.
    if (isSessionEndReason(endedReason)) res.locals['sessionEnded'] = sessionEnded(endedReason);
    if (!userId || !organisationId) {
      next();
      return;
    }
    const [row] = await db
      .select({
        email: users.email,
        name: users.name,
        roles: memberships.roles,
        organisationName: organisations.name,
      })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
      .where(
        and(
          eq(memberships.userId, userId),
          eq(memberships.organisationId, organisationId),
          isNull(memberships.deactivatedAt),
        ),
      );
    if (row) {
      const actor: Actor = { userId, organisationId, ...row };
      res.locals['actor'] = actor;
    }
    next();
  };
}
