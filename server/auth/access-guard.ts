import type { RequestHandler } from 'express';
import { z } from 'zod';
import { roleLabels, type Role } from '@shared/auth/role';
import type { Database } from '../db/database';
import { HttpError, forbidden, notFound, notSignedIn } from '../http/http-error';
import type { Actor } from './actor';
import { findAccessRule } from './access-policy';
import { admitToken } from './bearer-token';
import { studyRolesOf } from './study-roles';

const studyIdSchema = z.uuid();

/**
 * The one server-side decision of who may call what. It runs before every API router: the client
 * hides what a role cannot do, but this guard is the authority. For study routes it also checks
 * study membership, and answers 404 rather than 403 for studies the caller may not know exist.
 */
export function accessGuard(db: Database): RequestHandler {
  return async (req, res, next) => {
    // HEAD is GET without the body (Express answers it with the GET handler): same rule.
    const method = req.method === 'HEAD' ? 'GET' : req.method;
    const found = findAccessRule(method, req.baseUrl + req.path);
    if (!found) {
      throw new HttpError(404, 'not-found', `No API route ${req.method} ${req.originalUrl}.`);
    }
    const { rule, params } = found;
    if (rule.access === 'public') return next();
    if (rule.access === 'token') return admitToken(db, req, res).then(() => next());
    const actor = res.locals['actor'] as Actor | undefined;
    if (!actor) throw (res.locals['sessionEnded'] as HttpError | undefined) ?? notSignedIn();
    if (rule.access === 'signed-in') return next();
    const allowed = rule.access;
    if (!actor.roles.some((role) => allowed.includes(role))) throw forbidden(openOnlyTo(allowed));
    if (rule.scope === 'study') {
      const studyId = studyIdSchema.safeParse(params['studyId']);
      if (!studyId.success)
        throw new HttpError(400, 'invalid-input', 'The study id must be a UUID.', [
          { path: 'studyId', message: 'Must be a UUID' },
        ]);
      const studyRoles = await studyRolesOf(db, studyId.data, actor);
      if (!studyRoles) throw notFound('That study');
      if (!studyRoles.some((role) => allowed.includes(role)))
        throw forbidden(openOnlyTo(allowed, 'in this study'));
      res.locals['studyRoles'] = studyRoles;
    }
    next();
  };
}

/**
 * The refusal an API caller reads: plain words, yet naming the roles, so an integrator knows
 * which account the call needs ("This is open to researchers and supervisors only.").
 */
export function openOnlyTo(allowed: readonly Role[], where?: 'in this study'): string {
  const people = allowed.map((role) => `${roleLabels[role].toLowerCase()}s`);
  const listed =
    people.length > 1 ? `${people.slice(0, -1).join(', ')} and ${people.at(-1)}` : people[0];
  return `This is open to ${listed} only${where ? ` ${where}` : ''}.`;
}
