import { z } from 'zod';
import { roles } from './roles';

export { roleLabels, roles, type Role } from './roles';

export const roleSchema = z.enum(roles);

/** A non-empty, duplicate-free set of roles. */
export const roleSetSchema = z
  .array(roleSchema)
  .min(1, 'Choose at least one role')
  .refine((list) => new Set(list).size === list.length, 'A role is listed twice');
