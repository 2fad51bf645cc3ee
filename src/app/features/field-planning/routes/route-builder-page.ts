import {
  ChangeDetectionStrategy,
  Component,
  inject,
  input,
  signal,
  type OnInit,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { DateAdapter, MAT_DATE_FORMATS } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import { forkJoin } from 'rxjs';
import type { StudyEnumerator } from '@shared/routes/field-route';
import { readApiProblem } from '../../../core/api-problem';
import { FieldPlanningApi } from '../field-planning-api';
import { fromIsoDay, toIsoDay } from '../iso-day';
import { PlanningStudy } from '../planning-study';
import { PointPicker } from './point-picker';
import { RouteBuilderState } from './route-builder-state';
import { StopListEditor } from './stop-list-editor';
import { dayExample, windowDayProblem, type WindowEnd } from './window-day-problem';

/** Builds a new route or changes one: points in visiting order, quotas, dates and enumerator. */
@Component({
  selector: 'app-route-builder-page',
  imports: [
    MatButton,
    MatCardModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatInput,
    MatProgressBar,
    MatSelectModule,
    PointPicker,
    ReactiveFormsModule,
    RouterLink,
    StopListEditor,
  ],
  providers: [RouteBuilderState],
  templateUrl: './route-builder-page.html',
  styleUrl: './route-builder-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RouteBuilderPage implements OnInit {
  private readonly api = inject(FieldPlanningApi);
  private readonly router = inject(Router);
  protected readonly planning = inject(PlanningStudy);
  protected readonly state = inject(RouteBuilderState);

  /** From the path; absent for a new route. */
  readonly routeId = input<string>();

  protected readonly enumerators = signal<readonly StudyEnumerator[]>([]);
  protected readonly loading = signal(true);
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);

  /**
   * The window as form controls: the date inputs own what is being typed, so a half-typed day is
   * never overwritten by the last saved one; each change is handed to the state.
   */
  protected readonly dates = new FormGroup({
    start: new FormControl<Date | null>(null),
    end: new FormControl<Date | null>(null),
  });
  protected readonly windowEnds: readonly WindowEnd[] = ['windowStart', 'windowEnd'];
  protected readonly example = dayExample(
    inject<DateAdapter<Date>>(DateAdapter),
    inject(MAT_DATE_FORMATS),
  );

  constructor() {
    this.dates.valueChanges.pipe(takeUntilDestroyed()).subscribe(({ start, end }) => {
      this.state.setWindow(start ? toIsoDay(start) : '', end ? toIsoDay(end) : '');
    });
  }

  ngOnInit(): void {
    const studyId = this.planning.studyId();
    const routeId = this.routeId();
    forkJoin({
      points: this.api.points(studyId),
      enumerators: this.api.enumerators(studyId),
    }).subscribe({
      next: ({ points, enumerators }) => {
        this.state.setPoints(points);
        this.enumerators.set(enumerators);
        if (!routeId) return this.loading.set(false);
        this.api.route(studyId, routeId).subscribe({
          next: (route) => {
            this.state.load(route);
            this.dates.setValue(
              { start: fromIsoDay(route.windowStart), end: fromIsoDay(route.windowEnd) },
              { emitEvent: false },
            );
            this.loading.set(false);
          },
          error: (error: unknown) => this.fail(error),
        });
      },
      error: (error: unknown) => this.fail(error),
    });
  }

  protected windowProblemAt(end: WindowEnd): string | null {
    const day = end === 'windowStart' ? this.state.windowStart() : this.state.windowEnd();
    return windowDayProblem(end, day, this.state.problemAt(end), this.example);
  }

  protected nameFrom(event: Event): string {
    return (event.target as HTMLInputElement).value;
  }

  protected saveRoute(): void {
    this.state.showProblems.set(true);
    if (!this.state.valid()) return;
    const studyId = this.planning.studyId();
    const routeId = this.routeId();
    const input = this.state.input();
    this.saving.set(true);
    this.failure.set(null);
    const request = routeId
      ? this.api.updateRoute(studyId, routeId, input)
      : this.api.createRoute(studyId, input);
    request.subscribe({
      next: () => void this.router.navigate(['/field-planning', studyId, 'routes']),
      error: (error: unknown) => {
        const problem = readApiProblem(error);
        if (problem.issues.length > 0) this.state.refusedWith(problem.issues);
        this.failure.set(problem.message);
        this.saving.set(false);
      },
    });
  }

  private fail(error: unknown): void {
    this.failure.set(readApiProblem(error).message);
    this.loading.set(false);
  }
}
