import {
  ChangeDetectionStrategy,
  Component,
  type OnDestroy,
  type OnInit,
  computed,
  inject,
  input,
  signal,
} from '@angular/core';
import { DatePipe, DecimalPipe } from '@angular/common';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import {
  columnRoles,
  columnTypes,
  typeOfRole,
  type ColumnMapping,
  type ColumnRole,
} from '@shared/datasets/dataset-columns';
import type { DatasetResource, ImportProblem } from '@shared/datasets/dataset-resource';
import type { UploadPreview, UploadState } from '@shared/datasets/dataset-upload';
import { readApiProblem } from '../../core/api-problem';
import { DatasetFitPanel } from './dataset-fit-panel';
import { DatasetsApi } from './datasets-api';
import { roleLabels } from './role-labels';
import { uploadFile } from './upload-file';

/**
 * A study's data area: bring a CSV or XLSX table in (chunked upload with the server's count as
 * progress, preview, column mapping, import with problems by line and column), list and delete
 * datasets, and fit demand models on them.
 */
@Component({
  selector: 'app-data-page',
  imports: [
    DatasetFitPanel,
    DatePipe,
    DecimalPipe,
    MatButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatInput,
    MatProgressBar,
    MatSelectModule,
    RouterLink,
  ],
  templateUrl: './data-page.html',
  styleUrl: './data-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DataPage implements OnInit, OnDestroy {
  private readonly api = inject(DatasetsApi);
  private polling: ReturnType<typeof setTimeout> | undefined;

  readonly studyId = input.required<string>();

  protected readonly roles = columnRoles;
  protected readonly types = columnTypes;
  protected readonly roleLabels = roleLabels;
  protected readonly datasets = signal<DatasetResource[]>([]);
  protected readonly upload = signal<UploadState | null>(null);
  protected readonly preview = signal<UploadPreview | null>(null);
  protected readonly mapping = signal<ColumnMapping[]>([]);
  protected readonly name = signal('');
  protected readonly importing = signal<DatasetResource | null>(null);
  protected readonly problems = signal<readonly ImportProblem[]>([]);
  protected readonly message = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected readonly imported = computed(() =>
    this.datasets().filter((d) => d.status === 'imported'),
  );
  protected readonly uploadPercent = computed(() => {
    const state = this.upload();
    return state ? (100 * state.receivedBytes) / state.totalBytes : 0;
  });
  protected readonly importPercent = computed(() => {
    const dataset = this.importing();
    return dataset && dataset.totalBytes > 0 ? (100 * dataset.bytesRead) / dataset.totalBytes : 0;
  });

  ngOnInit(): void {
    this.refresh();
  }

  ngOnDestroy(): void {
    clearTimeout(this.polling);
  }

  protected async chooseFile(event: Event): Promise<void> {
    const file = (event.target as HTMLInputElement).files?.[0];
    if (!file) return;
    this.reset();
    this.name.set(file.name.replace(/\.(csv|xlsx)$/i, ''));
    this.busy.set(true);
    try {
      const state = await uploadFile(this.api, this.studyId(), file, (s) => this.upload.set(s));
      const preview = await firstValueFrom(this.api.preview(this.studyId(), state.uploadId));
      this.preview.set(preview);
      this.mapping.set(preview.suggested as ColumnMapping[]);
    } catch (error) {
      this.message.set(readApiProblem(error).message);
    } finally {
      this.busy.set(false);
      (event.target as HTMLInputElement).value = '';
    }
  }

  protected setRole(index: number, role: ColumnRole): void {
    this.mapping.update((all) =>
      all.map((c, i) => (i === index ? { ...c, role, type: typeOfRole(role) } : c)),
    );
  }

  protected setField(index: number, field: 'name' | 'type', value: string): void {
    this.mapping.update((all) => all.map((c, i) => (i === index ? { ...c, [field]: value } : c)));
  }

  protected async startImport(): Promise<void> {
    const upload = this.upload();
    if (!upload) return;
    this.message.set(null);
    this.problems.set([]);
    this.busy.set(true);
    try {
      const { datasetId } = await firstValueFrom(
        this.api.importDataset(this.studyId(), {
          uploadId: upload.uploadId,
          name: this.name(),
          columns: this.mapping(),
        }),
      );
      this.follow(datasetId);
    } catch (error) {
      const problem = readApiProblem(error);
      this.message.set(problem.message);
      this.problems.set(
        problem.issues.map((issue) => ({ line: null, column: issue.path, message: issue.message })),
      );
      this.busy.set(false);
    }
  }

  protected async remove(dataset: DatasetResource): Promise<void> {
    this.message.set(null);
    try {
      await firstValueFrom(this.api.remove(this.studyId(), dataset.id));
      this.refresh();
    } catch (error) {
      this.message.set(readApiProblem(error).message);
    }
  }

  /** Polls the import until the worker has finished it. */
  private follow(datasetId: string): void {
    this.api.get(this.studyId(), datasetId).subscribe({
      next: (dataset) => {
        this.importing.set(dataset);
        if (dataset.status === 'importing') {
          this.polling = setTimeout(() => this.follow(datasetId), 500);
          return;
        }
        this.busy.set(false);
        if (dataset.status === 'failed') {
          this.problems.set(dataset.problems);
          this.message.set(
            'Nothing was imported. Correct the file (or the mapping) and try again.',
          );
        } else {
          this.reset();
          this.message.set(`Imported ${dataset.rowCount} rows into “${dataset.name}”.`);
        }
        this.refresh();
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.message.set(readApiProblem(error).message);
      },
    });
  }

  private reset(): void {
    this.upload.set(null);
    this.preview.set(null);
    this.mapping.set([]);
    this.importing.set(null);
    this.problems.set([]);
    this.message.set(null);
  }

  private refresh(): void {
    this.api.list(this.studyId()).subscribe({
      next: (list) => this.datasets.set(list),
      error: (error: unknown) => this.message.set(readApiProblem(error).message),
    });
  }
}
