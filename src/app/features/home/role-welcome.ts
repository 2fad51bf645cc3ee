import type { Role } from '@shared/auth/roles';

/** What the home page tells a person about one of their roles. */
export interface RoleWelcome {
  readonly icon: string;
  /** What this role does in Fieldcurve. */
  readonly summary: string;
  /** What happens next for this role, given what the product offers today. */
  readonly next: string;
  /** A page that exists now and is the natural first step, if there is one. */
  readonly action?: { readonly label: string; readonly path: string };
}

export const roleWelcomes: Readonly<Record<Role, RoleWelcome>> = {
  admin: {
    icon: 'admin_panel_settings',
    summary:
      'You decide who belongs to your organisation and what each person may do: invite ' +
      'colleagues by e-mail, give them roles, and keep an eye on the services Fieldcurve needs.',
    next:
      'Start by inviting your researchers and supervisors. Each invitation stays open for a ' +
      'limited time; you can see which ones are still waiting.',
    action: { label: 'Manage members', path: '/members' },
  },
  researcher: {
    icon: 'query_stats',
    summary:
      'You design studies and questionnaires, clean and weight the answers, fit demand ' +
      'models and publish demand schedules and reports for your clients.',
    next:
      'Study and questionnaire design are on their way. They will appear in the menu here ' +
      'as soon as they are ready for your organisation.',
  },
  supervisor: {
    icon: 'map',
    summary:
      'You plan the sites and routes of a study, set quotas, assign routes to enumerators ' +
      'and review the interviews that quality checks flag.',
    next:
      'Route planning opens once a researcher has set up a study. You will then upload ' +
      'sampling points and group them into routes from this menu.',
  },
  enumerator: {
    icon: 'directions_walk',
    summary:
      'You visit the sites on your routes, run the questionnaires and record shop prices, ' +
      'also where there is no network. Your answers are kept on the device until they sync.',
    next:
      'When a supervisor assigns you a route you will get an e-mail. Open Fieldcurve once ' +
      'while online so your device keeps the route for offline work.',
  },
  client: {
    icon: 'description',
    summary:
      'You receive the published demand schedules and reports of the studies shared with ' +
      'you, and can download them as CSV, XLSX or PDF.',
    next:
      'You will get an e-mail as soon as a study team publishes a schedule for you; it will ' +
      'then be listed here.',
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
