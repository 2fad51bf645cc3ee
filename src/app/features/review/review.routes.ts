import { Routes } from '@angular/router';

/** The supervisor's review pages. */
export const reviewRoutes: Routes = [
  {
    path: '',
    title: 'Review · Fieldcurve',
    loadComponent: () => import('./review-studies-page').then((m) => m.ReviewStudiesPage),
  },
  {
    path: ':studyId',
    title: 'Review queue · Fieldcurve',
    loadComponent: () => import('./review-queue-page').then((m) => m.ReviewQueuePage),
  },
  {
    path: ':studyId/interviews/:interviewId',
    title: 'Interview review · Fieldcurve',
    loadComponent: () => import('./interview-review-page').then((m) => m.InterviewReviewPage),
  },
];
