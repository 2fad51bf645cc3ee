import type { Response } from 'express';
import type { Role } from '@shared/auth/role';
import { notSignedIn } from '../http/http-error';

/** The signed-in person a request acts for, loaded fresh from the database on every request. */
export interface Actor {
  userId: string;
  organisationId: string;
  organisationName: string;
  email: string;
  name: string;
  roles: Role[];
}

/** The actor of a route that the access policy already required to be signed in. */
export function actorOf(res: Response): Actor {
  const actor = res.locals['actor'] as Actor | undefined;
  if (!actor) throw notSignedIn();
  return actor;
}
