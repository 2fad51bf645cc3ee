import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { QuestionnaireDefinition } from '@shared/questionnaire/questionnaire-definition';
import type {
  Questionnaire,
  QuestionnaireVersion,
} from '@shared/questionnaire/questionnaire-resource';
import { withoutErrorNotice } from '../../core/error-notice-context';
import { studyPath } from './studies-api';

/** The questionnaire endpoints of one study. */
@Injectable({ providedIn: 'root' })
export class QuestionnairesApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  list(studyId: string): Observable<Questionnaire[]> {
    return this.http.get<Questionnaire[]>(`${studyPath(studyId)}/questionnaires`, this.quiet);
  }

  create(studyId: string, title: string): Observable<Questionnaire> {
    return this.http.post<Questionnaire>(
      `${studyPath(studyId)}/questionnaires`,
      { title },
      this.quiet,
    );
  }

  get(studyId: string, questionnaireId: string): Observable<Questionnaire> {
    return this.http.get<Questionnaire>(path(studyId, questionnaireId), this.quiet);
  }

  version(studyId: string, questionnaireId: string, version: number) {
    return this.http.get<QuestionnaireVersion>(
      `${path(studyId, questionnaireId)}/versions/${version}`,
      this.quiet,
    );
  }

  saveDraft(studyId: string, questionnaireId: string, definition: QuestionnaireDefinition) {
    return this.http.put<QuestionnaireVersion>(
      `${path(studyId, questionnaireId)}/draft`,
      { definition },
      this.quiet,
    );
  }

  publish(studyId: string, questionnaireId: string, version: number) {
    return this.http.post<QuestionnaireVersion>(
      `${path(studyId, questionnaireId)}/versions/${version}/publish`,
      null,
      this.quiet,
    );
  }

  newDraft(studyId: string, questionnaireId: string): Observable<QuestionnaireVersion> {
    return this.http.post<QuestionnaireVersion>(
      `${path(studyId, questionnaireId)}/new-draft`,
      null,
      this.quiet,
    );
  }
}

const path = (studyId: string, questionnaireId: string) =>
  `${studyPath(studyId)}/questionnaires/${encodeURIComponent(questionnaireId)}`;
