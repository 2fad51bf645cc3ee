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
