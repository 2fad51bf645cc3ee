import {
  ChangeDetectionStrategy,
  Component,
  effect,
  inject,
  input,
  untracked,
} from '@angular/core';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatTabsModule } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { AnalysisWorkspaceState } from './analysis-workspace-state';

const tabs = [
  { path: 'set-up', label: 'Set up' },
  { path: 'results', label: 'Results' },
  { path: 'policy', label: 'Price policy' },
  { path: 'compare', label: 'Compare' },
  { path: 'publish', label: 'Publish' },
] as const;

/** One study's analysis: its name, the five tabs, and the tab's page below. */
@Component({
  selector: 'app-analysis-workspace',
  imports: [MatProgressBar, MatTabsModule, RouterLink, RouterLinkActive, RouterOutlet],
  providers: [AnalysisWorkspaceState],
  template: `
    <div class="fc-page workspace">
      <p class="workspace__crumb"><a routerLink="/analysis">Analysis</a></p>
      @if (state.study(); as study) {
        <h1 class="fc-page__title">{{ study.name }}</h1>
        <p class="workspace__product">{{ study.productName }} · prices in {{ study.currency }}</p>
        <nav mat-tab-nav-bar [tabPanel]="panel" aria-label="Analysis steps" class="workspace__tabs">
          @for (tab of tabs; track tab.path) {
            <a
              mat-tab-link
              [routerLink]="tab.path"
              routerLinkActive
              #active="routerLinkActive"
              [active]="active.isActive"
              >{{ tab.label }}</a
            >
          }
        </nav>
        <mat-tab-nav-panel #panel>
          <router-outlet />
        </mat-tab-nav-panel>
      } @else if (state.problem(); as problem) {
        <h1 class="fc-page__title">Analysis</h1>
        <p class="workspace__problem" role="alert">{{ problem }}</p>
      } @else {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the study" />
      }
    </div>
  `,
  styles: `
    .workspace__crumb {
      margin: 0 0 4px;
    }
    .workspace__product {
      margin: 0 0 16px;
      color: var(--mat-sys-on-surface-variant);
    }
    .workspace__tabs {
      margin-bottom: 16px;
    }
    .workspace__problem {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AnalysisWorkspace {
  readonly studyId = input.required<string>();
  protected readonly state = inject(AnalysisWorkspaceState);
  protected readonly tabs = tabs;

  constructor() {
    effect(() => {
      const studyId = this.studyId();
      untracked(() => void this.state.open(studyId));
    });
  }
}
