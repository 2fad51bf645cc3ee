import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { CsvProblem } from '@shared/sampling/csv-problem';
import { samplingCsvColumns } from '@shared/sampling/sampling-csv-columns';
import type { SamplingImportResult, SamplingPoint } from '@shared/sampling/sampling-point';
import { readApiProblem } from '../../../core/api-problem';
import { FieldPlanningApi } from '../field-planning-api';
import { PlanningStudy } from '../planning-study';
import { csvProblemsOf } from './csv-problems-of';
import { CsvDropZone, type PickedFile } from './csv-drop-zone';
import { CsvProblemTable } from './csv-problem-table';
import { PointTable } from './point-table';

/** Upload a study's sampling points from a CSV file and see them, or every problem in the file. */
@Component({
  selector: 'app-sampling-points-page',
  imports: [MatCardModule, MatProgressBar, RouterLink, CsvDropZone, CsvProblemTable, PointTable],
  templateUrl: './sampling-points-page.html',
  styleUrl: './sampling-points-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SamplingPointsPage {
  private readonly api = inject(FieldPlanningApi);
  protected readonly planning = inject(PlanningStudy);
  protected readonly columns = samplingCsvColumns;

  protected readonly points = signal<readonly SamplingPoint[]>([]);
  protected readonly loading = signal(true);
  protected readonly uploading = signal(false);
  protected readonly problems = signal<readonly CsvProblem[]>([]);
  protected readonly refusedFile = signal('');
  protected readonly outcome = signal<SamplingImportResult | null>(null);
  protected readonly failure = signal<string | null>(null);

  constructor() {
    this.api.points(this.planning.studyId()).subscribe({
      next: (points) => {
        this.points.set(points);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.failure.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }

  protected importFile(file: PickedFile): void {
    this.uploading.set(true);
    this.problems.set([]);
    this.outcome.set(null);
    this.failure.set(null);
    this.api.importPoints(this.planning.studyId(), file.text).subscribe({
      next: (result) => {
        this.outcome.set(result);
        this.points.set(result.points);
        this.uploading.set(false);
      },
      error: (error: unknown) => {
        const problems = csvProblemsOf(error);
        if (problems) {
          this.problems.set(problems);
          this.refusedFile.set(file.name);
        } else {
          this.failure.set(readApiProblem(error).message);
        }
        this.uploading.set(false);
      },
    });
  }
}
