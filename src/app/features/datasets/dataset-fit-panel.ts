import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { DecimalPipe, KeyValuePipe } from '@angular/common';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { ColumnMapping } from '@shared/datasets/dataset-columns';
import type { DatasetFitResource } from '@shared/datasets/dataset-fit-resource';
import type { DatasetFitSpec } from '@shared/datasets/dataset-fit-spec';
import type { DatasetResource } from '@shared/datasets/dataset-resource';
import { readApiProblem } from '../../core/api-problem';
import { DatasetsApi } from './datasets-api';

type CovariateRole = DatasetFitSpec['covariates'][number]['role'];

const formLabels = {
  loglog: 'Log-log (constant elasticity)',
  linear: 'Linear',
  semilog: 'Semi-log (log quantity on price)',
} as const;

const kindLabels = {
  'own-price': 'own price',
  'cross-price': 'cross price',
  income: 'income',
  other: 'other',
} as const;

/** The role a covariate takes unless the researcher changes it, from the column's mapping. */
function defaultRole(column: ColumnMapping): CovariateRole {
  if (column.role === 'other-price') return 'cross-price';
  if (column.role === 'income') return 'income';
  return 'other';
}

/**
 * Fit setup on an imported dataset: form, covariates (another product's price gives the
 * cross-price elasticity), fixed effects for groupings, weights, errors and an instrument;
 * runs in the database on a worker and shows the estimates with their intervals.
 */
@Component({
  selector: 'app-dataset-fit-panel',
  imports: [
    DecimalPipe,
    KeyValuePipe,
    MatButton,
    MatCardModule,
    MatCheckbox,
    MatFormFieldModule,
    MatProgressBar,
    MatSelectModule,
  ],
  templateUrl: './dataset-fit-panel.html',
  styleUrl: './data-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DatasetFitPanel {
  private readonly api = inject(DatasetsApi);

  readonly studyId = input.required<string>();
  readonly datasets = input.required<DatasetResource[]>();

  protected readonly formLabels = formLabels;
  protected readonly kindLabels = kindLabels;
  protected readonly forms = Object.keys(formLabels) as DatasetFitSpec['form'][];
  protected readonly chosenId = signal<string | null>(null);
  protected readonly form = signal<DatasetFitSpec['form']>('loglog');
  protected readonly covariates = signal<Record<string, CovariateRole | null>>({});
  protected readonly effects = signal<string[]>([]);
  protected readonly weighted = signal(false);
  protected readonly errors = signal('hc1');
  protected readonly instrument = signal('none');
  protected readonly running = signal(false);
  protected readonly fit = signal<DatasetFitResource | null>(null);
  protected readonly message = signal<string | null>(null);

  protected readonly dataset = computed(
    () => this.datasets().find((d) => d.id === this.chosenId()) ?? this.datasets()[0],
  );
  private readonly stored = computed(() =>
    (this.dataset()?.columns ?? []).filter((c) => c.role !== 'ignore'),
  );
  protected readonly numeric = computed(() =>
    this.stored().filter(
      (c) => c.type === 'number' && !['price', 'quantity', 'weight'].includes(c.role),
    ),
  );
  protected readonly groupings = computed(() => this.stored().filter((c) => c.role === 'grouping'));
  protected readonly hasWeight = computed(() => this.stored().some((c) => c.role === 'weight'));
  protected readonly result = computed(() => this.fit()?.result ?? null);
  protected readonly level = computed(() =>
    Math.round(100 * (this.fit()?.spec.confidenceLevel ?? 0.95)),
  );

  protected chooseDataset(id: string): void {
    this.chosenId.set(id);
    this.covariates.set({});
    this.effects.set([]);
    this.instrument.set('none');
    this.errors.set('hc1');
  }

  protected toggleCovariate(column: ColumnMapping, on: boolean): void {
    this.covariates.update((all) => ({ ...all, [column.name]: on ? defaultRole(column) : null }));
  }

  protected setCovariateRole(name: string, role: CovariateRole): void {
    this.covariates.update((all) => ({ ...all, [name]: role }));
  }

  protected toggleEffect(name: string, on: boolean): void {
    this.effects.update((all) => (on ? [...all, name] : all.filter((n) => n !== name)));
  }

  protected run(): void {
    const dataset = this.dataset();
    if (!dataset) return;
    const errors = this.errors();
    const spec: DatasetFitSpec = {
      form: this.form(),
      covariates: Object.entries(this.covariates())
        .filter((entry): entry is [string, CovariateRole] => entry[1] !== null)
        .map(([column, role]) => ({ column, role })),
      fixedEffects: this.effects(),
      weighted: this.weighted(),
      standardErrors: errors.startsWith('cluster:')
        ? { type: 'cluster', column: errors.slice('cluster:'.length) }
        : { type: errors as 'classical' | 'hc1' },
      instruments: this.instrument() === 'none' ? [] : [this.instrument()],
      confidenceLevel: 0.95,
    };
    this.running.set(true);
    this.message.set(null);
    this.fit.set(null);
    this.api.fit(this.studyId(), dataset.id, spec).subscribe({
      next: ({ fitId }) => this.follow(fitId),
      error: (error: unknown) => this.fail(error),
    });
  }

  private follow(fitId: string): void {
    this.api.getFit(this.studyId(), fitId).subscribe({
      next: (fit) => {
        if (fit.status === 'queued' || fit.status === 'running') {
          setTimeout(() => this.follow(fitId), 400);
          return;
        }
        this.running.set(false);
        this.fit.set(fit);
        if (fit.error) this.message.set(fit.error.message);
      },
      error: (error: unknown) => this.fail(error),
    });
  }

  private fail(error: unknown): void {
    this.running.set(false);
    const problem = readApiProblem(error);
    const where = problem.issues.map((i) => `${i.path}: ${i.message}`).join('; ');
    this.message.set(where ? `${problem.message} (${where})` : problem.message);
  }
}
