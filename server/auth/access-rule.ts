import type { Role } from '@shared/auth/role';

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/**
 * Who may call one API route: everyone, any signed-in member, members holding one of the
 * listed roles, or (`'token'`) a client's tool sending an access token issued in the portal
 * (`Authorization: Bearer …`; a browser session is not enough there). Paths use Express 5
 * syntax (`/api/members/:userId/roles`).
 *
 * A rule with `scope: 'study'` has a `:studyId` in its path; the caller must then be a member of
 * that study (of their own organisation) and hold one of the listed roles *in that study*.
 */
export interface AccessRule {
  method: HttpMethod;
  path: string;
  access: 'public' | 'signed-in' | 'token' | readonly Role[];
  scope?: 'organisation' | 'study';
}
