import {
  ChangeDetectionStrategy,
  Component,
  type OnInit,
  inject,
  input,
  signal,
} from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import type { Questionnaire } from '@shared/questionnaire/questionnaire-resource';
import { readApiProblem } from '../../core/api-problem';
import { QuestionnairesApi } from './questionnaires-api';

/** The study's questionnaires and their newest versions; researchers start new ones. */
@Component({
  selector: 'app-study-questionnaires-card',
  imports: [
    FormsModule,
    MatButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatInput,
    RouterLink,
  ],
  templateUrl: './study-questionnaires-card.html',
  styleUrl: './study-members-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyQuestionnairesCard implements OnInit {
  private readonly api = inject(QuestionnairesApi);
  private readonly router = inject(Router);

  readonly studyId = input.required<string>();
  readonly canWrite = input(false);

  protected readonly questionnaires = signal<readonly Questionnaire[]>([]);
  protected readonly title = signal('');
  protected readonly problem = signal<string | null>(null);

  ngOnInit(): void {
    this.api.list(this.studyId()).subscribe({
      next: (list) => this.questionnaires.set(list),
      error: (error: unknown) => this.problem.set(readApiProblem(error).message),
    });
  }

  protected createQuestionnaire(): void {
    this.problem.set(null);
    this.api.create(this.studyId(), this.title()).subscribe({
      next: (created) =>
        void this.router.navigate(['/studies', this.studyId(), 'questionnaires', created.id]),
      error: (error: unknown) => {
        const problem = readApiProblem(error);
        this.problem.set(problem.issues[0]?.message ?? problem.message);
      },
    });
  }
}
