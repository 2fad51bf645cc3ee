import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import type { HealthReport } from '@shared/health/health-report';
import { readApiProblem } from '../../core/api-problem';
import { DependencyCard } from './dependency-card';
import { dependencyLabels } from './dependency-labels';
import { HealthApi } from './health-api';

/** The state of every outside service Fieldcurve depends on, for administrators. */
@Component({
  selector: 'app-system-health-page',
  imports: [DatePipe, MatButton, MatIcon, MatProgressBar, DependencyCard],
  templateUrl: './system-health-page.html',
  styleUrl: './system-health-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SystemHealthPage {
  private readonly api = inject(HealthApi);

  protected readonly report = signal<HealthReport | null>(null);
  protected readonly loading = signal(false);
  protected readonly loadError = signal<string | null>(null);
  protected readonly checkedAt = signal<Date | null>(null);
  protected readonly cards = computed(() => {
    const checks = this.report()?.checks ?? {};
    return Object.entries(dependencyLabels).flatMap(([name, label]) => {
      const check = checks[name as keyof typeof checks];
      return check ? [{ name, ...label, check }] : [];
    });
  });

  constructor() {
    void this.refreshReport();
  }

  protected async refreshReport(): Promise<void> {
    this.loading.set(true);
    this.loadError.set(null);
    try {
      this.report.set(await this.api.fetchReport());
      this.checkedAt.set(new Date());
    } catch (error) {
      this.loadError.set(readApiProblem(error).message);
    } finally {
      this.loading.set(false);
    }
  }
}
