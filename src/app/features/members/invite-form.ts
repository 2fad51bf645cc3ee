import { ChangeDetectionStrategy, Component, inject, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import type { Role } from '@shared/auth/roles';
import type { FieldIssue } from '@shared/http/api-error';
import { type Invitation, invitationRequestSchema } from '@shared/members/invitation';
import { readApiProblem } from '../../core/api-problem';
import { sortIssues } from './field-issues';
import { MembersApi } from './members-api';
import { RolePicker } from './role-picker';

const fields = ['name', 'email', 'roles'] as const;

/**
 * Invites a person by e-mail. The shared schema checks the form before it is sent, and the
 * server's field issues land on the same fields, so both speak with one voice.
 */
@Component({
  selector: 'app-invite-form',
  imports: [MatButton, MatFormFieldModule, MatIcon, MatInput, ReactiveFormsModule, RolePicker],
  templateUrl: './invite-form.html',
  styleUrl: './invite-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InviteForm {
  private readonly api = inject(MembersApi);

  readonly invited = output<Invitation>();

  protected readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true }),
    email: new FormControl('', { nonNullable: true }),
  });
  protected readonly roles = signal<readonly Role[]>([]);
  protected readonly rolesError = signal<string | null>(null);
  protected readonly formError = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly sentTo = signal<string | null>(null);

  protected submitInvitation(): void {
    if (this.sending()) return;
    this.clearMessages();
    const parsed = invitationRequestSchema.safeParse({
      ...this.form.getRawValue(),
      roles: this.roles(),
    });
    if (!parsed.success) {
      this.showIssues(
        parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })),
      );
      return;
    }
    this.sending.set(true);
    this.api.invite(parsed.data).subscribe({
      next: (invitation) => {
        this.sending.set(false);
        this.sentTo.set(invitation.email);
        this.form.reset();
        this.roles.set([]);
        this.invited.emit(invitation);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const problem = readApiProblem(error);
        if (problem.issues.length > 0) this.showIssues(problem.issues);
        else this.formError.set(problem.message);
      },
    });
  }

  protected chooseRoles(next: readonly Role[]): void {
    this.roles.set(next);
    this.rolesError.set(null);
  }

  private clearMessages(): void {
    this.formError.set(null);
    this.rolesError.set(null);
    this.sentTo.set(null);
  }

  private showIssues(issues: readonly FieldIssue[]): void {
    const { byField, unplaced } = sortIssues(issues, fields);
    for (const name of ['name', 'email'] as const) {
      const control = this.form.controls[name];
      control.setErrors(byField[name] ? { issue: byField[name] } : null);
      control.markAsTouched();
    }
    this.rolesError.set(byField.roles ?? null);
    this.formError.set(unplaced[0] ?? null);
  }
}
