import type { Role } from '@shared/auth/roles';

/** A figure the home page can show beside a role, from data the app already fetches. */
export type HomeCountKind = 'studies' | 'pendingReviews' | 'routesOnDevice' | 'schedules';

/** A page of the role, linked from its card. */
export interface RoleLink {
  readonly label: string;
  readonly path: string;
}

/** What the home page tells a person about one of their roles. */
export interface RoleWelcome {
  readonly icon: string;
  /** What this role does in Fieldcurve. */
  readonly summary: string;
  /** Where the role's work happens in the app today. */
  readonly next: string;
  /** The role's main pages, the usual first one first. */
  readonly links: readonly RoleLink[];
  /** A figure that tells where the work stands, in words for any count (0 included). */
  readonly count?: { readonly of: HomeCountKind; readonly words: (count: number) => string };
}

const plural = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;

export const roleWelcomes: Readonly<Record<Role, RoleWelcome>> = {
  admin: {
    icon: 'admin_panel_settings',
    summary:
      'You decide who belongs to your organisation and what each person may do: invite ' +
      'colleagues by e-mail, give them roles, and keep an eye on the services Fieldcurve needs.',
    next:
      'Invite researchers, supervisors, enumerators and clients under Members and give each ' +
      'the roles they need; you can see which invitations are still waiting. System health ' +
      'shows whether the services behind Fieldcurve are running.',
    links: [
      { label: 'Go to members', path: '/members' },
      { label: 'Go to system health', path: '/system-health' },
    ],
  },
  researcher: {
    icon: 'query_stats',
    summary:
      'You design studies and questionnaires, clean and weight the answers, fit demand ' +
      'models and publish demand schedules and reports for your clients.',
    next:
      'Create a study and its questionnaire under Studies, and publish a version for the ' +
      'field. As interviews come in, fit and compare demand models under Analysis and publish ' +
      'schedules for your clients.',
    links: [
      { label: 'Go to studies', path: '/studies' },
      { label: 'Go to analysis', path: '/analysis' },
    ],
    count: {
      of: 'studies',
      words: (n) =>
        n === 0 ? 'You are in no study yet.' : `You are in ${plural(n, 'study', 'studies')}.`,
    },
  },
  supervisor: {
    icon: 'map',
    summary:
      'You plan the sites and routes of a study, set quotas, assign routes to enumerators ' +
      'and review the interviews that quality checks flag.',
    next:
      'Under Field planning, upload a study’s sampling points, group them into routes with ' +
      'quotas and assign them; the enumerator gets an e-mail. Interviews the quality checks ' +
      'flag wait for your decision in the review queue.',
    links: [
      { label: 'Go to field planning', path: '/field-planning' },
      { label: 'Go to the review queue', path: '/review' },
    ],
    count: {
      of: 'pendingReviews',
      words: (n) =>
        n === 0
          ? 'No interview waits for your decision.'
          : `${plural(n, 'interview waits', 'interviews wait')} for your decision.`,
    },
  },
  enumerator: {
    icon: 'directions_walk',
    summary:
      'You visit the sites on your routes, run the questionnaires and record shop prices, ' +
      'also where there is no network. Your answers are kept on the device until they sync.',
    next:
      'Your assigned routes are under My routes; the device keeps them for work without a ' +
      'network. Finished interviews wait on the device until they are sent: Sync shows what ' +
      'is still to go.',
    links: [
      { label: 'Go to my routes', path: '/field/routes' },
      { label: 'Go to sync', path: '/field/sync' },
    ],
    count: {
      of: 'routesOnDevice',
      words: (n) =>
        n === 0
          ? 'No route is on this device yet: open My routes while online to fetch yours.'
          : `${plural(n, 'route is', 'routes are')} on this device.`,
    },
  },
  client: {
    icon: 'description',
    summary:
      'You receive the published demand schedules and reports of the studies shared with ' +
      'you, and can download them as CSV, XLSX or PDF.',
    next:
      'Reports lists what the study teams have published for you, ready to download. You get ' +
      'an e-mail whenever a new version is published.',
    links: [{ label: 'Go to reports', path: '/reports' }],
    count: {
      of: 'schedules',
      words: (n) =>
        n === 0
          ? 'Nothing has been published for you yet.'
          : `${plural(n, 'published schedule is', 'published schedules are')} shared with you.`,
    },
  },
};

/** Cards appear in the order people usually meet the work: set-up, design, field, results. */
export const roleWelcomeOrder: readonly Role[] = [
  'admin',
  'researcher',
  'supervisor',
  'enumerator',
  'client',
];
