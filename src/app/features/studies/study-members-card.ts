import {
  ChangeDetectionStrategy,
  Component,
  type OnInit,
  computed,
  inject,
  input,
  signal,
} from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { roleLabels } from '@shared/auth/role';
import {
  type StudyMember,
  type StudyMemberCandidate,
  type StudyRole,
  studyRoles,
} from '@shared/studies/study-member';
import { readApiProblem } from '../../core/api-problem';
import { StudiesApi } from './studies-api';

/** Who works on the study; researchers add people with roles they hold in the organisation. */
@Component({
  selector: 'app-study-members-card',
  imports: [
    FormsModule,
    MatButton,
    MatCardModule,
    MatCheckbox,
    MatFormFieldModule,
    MatIcon,
    MatIconButton,
    MatSelectModule,
  ],
  templateUrl: './study-members-card.html',
  styleUrl: './study-members-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyMembersCard implements OnInit {
  private readonly api = inject(StudiesApi);

  readonly studyId = input.required<string>();
  readonly canWrite = input(false);

  protected readonly labels = roleLabels;
  protected readonly members = signal<readonly StudyMember[]>([]);
  protected readonly candidates = signal<readonly StudyMemberCandidate[] | null>(null);
  protected readonly chosenUserId = signal<string | null>(null);
  protected readonly chosenRoles = signal<readonly StudyRole[]>([]);
  protected readonly problem = signal<string | null>(null);
  protected readonly chosen = computed(
    () => this.candidates()?.find((c) => c.userId === this.chosenUserId()) ?? null,
  );
  /** The study roles the chosen person may be given: those they hold in the organisation. */
  protected readonly offeredRoles = computed(() =>
    studyRoles.filter((role) => this.chosen()?.organisationRoles.includes(role)),
  );

  ngOnInit(): void {
    this.reload();
  }

  protected choosePerson(userId: string): void {
    this.chosenUserId.set(userId);
    this.chosenRoles.set(this.offeredRoles().slice(0, 1));
  }

  protected toggleRole(role: StudyRole, checked: boolean): void {
    const others = this.chosenRoles().filter((held) => held !== role);
    const next = checked ? [...others, role] : others;
    this.chosenRoles.set(studyRoles.filter((r) => next.includes(r)));
  }

  protected addMember(): void {
    const userId = this.chosenUserId();
    if (!userId) return;
    this.problem.set(null);
    this.api.setMember(this.studyId(), userId, [...this.chosenRoles()]).subscribe({
      next: () => {
        this.chosenUserId.set(null);
        this.chosenRoles.set([]);
        this.reload();
      },
      error: (error: unknown) => this.showProblem(error),
    });
  }

  protected removeMember(member: StudyMember): void {
    this.problem.set(null);
    this.api.removeMember(this.studyId(), member.userId).subscribe({
      next: () => this.reload(),
      error: (error: unknown) => this.showProblem(error),
    });
  }

  private showProblem(error: unknown): void {
    const problem = readApiProblem(error);
    this.problem.set(problem.issues[0]?.message ?? problem.message);
  }

  private reload(): void {
    this.api.members(this.studyId()).subscribe({
      next: (members) => this.members.set(members),
      error: (error: unknown) => this.showProblem(error),
    });
    if (!this.canWrite()) return;
    this.api.candidates(this.studyId()).subscribe({
      next: (candidates) =>
        this.candidates.set(
          candidates.filter((c) =>
            c.organisationRoles.some((r) => (studyRoles as readonly string[]).includes(r)),
          ),
        ),
      error: (error: unknown) => this.showProblem(error),
    });
  }
}
