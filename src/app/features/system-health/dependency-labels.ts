import type { dependencyNames } from '@shared/health/health-report';

type DependencyName = (typeof dependencyNames)[number];

/** How the health page names each outside service, and what Fieldcurve uses it for. */
export const dependencyLabels: Readonly<
  Record<
    DependencyName,
    { readonly title: string; readonly purpose: string; readonly icon: string }
  >
> = {
  database: {
    title: 'Database',
    purpose: 'Studies, members, responses and fitted models',
    icon: 'database',
  },
  objectStore: {
    title: 'Photo storage',
    purpose: 'Photos of price tags and shelves',
    icon: 'photo_library',
  },
  mail: {
    title: 'Outgoing e-mail',
    purpose: 'Invitations, route assignments and publication notices',
    icon: 'mail',
  },
  identityProvider: {
    title: 'Sign-in provider',
    purpose: 'Checks who people are when they sign in',
    icon: 'passkey',
  },
};
