import { z } from 'zod';
import { type Role, roleSchema } from '../auth/role';

/** The roles a person can hold within one study (administration is organisation-wide). */
export const studyRoles = [
  'researcher',
  'supervisor',
  'enumerator',
  'client',
] as const satisfies readonly Role[];
export type StudyRole = (typeof studyRoles)[number];

/** A non-empty, duplicate-free set of study roles. */
export const studyRoleSetSchema = z
  .array(
    z.enum(studyRoles, { error: 'A study role is researcher, supervisor, enumerator or client' }),
  )
  .min(1, 'Choose at least one role')
  .refine((list) => new Set(list).size === list.length, 'A role is listed twice');

/** Body of `PUT /api/studies/:studyId/members/:userId`: adds the person or changes their roles. */
export const studyMemberUpdateSchema = z.strictObject({ roles: studyRoleSetSchema });
export type StudyMemberUpdate = z.infer<typeof studyMemberUpdateSchema>;

/** One person working on a study, with their roles there and in the organisation. */
export const studyMemberSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  roles: z.array(roleSchema),
  organisationRoles: z.array(roleSchema),
});
export type StudyMember = z.infer<typeof studyMemberSchema>;

/** A member of the organisation who could be added to a study, with the roles they hold. */
export type StudyMemberCandidate = Omit<StudyMember, 'roles'>;

/** The study roles in `wanted` that the person does not hold in the organisation. */
export function rolesBeyondOrganisation(
  wanted: readonly Role[],
  organisationRoles: readonly Role[],
): Role[] {
  return wanted.filter((role) => !organisationRoles.includes(role));
}
