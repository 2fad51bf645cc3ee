import { Routes } from '@angular/router';

export const datasetsRoutes: Routes = [
  {
    path: ':studyId',
    title: 'Study data · Fieldcurve',
    loadComponent: () => import('./data-page').then((m) => m.DataPage),
  },
];
