import { Routes } from '@angular/router';
import { roleGuard, signedInGuard, signedOutGuard } from './core/auth-guard';

export const routes: Routes = [
  {
    path: 'welcome',
    canActivate: [signedOutGuard],
    loadChildren: () => import('./features/welcome/welcome.routes').then((m) => m.welcomeRoutes),
  },
  {
    path: '',
    // Lazy too: a signed-out visitor downloads neither the shell nor its Material parts.
    loadComponent: () => import('./core/app-shell/app-shell').then((m) => m.AppShell),
    canActivate: [signedInGuard],
    children: [
      {
        path: 'members',
        canMatch: [roleGuard('admin')],
        loadChildren: () =>
          import('./features/members/members.routes').then((m) => m.membersRoutes),
      },
      {
        path: 'studies',
        canMatch: [roleGuard('researcher', 'supervisor', 'enumerator', 'client')],
        loadChildren: () =>
          import('./features/studies/studies.routes').then((m) => m.studiesRoutes),
      },
      {
        path: 'field',
        canMatch: [roleGuard('enumerator')],
        loadChildren: () => import('./features/field/field.routes').then((m) => m.fieldRoutes),
      },
      {
        path: 'field-planning',
        canMatch: [roleGuard('supervisor', 'researcher')],
        loadChildren: () =>
          import('./features/field-planning/field-planning.routes').then(
            (m) => m.fieldPlanningRoutes,
          ),
      },
      {
        path: 'review',
        canMatch: [roleGuard('supervisor')],
        loadChildren: () => import('./features/review/review.routes').then((m) => m.reviewRoutes),
      },
      {
        path: 'analysis',
        canMatch: [roleGuard('researcher')],
        loadChildren: () =>
          import('./features/analysis/analysis.routes').then((m) => m.analysisRoutes),
      },
      {
        path: 'data',
        canMatch: [roleGuard('researcher')],
        loadChildren: () =>
          import('./features/datasets/datasets.routes').then((m) => m.datasetsRoutes),
      },
      {
        path: 'reports',
        canMatch: [roleGuard('client')],
        loadChildren: () => import('./features/portal/portal.routes').then((m) => m.portalRoutes),
      },
      {
        path: 'devices',
        canMatch: [roleGuard('admin', 'supervisor')],
        loadChildren: () =>
          import('./features/devices/devices.routes').then((m) => m.devicesRoutes),
      },
      {
        path: 'system-health',
        canMatch: [roleGuard('admin')],
        loadChildren: () =>
          import('./features/system-health/system-health.routes').then((m) => m.systemHealthRoutes),
      },
      {
        path: '',
        pathMatch: 'full',
        loadChildren: () => import('./features/home/home.routes').then((m) => m.homeRoutes),
      },
    ],
  },
  {
    path: '**',
    title: 'Page not found · Fieldcurve',
    loadComponent: () => import('./features/not-found/not-found-page').then((m) => m.NotFoundPage),
  },
];
