import {
  ChangeDetectionStrategy,
  Component,
  effect,
  inject,
  input,
  untracked,
} from '@angular/core';
import { MatTabLink, MatTabNav, MatTabNavPanel } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { PlanningStudy } from './planning-study';

/** A study's field-planning pages under one heading, with tabs for points, routes and progress. */
@Component({
  selector: 'app-planning-study-shell',
  imports: [MatTabNav, MatTabLink, MatTabNavPanel, RouterLink, RouterLinkActive, RouterOutlet],
  template: `
    <div class="fc-page planning-shell">
      <p class="planning-shell__back"><a routerLink="/field-planning">All studies</a></p>
      <h1 class="fc-page__title">{{ planning.study()?.name ?? 'Field planning' }}</h1>
      @if (planning.loadError(); as problem) {
        <p role="alert">{{ problem }}</p>
      }
      @if (planning.study() && !planning.canEdit()) {
        <p class="planning-shell__note">
          You can read this study's field plan; supervisors change it.
        </p>
      }
      <nav mat-tab-nav-bar [tabPanel]="panel" aria-label="Field planning sections">
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
        @if (planning.study()) {
          <router-outlet />
        }
      </mat-tab-nav-panel>
    </div>
  `,
  styles: `
    .planning-shell__back {
      margin: 0 0 4px;
    }
    .planning-shell__back a {
      display: inline-block;
      padding: 12px 0;
    }
    .planning-shell__note {
      color: var(--mat-sys-on-surface-variant);
      margin: 0 0 8px;
    }
    nav {
      margin-bottom: 16px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanningStudyShell {
  protected readonly planning = inject(PlanningStudy);
  readonly studyId = input.required<string>();

  protected readonly tabs = [
    { path: 'points', label: 'Points' },
    { path: 'routes', label: 'Routes' },
    { path: 'progress', label: 'Progress' },
  ] as const;

  constructor() {
    effect(() => {
      const studyId = this.studyId();
      untracked(() => this.planning.load(studyId));
    });
  }
}
