import { DatePipe } from '@angular/common';
import { RouterLink } from '@angular/router';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { currentVersionIds } from './current-versions';

/**
 * Published versions, newest first, saying which version corrects which: a correction names the
 * version it replaces, and a replaced version says so.
 */
@Component({
  selector: 'app-version-history',
  imports: [DatePipe, RouterLink],
  template: `
    <ol class="versions" aria-label="Published versions">
      @for (v of ordered(); track v.id) {
        <li class="version" [class.version--replaced]="!current().has(v.id)">
          <p class="version__title">
            @if (linkTo(); as link) {
              <a [routerLink]="link(v)" [attr.aria-current]="v.id === currentId() ? 'page' : null"
                ><strong>v{{ v.version }}</strong> · {{ v.title }}</a
              >
            } @else {
              <strong>v{{ v.version }}</strong> · {{ v.title }}
            }
            @if (v.replacedById) {
              <span class="version__tag">replaced by v{{ versionOf(v.replacedById) }}</span>
            } @else if (current().has(v.id)) {
              <span class="version__tag version__tag--current">current</span>
            } @else {
              <span class="version__tag">earlier version</span>
            }
          </p>
          <p class="version__meta">
            {{ v.methodLabel }} · n = {{ v.n }} · published {{ v.publishedAt | date: 'd MMM y' }} by
            {{ v.publishedByName }}
            @if (v.replacesId) {
              · corrects v{{ versionOf(v.replacesId) }}
            }
          </p>
        </li>
      } @empty {
        <li class="version__none">Nothing published yet.</li>
      }
    </ol>
  `,
  styles: `
    .versions {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 8px;
    }
    .version {
      padding: 8px 12px;
      border-left: 4px solid var(--mat-sys-primary);
      background: var(--mat-sys-surface-container-low);
      border-radius: 0 8px 8px 0;
    }
    .version--replaced {
      border-left-color: var(--mat-sys-outline-variant);
    }
    .version__title,
    .version__meta {
      margin: 0;
    }
    .version__meta {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .version__tag {
      font: var(--mat-sys-label-small);
      margin-left: 6px;
      padding: 1px 6px;
      border-radius: 6px;
      background: var(--mat-sys-surface-container-highest);
    }
    .version__tag--current {
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .version__none {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VersionHistory {
  readonly versions = input.required<readonly ScheduleVersionSummary[]>();
  /** Where each version opens, when the list is a way to move between them. */
  readonly linkTo = input<((version: ScheduleVersionSummary) => string) | null>(null);
  /** The version on screen, marked in the list. */
  readonly currentId = input<string | null>(null);
  protected readonly current = computed(() => currentVersionIds(this.versions()));
  protected readonly ordered = computed(() =>
    [...this.versions()].sort((a, b) => b.version - a.version),
  );

  protected versionOf(id: string): string {
    return String(this.versions().find((v) => v.id === id)?.version ?? '?');
  }
}
