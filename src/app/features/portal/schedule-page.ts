import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { portalSchedulePath } from '@shared/analysis/portal-paths';
import type { ScheduleVersion, ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { firstValueFrom } from 'rxjs';
import { readApiProblem } from '../../core/api-problem';
import { curvePointsFromRows, type BandedCurve } from '../analysis/charts/banded-curve';
import { DemandChart } from '../analysis/charts/demand-chart';
import { demandAxisTitles } from '../analysis/charts/fit-curves';
import { FigureFormat } from '../analysis/figures/figure-format';
import { VersionHistory } from '../analysis/publish/version-history';
import { ScheduleTable } from '../analysis/schedule/schedule-table';
import { DownloadLinks } from './download-links';
import { PortalApi } from './portal-api';

/**
 * One published schedule as the client sees it: the caution first, downloads, the curve with
 * its band and revenue, the table, how it was made, and the versions before and after it.
 */
@Component({
  selector: 'app-schedule-page',
  imports: [
    DatePipe,
    DemandChart,
    DownloadLinks,
    MatCardModule,
    MatIcon,
    MatProgressBar,
    RouterLink,
    ScheduleTable,
    VersionHistory,
  ],
  templateUrl: './schedule-page.html',
  styleUrl: './schedule-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SchedulePage {
  readonly studyId = input.required<string>();
  readonly versionId = input.required<string>();
  private readonly api = inject(PortalApi);

  protected readonly version = signal<ScheduleVersion | null>(null);
  protected readonly history = signal<readonly ScheduleVersionSummary[]>([]);
  protected readonly problem = signal<string | null>(null);

  protected readonly format = computed(() => {
    const v = this.version();
    return v ? new FigureFormat(v.currency, 'en') : null;
  });
  protected readonly curve = computed((): BandedCurve | null => {
    const v = this.version();
    if (!v) return null;
    return {
      label: v.methodLabel,
      quantityKind: v.quantityKind,
      confidenceLevel: v.confidenceLevel,
      observedPriceRange: v.observedPriceRange,
      points: curvePointsFromRows(v.rows),
    };
  });
  protected readonly titles = computed(() =>
    demandAxisTitles(this.version()?.quantityKind ?? 'quantity', this.version()?.currency ?? ''),
  );
  protected readonly replacement = computed(() => {
    const id = this.version()?.replacedById;
    return id ? (this.history().find((v) => v.id === id) ?? null) : null;
  });
  protected readonly linkTo = (v: ScheduleVersionSummary) => portalSchedulePath(v.studyId, v.id);

  constructor() {
    effect(() => {
      const [studyId, versionId] = [this.studyId(), this.versionId()];
      untracked(() => void this.load(studyId, versionId));
    });
  }

  private async load(studyId: string, versionId: string): Promise<void> {
    this.problem.set(null);
    this.version.set(null);
    try {
      const [version, history] = await Promise.all([
        firstValueFrom(this.api.getVersion(studyId, versionId)),
        firstValueFrom(this.api.listStudyVersions(studyId)),
      ]);
      this.version.set(version);
      this.history.set(history);
    } catch (error) {
      this.problem.set(readApiProblem(error).message);
    }
  }
}
