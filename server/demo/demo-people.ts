import type { Role } from '@shared/auth/role';

/** The invented demo organisation and one person per role; the local sign-in service knows them too. */
export const demoOrganisationName = 'Tidewater Pricing Lab';

/** Every demo account shares this password; it exists only in the local stand-in. */
export const demoPassword = 'fieldcurve-demo';

export const demoPeople: readonly { email: string; name: string; roles: Role[] }[] = [
  { email: 'admin@tidewater.test', name: 'Ines Valdane', roles: ['admin'] },
  { email: 'supervisor@tidewater.test', name: 'Tomas Reyland', roles: ['supervisor'] },
  { email: 'researcher@tidewater.test', name: 'Mei Arkwright', roles: ['researcher'] },
  { email: 'enumerator@tidewater.test', name: 'Joseph Okoro-Lane', roles: ['enumerator'] },
  { email: 'client@tidewater.test', name: 'Priya Hallsworth', roles: ['client'] },
];
