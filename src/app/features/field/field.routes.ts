import { Routes } from '@angular/router';

/** The enumerator's pages; each is its own chunk, all prefetched by the service worker. */
export const fieldRoutes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'routes' },
  {
    path: 'routes',
    title: 'My routes · Fieldcurve',
    loadComponent: () => import('./assignments/assignments-page').then((m) => m.AssignmentsPage),
  },
  {
    path: 'routes/:routeId',
    title: 'Route · Fieldcurve',
    loadComponent: () => import('./assignments/route-page').then((m) => m.RoutePage),
  },
  {
    path: 'interviews/:interviewId',
    title: 'Interview · Fieldcurve',
    loadComponent: () =>
      import('./interview/interview-runner-page').then((m) => m.InterviewRunnerPage),
  },
  {
    path: 'sync',
    title: 'Sync · Fieldcurve',
    loadComponent: () => import('./sync/sync-page').then((m) => m.SyncPage),
  },
];
