import type { Role } from '@shared/auth/role';

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/**
 * Who may call one API route: everyone, any signed-in member, or members holding one of the
 * listed roles. Paths use Express 5 syntax (`/api/members/:userId/roles`).
 */
export interface AccessRule {
  method: HttpMethod;
  path: string;
  access: 'public' | 'signed-in' | readonly Role[];
}
