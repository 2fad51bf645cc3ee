import { Routes } from '@angular/router';
import { provideCharts, withDefaultRegisterables } from 'ng2-charts';
import { AnalysisStudiesPage } from './analysis-studies-page';
import { AnalysisWorkspace } from './analysis-workspace';

/** The researcher's analysis: a list of studies, then a workspace per study in five tabs. */
export const analysisRoutes: Routes = [
  {
    path: '',
    providers: [provideCharts(withDefaultRegisterables())],
    children: [
      { path: '', component: AnalysisStudiesPage, title: 'Analysis · Fieldcurve' },
      {
        path: ':studyId',
        component: AnalysisWorkspace,
        children: [
          { path: '', pathMatch: 'full', redirectTo: 'set-up' },
          {
            path: 'set-up',
            title: 'Set up a fit · Analysis · Fieldcurve',
            loadComponent: () => import('./setup/fit-setup-page').then((m) => m.FitSetupPage),
          },
          {
            path: 'results',
            title: 'Results · Analysis · Fieldcurve',
            loadComponent: () => import('./results/fit-results-page').then((m) => m.FitResultsPage),
          },
          {
            path: 'policy',
            title: 'Price policy · Analysis · Fieldcurve',
            loadComponent: () =>
              import('./simulator/policy-simulator-page').then((m) => m.PolicySimulatorPage),
          },
          {
            path: 'compare',
            title: 'Compare methods · Analysis · Fieldcurve',
            loadComponent: () =>
              import('./compare/fit-comparison-page').then((m) => m.FitComparisonPage),
          },
          {
            path: 'publish',
            title: 'Publish · Analysis · Fieldcurve',
            loadComponent: () => import('./publish/publish-page').then((m) => m.PublishPage),
          },
        ],
      },
    ],
  },
];
