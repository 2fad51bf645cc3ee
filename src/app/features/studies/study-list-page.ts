import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../../core/api-problem';
import { Session } from '../../core/session';
import { StudiesApi } from './studies-api';
import { StudyStatusChip } from './study-status-chip';
import { PriceRange } from './price-range';

/** The studies the signed-in person works on; researchers start new ones here. */
@Component({
  selector: 'app-study-list-page',
  imports: [
    MatButton,
    MatCardModule,
    MatIcon,
    MatProgressBar,
    PriceRange,
    RouterLink,
    StudyStatusChip,
  ],
  templateUrl: './study-list-page.html',
  styleUrl: './study-list-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyListPage {
  private readonly api = inject(StudiesApi);

  protected readonly canCreate = inject(Session).hasRole('researcher');
  protected readonly studies = signal<readonly Study[]>([]);
  protected readonly loading = signal(true);
  protected readonly loadError = signal<string | null>(null);

  constructor() {
    this.loadStudies();
  }

  protected loadStudies(): void {
    this.loading.set(true);
    this.loadError.set(null);
    this.api.list().subscribe({
      next: (studies) => {
        this.studies.set(studies);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.loadError.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }
}
