import { MAT_FORM_FIELD_DEFAULT_OPTIONS } from '@angular/material/form-field';
import { Routes } from '@angular/router';
import { roleGuard } from '../../core/auth-guard';
import { unsavedChangesGuard } from './questionnaire-editor/unsaved-changes-guard';

export const studiesRoutes: Routes = [
  {
    path: '',
    // Hints and errors take the room they need: on a phone they run to two lines.
    providers: [
      { provide: MAT_FORM_FIELD_DEFAULT_OPTIONS, useValue: { subscriptSizing: 'dynamic' } },
    ],
    children: [
      {
        path: '',
        title: 'Studies · Fieldcurve',
        loadComponent: () => import('./study-list-page').then((m) => m.StudyListPage),
      },
      {
        path: 'new',
        title: 'New study · Fieldcurve',
        canMatch: [roleGuard('researcher')],
        loadComponent: () => import('./study-form-page').then((m) => m.StudyFormPage),
      },
      {
        path: ':studyId',
        title: 'Study · Fieldcurve',
        loadComponent: () => import('./study-page').then((m) => m.StudyPage),
      },
      {
        path: ':studyId/edit',
        title: 'Edit study · Fieldcurve',
        canMatch: [roleGuard('researcher')],
        loadComponent: () => import('./study-form-page').then((m) => m.StudyFormPage),
      },
      {
        path: ':studyId/questionnaires/:questionnaireId',
        title: 'Questionnaire · Fieldcurve',
        canDeactivate: [unsavedChangesGuard],
        loadComponent: () =>
          import('./questionnaire-editor/questionnaire-editor-page').then(
            (m) => m.QuestionnaireEditorPage,
          ),
      },
    ],
  },
];
