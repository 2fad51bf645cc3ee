import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import type { FieldIssue } from '@shared/http/api-error';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { DataFilterCard } from './data-filter-card';
import { FitJobProgress } from './fit-job-progress';
import { fitSpecFrom, type FitSetupValues } from './fit-setup-values';
import { ModelCard } from './model-card';
import { issuesUnder } from './setup-issues';
import { WeightingCard } from './weighting-card';

/** Choose the data, the weighting and the model, then run the fit and follow its job. */
@Component({
  selector: 'app-fit-setup-page',
  imports: [DataFilterCard, FitJobProgress, MatButton, MatIcon, ModelCard, WeightingCard],
  templateUrl: './fit-setup-page.html',
  styleUrl: './fit-setup-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitSetupPage {
  protected readonly state = inject(AnalysisWorkspaceState);
  private readonly localIssues = signal<readonly FieldIssue[]>([]);

  protected readonly issues = computed(() => [
    ...this.localIssues(),
    ...(this.state.jobProblem()?.issues ?? []).map((issue) => ({
      ...issue,
      path: issue.path.replace(/^spec\./, ''),
    })),
  ]);
  protected readonly dataIssues = computed(() => issuesUnder(this.issues(), 'filters'));
  protected readonly weightingIssues = computed(() => issuesUnder(this.issues(), 'weighting'));
  protected readonly modelIssues = computed(() =>
    this.issues().filter((i) => !/^(filters|weighting)(\.|$)/.test(i.path)),
  );
  protected readonly running = computed(() => {
    const status = this.state.job()?.status;
    return status === 'queued' || status === 'running';
  });
  protected readonly weightingSummary = computed(
    () =>
      this.state.job()?.result?.weighting ?? this.state.selectedFit()?.result?.weighting ?? null,
  );

  protected update(change: Partial<FitSetupValues>): void {
    this.state.setup.update((values) => (values ? { ...values, ...change } : values));
  }

  protected runFit(values: FitSetupValues): void {
    const checked = fitSpecFrom(values);
    if (!checked.ok) {
      this.localIssues.set(checked.issues);
      return;
    }
    this.localIssues.set([]);
    this.state.runFit(checked.spec);
  }
}
