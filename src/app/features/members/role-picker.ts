import { ChangeDetectionStrategy, Component, input, model } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import { type Role, roleLabels, roles } from '@shared/auth/roles';

let nextPickerId = 0;

/** One checkbox per role; the chosen roles are two-way bound through `selected`. */
@Component({
  selector: 'app-role-picker',
  imports: [MatCheckbox],
  template: `
    <fieldset class="roles" [attr.aria-describedby]="error() ? errorId : null">
      <legend class="roles__legend">{{ legend() }}</legend>
      <div class="roles__options">
        @for (role of options; track role) {
          <mat-checkbox
            [checked]="selected().includes(role)"
            (change)="toggle(role, $event.checked)"
          >
            {{ labels[role] }}
          </mat-checkbox>
        }
      </div>
      @if (error(); as message) {
        <p class="roles__error" [id]="errorId" role="alert">{{ message }}</p>
      }
    </fieldset>
  `,
  styles: `
    .roles {
      border: 0;
      margin: 0 0 8px;
      padding: 0;
    }
    .roles__legend {
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
      padding: 0;
    }
    .roles__options {
      display: flex;
      flex-wrap: wrap;
      gap: 0 8px;
    }
    /* Rows 48 px apart so neighbouring touch targets do not overlap on a phone. */
    mat-checkbox {
      display: flex;
      align-items: center;
      min-height: 48px;
    }
    .roles__error {
      margin: 0 0 0 12px;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RolePicker {
  readonly selected = model<readonly Role[]>([]);
  readonly legend = input('Roles');
  readonly error = input<string | null | undefined>(null);

  protected readonly options = roles;
  protected readonly labels = roleLabels;
  protected readonly errorId = `role-picker-error-${nextPickerId++}`;

  protected toggle(role: Role, checked: boolean): void {
    const others = this.selected().filter((held) => held !== role);
    // Keep the canonical order so the list reads the same everywhere.
    const next = checked ? [...others, role] : others;
    this.selected.set(roles.filter((r) => next.includes(r)));
  }
}
