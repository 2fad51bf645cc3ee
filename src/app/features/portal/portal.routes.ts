import { Routes } from '@angular/router';
import { provideCharts, withDefaultRegisterables } from 'ng2-charts';
import { ReportsPage } from './reports-page';

/**
 * The client's portal. A version's page lives at the path the publication e-mail links to
 * (`portalSchedulePath`: /reports/:studyId/schedules/:versionId).
 */
export const portalRoutes: Routes = [
  {
    path: '',
    providers: [provideCharts(withDefaultRegisterables())],
    children: [
      { path: '', component: ReportsPage, title: 'Reports · Fieldcurve' },
      {
        path: 'tokens',
        title: 'API access · Reports · Fieldcurve',
        loadComponent: () => import('./api-tokens-page').then((m) => m.ApiTokensPage),
      },
      {
        path: ':studyId/schedules/:versionId',
        title: 'Demand schedule · Reports · Fieldcurve',
        loadComponent: () => import('./schedule-page').then((m) => m.SchedulePage),
      },
    ],
  },
];
