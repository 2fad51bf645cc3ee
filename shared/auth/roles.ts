/**
 * The five roles a member of an organisation can hold; a person may hold several. Kept free of
 * zod so the app shell can use the names and labels without loading the schema library.
 */
export const roles = ['admin', 'supervisor', 'researcher', 'enumerator', 'client'] as const;

export type Role = (typeof roles)[number];

/** Human labels used by every screen and e-mail. */
export const roleLabels: Readonly<Record<Role, string>> = {
  admin: 'Administrator',
  supervisor: 'Supervisor',
  researcher: 'Researcher',
  enumerator: 'Enumerator',
  client: 'Client',
};
