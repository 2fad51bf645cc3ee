import { Injectable, computed, inject, signal } from '@angular/core';
import type { Study } from '@shared/studies/study';
import { readApiProblem } from '../../core/api-problem';
import { FieldPlanningApi } from './field-planning-api';

/**
 * The study a field-planning page works in, shared by the study's tabs. Supervisors of the study
 * change its points and routes; researchers see the same pages read-only.
 */
@Injectable()
export class PlanningStudy {
  private readonly api = inject(FieldPlanningApi);
  private readonly loaded = signal<Study | null>(null);
  private readonly failure = signal<string | null>(null);

  readonly study = this.loaded.asReadonly();
  readonly loadError = this.failure.asReadonly();
  readonly studyId = computed(() => this.loaded()?.id ?? '');
  readonly canEdit = computed(() => this.loaded()?.myRoles.includes('supervisor') ?? false);

  load(studyId: string): void {
    if (this.loaded()?.id === studyId) return;
    this.failure.set(null);
    this.api.study(studyId).subscribe({
      next: (study) => this.loaded.set(study),
      error: (error: unknown) => this.failure.set(readApiProblem(error).message),
    });
  }
}
