import type { Response } from 'express';
import type { Role } from '@shared/auth/role';

/** The roles the access guard found the caller holding in the study of this request. */
export const studyRolesHere = (res: Response): Role[] =>
  (res.locals['studyRoles'] as Role[] | undefined) ?? [];
