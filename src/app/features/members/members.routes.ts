import { Routes } from '@angular/router';
import { MembersPage } from './members-page';

export const membersRoutes: Routes = [
  { path: '', component: MembersPage, title: 'Members · Fieldcurve' },
];
