import type { RequestHandler } from 'express';
import type { Actor } from './actor';
import { findAccessRule } from './access-policy';
import { HttpError, forbidden, notSignedIn } from '../http/http-error';

/**
 * The one server-side decision of who may call what. It runs before every API router: the client
 * hides what a role cannot do, but this guard is the authority.
 */
export const accessGuard: RequestHandler = (req, res, next) => {
  const rule = findAccessRule(req.method, req.baseUrl + req.path);
  if (!rule) {
    throw new HttpError(404, 'not-found', `No API route ${req.method} ${req.originalUrl}.`);
  }
  if (rule.access === 'public') {
    next();
    return;
  }
  const actor = res.locals['actor'] as Actor | undefined;
  if (!actor) throw notSignedIn();
  if (rule.access !== 'signed-in' && !actor.roles.some((role) => rule.access.includes(role))) {
    const needed = (rule.access as readonly string[]).join(' or ');
    throw forbidden(`This needs the ${needed} role.`);
  }
  next();
};
