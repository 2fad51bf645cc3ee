import { Routes } from '@angular/router';
import { WelcomePage } from './welcome-page';

export const welcomeRoutes: Routes = [
  { path: '', component: WelcomePage, title: 'Welcome · Fieldcurve' },
];
