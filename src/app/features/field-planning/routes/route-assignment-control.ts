import {
  ChangeDetectionStrategy,
  Component,
  computed,
  inject,
  input,
  linkedSignal,
  output,
  signal,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import type { FieldRoute, StudyEnumerator } from '@shared/routes/field-route';
import { readApiProblem } from '../../../core/api-problem';
import { FieldPlanningApi } from '../field-planning-api';

/** Picks the route's enumerator and assigns it; the enumerator gets the route by e-mail. */
@Component({
  selector: 'app-route-assignment-control',
  imports: [MatButton, MatFormFieldModule, MatSelectModule],
  template: `
    <div class="assign">
      <mat-form-field class="assign__select" subscriptSizing="dynamic">
        <mat-label>Enumerator for {{ route().name }}</mat-label>
        <mat-select [value]="chosen()" (selectionChange)="chosen.set($event.value)">
          @for (person of enumerators(); track person.userId) {
            <mat-option [value]="person.userId">{{ person.name }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <button
        mat-flat-button
        type="button"
        [disabled]="!chosen() || sending()"
        (click)="assignRoute()"
      >
        {{ actionLabel() }}<span class="fc-visually-hidden"> {{ route().name }}</span>
      </button>
    </div>
    @if (problem(); as message) {
      <p class="assign__problem" role="alert">{{ message }}</p>
    }
  `,
  styles: `
    .assign {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 8px;
    }
    .assign__select {
      flex: 1 1 12rem;
    }
    .assign button {
      min-height: 48px;
    }
    .assign__problem {
      color: var(--mat-sys-error);
      margin: 4px 0 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RouteAssignmentControl {
  private readonly api = inject(FieldPlanningApi);

  readonly route = input.required<FieldRoute>();
  readonly enumerators = input.required<readonly StudyEnumerator[]>();
  readonly assigned = output<FieldRoute>();

  protected readonly chosen = linkedSignal(() => this.route().enumerator?.userId ?? null);
  protected readonly sending = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly actionLabel = computed(() => {
    const current = this.route().enumerator?.userId;
    if (!current) return 'Assign';
    return this.chosen() === current ? 'Send again' : 'Reassign';
  });

  protected assignRoute(): void {
    const route = this.route();
    this.sending.set(true);
    this.problem.set(null);
    this.api.assign(route.studyId, route.id, this.chosen()).subscribe({
      next: (updated) => {
        this.sending.set(false);
        this.assigned.emit(updated);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        this.problem.set(readApiProblem(error).message);
      },
    });
  }
}
