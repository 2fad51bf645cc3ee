import { provideNativeDateAdapter } from '@angular/material/core';
import { Routes } from '@angular/router';
import { provideCharts, withDefaultRegisterables } from 'ng2-charts';
import { PlanningStudy } from './planning-study';

/** Supervisors plan sampling points and routes here and watch progress; researchers read. */
export const fieldPlanningRoutes: Routes = [
  {
    path: '',
    providers: [provideNativeDateAdapter(), provideCharts(withDefaultRegisterables())],
    children: [
      {
        path: '',
        title: 'Field planning · Fieldcurve',
        loadComponent: () => import('./planning-studies-page').then((m) => m.PlanningStudiesPage),
      },
      {
        path: ':studyId',
        providers: [PlanningStudy],
        loadComponent: () => import('./planning-study-shell').then((m) => m.PlanningStudyShell),
        children: [
          { path: '', pathMatch: 'full', redirectTo: 'points' },
          {
            path: 'points',
            title: 'Sampling points · Fieldcurve',
            loadComponent: () =>
              import('./points/sampling-points-page').then((m) => m.SamplingPointsPage),
          },
          {
            path: 'routes',
            title: 'Routes · Fieldcurve',
            loadComponent: () => import('./routes/routes-page').then((m) => m.RoutesPage),
          },
          {
            path: 'routes/new',
            title: 'New route · Fieldcurve',
            loadComponent: () =>
              import('./routes/route-builder-page').then((m) => m.RouteBuilderPage),
          },
          {
            path: 'routes/:routeId',
            title: 'Route · Fieldcurve',
            loadComponent: () =>
              import('./routes/route-builder-page').then((m) => m.RouteBuilderPage),
          },
          {
            path: 'progress',
            title: 'Progress · Fieldcurve',
            loadComponent: () => import('./progress/progress-page').then((m) => m.ProgressPage),
          },
        ],
      },
    ],
  },
];
