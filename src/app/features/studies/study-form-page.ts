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
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import type { FieldIssue } from '@shared/http/api-error';
import { formatMoney } from '@shared/money/format-money';
import { parseMoney } from '@shared/money/parse-money';
import { type Study, studyCreateSchema, studyUpdateSchema } from '@shared/studies/study';
import { readApiProblem } from '../../core/api-problem';
import { currencyChoices } from './currency-choices';
import { StudiesApi } from './studies-api';
import { emptyStudyForm, formToStudy, type StudyFormValue, studyToForm } from './study-form-fields';

type FieldName = keyof StudyFormValue;
const pathToField: Record<string, FieldName> = {
  priceMinMinor: 'priceMin',
  priceMaxMinor: 'priceMax',
};

/** Creates a study, or edits one when the route names it. */
@Component({
  selector: 'app-study-form-page',
  imports: [
    FormsModule,
    MatButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatInput,
    MatSelectModule,
    RouterLink,
  ],
  templateUrl: './study-form-page.html',
  styleUrl: './study-form-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyFormPage implements OnInit {
  private readonly api = inject(StudiesApi);
  private readonly router = inject(Router);

  /** From the route; absent when creating. */
  readonly studyId = input<string>();

  protected readonly currencies = currencyChoices();
  protected readonly form = signal<StudyFormValue>({ ...emptyStudyForm });
  protected readonly errors = signal<Partial<Record<FieldName, string>>>({});
  protected readonly formError = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly editing = computed(() => this.studyId() !== undefined);

  ngOnInit(): void {
    this.loadStudy();
  }

  protected set(field: FieldName, value: string): void {
    this.form.update((form) => ({ ...form, [field]: value }));
    this.errors.update((errors) => ({ ...errors, [field]: undefined }));
  }

  /** How a typed price will be stored and shown, so a slip of the decimal point is seen. */
  protected pricePreview(text: string): string {
    const { currency, locale } = this.form();
    if (text.trim() === '') return `Typed in ${currency}`;
    try {
      const parsed = parseMoney(text, currency, locale);
      return parsed.ok ? `Shown as ${formatMoney(parsed.minor, currency, locale)}` : '';
    } catch {
      return '';
    }
  }

  protected saveStudy(): void {
    if (this.saving()) return;
    this.formError.set(null);
    const { study, issues } = formToStudy(this.form());
    const schema = this.editing() ? studyUpdateSchema : studyCreateSchema;
    const parsed = schema.safeParse(
      this.editing()
        ? study
        : { ...study, secondProductName: study.secondProductName ?? undefined },
    );
    const schemaIssues = parsed.success
      ? []
      : parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    if (issues.length + schemaIssues.length > 0 || !parsed.success) {
      this.showIssues([...issues, ...schemaIssues]);
      return;
    }
    this.saving.set(true);
    const id = this.studyId();
    const request = id
      ? this.api.update(id, parsed.data)
      : this.api.create(studyCreateSchema.parse(parsed.data));
    request.subscribe({
      next: (saved: Study) => void this.router.navigate(['/studies', saved.id]),
      error: (error: unknown) => {
        this.saving.set(false);
        const problem = readApiProblem(error);
        if (problem.issues.length > 0) this.showIssues(problem.issues);
        else this.formError.set(problem.message);
      },
    });
  }

  private showIssues(issues: readonly FieldIssue[]): void {
    const errors: Partial<Record<FieldName, string>> = {};
    for (const issue of issues) {
      const head = issue.path.split('.')[0];
      const field = pathToField[head] ?? head;
      if (field in emptyStudyForm) errors[field] ??= issue.message;
      else this.formError.set(issue.message);
    }
    this.errors.set(errors);
  }

  private loadStudy(): void {
    const id = this.studyId();
    if (!id) return;
    this.api.get(id).subscribe({
      next: (study) => this.form.set(studyToForm(study)),
      error: (error: unknown) => this.formError.set(readApiProblem(error).message),
    });
  }
}
