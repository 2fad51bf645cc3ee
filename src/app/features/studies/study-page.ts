import {
  ChangeDetectionStrategy,
  Component,
  type OnInit,
  computed,
  inject,
  input,
  signal,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { Study } from '@shared/studies/study';
import { nextStudyStatus, studyStatusLabels } from '@shared/studies/study-status-change';
import { readApiProblem } from '../../core/api-problem';
import { PriceRange } from './price-range';
import { StudiesApi } from './studies-api';
import { StudyMembersCard } from './study-members-card';
import { StudyQuestionnairesCard } from './study-questionnaires-card';
import { StudyRawDataCard } from './study-raw-data-card';
import { StudyStatusChip } from './study-status-chip';

const statusActions = { in_field: 'Send into the field', closed: 'Close the study' } as const;

/**
 * One study: what it prices, its status, who works on it, its questionnaires and, for
 * researchers and supervisors, its raw data.
 */
@Component({
  selector: 'app-study-page',
  imports: [
    MatButton,
    MatCardModule,
    MatIcon,
    MatProgressBar,
    PriceRange,
    RouterLink,
    StudyMembersCard,
    StudyQuestionnairesCard,
    StudyRawDataCard,
    StudyStatusChip,
  ],
  templateUrl: './study-page.html',
  styleUrl: './study-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyPage implements OnInit {
  private readonly api = inject(StudiesApi);

  readonly studyId = input.required<string>();

  protected readonly study = signal<Study | null>(null);
  protected readonly loadError = signal<string | null>(null);
  protected readonly statusError = signal<string | null>(null);
  protected readonly changing = signal(false);
  protected readonly isResearcher = computed(
    () => this.study()?.myRoles.includes('researcher') ?? false,
  );
  protected readonly seesMembers = computed(() =>
    (this.study()?.myRoles ?? []).some((role) => role === 'researcher' || role === 'supervisor'),
  );
  protected readonly seesQuestionnaires = computed(() =>
    (this.study()?.myRoles ?? []).some((role) => role !== 'client'),
  );
  protected readonly nextStatus = computed(() => {
    const study = this.study();
    const next = study ? nextStudyStatus[study.status] : null;
    return next === 'in_field' || next === 'closed'
      ? { status: next, label: statusActions[next] }
      : null;
  });
  protected readonly statusLabels = studyStatusLabels;

  ngOnInit(): void {
    this.api.get(this.studyId()).subscribe({
      next: (study) => this.study.set(study),
      error: (error: unknown) => this.loadError.set(readApiProblem(error).message),
    });
  }

  protected moveStatus(): void {
    const next = this.nextStatus();
    if (!next || this.changing()) return;
    this.changing.set(true);
    this.statusError.set(null);
    this.api.changeStatus(this.studyId(), next.status).subscribe({
      next: (study) => {
        this.study.set(study);
        this.changing.set(false);
      },
      error: (error: unknown) => {
        this.statusError.set(readApiProblem(error).message);
        this.changing.set(false);
      },
    });
  }
}
