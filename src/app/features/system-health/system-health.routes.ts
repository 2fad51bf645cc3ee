import { Routes } from '@angular/router';
import { SystemHealthPage } from './system-health-page';

export const systemHealthRoutes: Routes = [
  { path: '', component: SystemHealthPage, title: 'System health · Fieldcurve' },
];
