import { Routes } from '@angular/router';

/** Field devices of a study, for admins and supervisors. */
export const devicesRoutes: Routes = [
  {
    path: '',
    title: 'Field devices · Fieldcurve',
    loadComponent: () => import('./devices-studies-page').then((m) => m.DevicesStudiesPage),
  },
  {
    path: ':studyId',
    title: 'Study devices · Fieldcurve',
    loadComponent: () => import('./devices-page').then((m) => m.DevicesPage),
  },
];
