import { z } from 'zod';

/** The five roles a member of an organisation can hold; a person may hold several. */
export const roles = ['admin', 'supervisor', 'researcher', 'enumerator', 'client'] as const;

export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** A non-empty, duplicate-free set of roles. */
export const roleSetSchema = z
  .array(roleSchema)
  .min(1, 'Choose at least one role')
  .refine((list) => new Set(list).size === list.length, 'A role is listed twice');

/** Human labels used by every screen and e-mail. */
export const roleLabels: Readonly<Record<Role, string>> = {
  admin: 'Administrator',
  supervisor: 'Supervisor',
  researcher: 'Researcher',
  enumerator: 'Enumerator',
  client: 'Client',
};
