import { z } from 'zod';
import { roleSchema, roleSetSchema } from '../auth/role';

/** One person in the organisation, as the admin's member list shows them. */
export const memberSchema = z.object({
  userId: z.string().uuid(),
  email: z.string().email(),
  name: z.string(),
  roles: z.array(roleSchema),
  joinedAt: z.string(),
  /** When an admin deactivated the person; null while they are active. */
  deactivatedAt: z.string().nullable(),
});
export type Member = z.infer<typeof memberSchema>;

/** Body of `PUT /api/members/:userId/roles`. */
export const memberRolesUpdateSchema = z.object({ roles: roleSetSchema }).strict();
export type MemberRolesUpdate = z.infer<typeof memberRolesUpdateSchema>;
