import { Routes } from '@angular/router';
import { MembersPage } from './members-page';

export const membersRoutes: Routes = [
  { path: '', component: MembersPage, title: 'Members · Fieldcurve' },
  {
    path: 'tokens',
    loadComponent: () => import('./tokens-admin-page').then((m) => m.TokensAdminPage),
    title: 'Access tokens · Fieldcurve',
  },
];
