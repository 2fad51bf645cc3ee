import {
  ChangeDetectionStrategy,
  Component,
  computed,
  inject,
  linkedSignal,
  signal,
} from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { cellsBelowMinimum, minimumCellRespondents } from '@shared/analysis/cell-support';
import { firstValueFrom } from 'rxjs';
import { readApiProblem, type ApiProblem } from '../../../core/api-problem';
import { AnalysisApi } from '../analysis-api';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { FitPicker } from '../results/fit-picker';
import { issuesBeyondMessage, publishedNotice } from './publish-notice';
import { VersionHistory } from './version-history';

/**
 * Publishing: a finished fit becomes a demand schedule version the study's clients are told
 * about. A correction names the version it replaces; the server refuses cells resting on fewer
 * than five respondents, and says which.
 */
@Component({
  selector: 'app-publish-page',
  imports: [
    FitPicker,
    FormsModule,
    MatButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatInput,
    MatSelectModule,
    RouterLink,
    VersionHistory,
  ],
  templateUrl: './publish-page.html',
  styleUrl: './publish-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublishPage {
  protected readonly state = inject(AnalysisWorkspaceState);
  private readonly api = inject(AnalysisApi);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly minimum = minimumCellRespondents;
  protected readonly publishable = computed(() =>
    this.state.finishedFits().filter((fit) => fit.hasSchedule),
  );
  protected readonly title = linkedSignal(() => {
    const study = this.state.study();
    return study ? `${study.productName}: demand schedule` : '';
  });
  protected readonly replaces = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected readonly problem = signal<ApiProblem | null>(null);
  /** The version in force that the chosen fit is already published as, if any. */
  protected readonly publishedAs = computed(() => {
    const fitId = this.state.selectedFitId();
    return this.state.schedules().find((v) => v.fitId === fitId && !v.replacedById) ?? null;
  });
  protected readonly listedIssues = computed(() => {
    const problem = this.problem();
    return problem ? issuesBeyondMessage(problem) : [];
  });
  protected readonly thin = computed(() =>
    cellsBelowMinimum(this.state.selectedFit()?.result?.schedule?.rows ?? []),
  );

  protected thinList(): string {
    const format = this.state.format();
    return this.thin()
      .map((row) => `${format?.value(row.price, 'price') ?? row.price}: ${row.respondents}`)
      .join(', ');
  }

  protected pick(fitId: string): void {
    this.problem.set(null);
    void this.state.selectFit(fitId);
  }

  protected async publish(): Promise<void> {
    const study = this.state.study();
    const fitId = this.state.selectedFitId();
    if (!study || !fitId) return;
    this.busy.set(true);
    this.problem.set(null);
    try {
      const version = await firstValueFrom(
        this.api.publish(study.id, { fitId, title: this.title(), replaces: this.replaces() }),
      );
      this.snackBar.open(publishedNotice(version.version, version.clientsNotified), 'Close', {
        duration: 8000,
      });
      this.replaces.set(null);
      await this.state.refreshSchedules();
    } catch (error) {
      this.problem.set(readApiProblem(error));
    } finally {
      this.busy.set(false);
    }
  }
}
