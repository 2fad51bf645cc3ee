import type { Role } from '@shared/auth/roles';

/** One entry of the side navigation. */
export interface NavItem {
  readonly label: string;
  readonly icon: string;
  readonly path: string;
  /** Roles that see the entry; `everyone` for pages open to any signed-in member. */
  readonly audience: readonly Role[] | 'everyone';
}

/** A titled run of entries; the untitled group comes first. */
export interface NavGroup {
  readonly title: string | null;
  readonly items: readonly NavItem[];
}

// Only pages that exist are listed. Each feature adds its section here when its pages land:
// researchers (Studies, Analysis), supervisors (Routes, Review), enumerators (My routes),
// clients (Reports).
const sections: readonly NavGroup[] = [
  {
    title: null,
    items: [
      { label: 'Home', icon: 'home', path: '/', audience: 'everyone' },
      {
        label: 'Studies',
        icon: 'science',
        path: '/studies',
        audience: ['researcher', 'supervisor', 'client'],
      },
      { label: 'Reports', icon: 'description', path: '/reports', audience: ['client'] },
    ],
  },
  {
    title: 'Field work',
    items: [
      { label: 'My routes', icon: 'route', path: '/field/routes', audience: ['enumerator'] },
      { label: 'Sync', icon: 'sync', path: '/field/sync', audience: ['enumerator'] },
    ],
  },
  {
    title: 'Supervision',
    items: [
      {
        label: 'Field planning',
        icon: 'map',
        path: '/field-planning',
        audience: ['supervisor', 'researcher'],
      },
      { label: 'Review', icon: 'fact_check', path: '/review', audience: ['supervisor'] },
      { label: 'Devices', icon: 'devices', path: '/devices', audience: ['supervisor', 'admin'] },
    ],
  },
  {
    title: 'Research',
    items: [
      { label: 'Analysis', icon: 'query_stats', path: '/analysis', audience: ['researcher'] },
    ],
  },
  {
    title: 'Administration',
    items: [
      { label: 'Members', icon: 'group', path: '/members', audience: ['admin'] },
      { label: 'Access tokens', icon: 'key', path: '/members/tokens', audience: ['admin'] },
      {
        label: 'System health',
        icon: 'monitor_heart',
        path: '/system-health',
        audience: ['admin'],
      },
    ],
  },
];

function isVisibleTo(item: NavItem, roles: readonly Role[]): boolean {
  return item.audience === 'everyone' || item.audience.some((role) => roles.includes(role));
}

/** The navigation a person holding `roles` sees; empty groups are left out. */
export function navGroupsFor(roles: readonly Role[]): NavGroup[] {
  return sections
    .map((section) => ({
      title: section.title,
      items: section.items.filter((item) => isVisibleTo(item, roles)),
    }))
    .filter((group) => group.items.length > 0);
}
