import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import {
  MatListItem,
  MatListItemIcon,
  MatListItemTitle,
  MatListSubheaderCssMatStyler,
  MatNavList,
} from '@angular/material/list';
import { RouterLink, RouterLinkActive } from '@angular/router';
import { NavGroup } from '../navigation';

/** The side navigation's links, grouped, with the current page marked. */
@Component({
  selector: 'app-nav-list',
  // Single list directives, not MatListModule: its selection list would pull in @angular/forms.
  imports: [
    MatNavList,
    MatListItem,
    MatListItemIcon,
    MatListItemTitle,
    MatListSubheaderCssMatStyler,
    MatIcon,
    RouterLink,
    RouterLinkActive,
  ],
  template: `
    <!-- mat-nav-list is itself the navigation landmark; one list keeps it unique. -->
    <mat-nav-list aria-label="Sections">
      @for (group of groups(); track group.title) {
        @if (group.title) {
          <h2 matSubheader class="nav__heading">{{ group.title }}</h2>
        }
        @for (item of group.items; track item.path) {
          <a
            mat-list-item
            [routerLink]="item.path"
            routerLinkActive
            #link="routerLinkActive"
            [routerLinkActiveOptions]="{ exact: item.path === '/' }"
            [activated]="link.isActive"
            [attr.aria-current]="link.isActive ? 'page' : null"
            (click)="navigated.emit()"
          >
            <mat-icon matListItemIcon aria-hidden="true">{{ item.icon }}</mat-icon>
            <span matListItemTitle>{{ item.label }}</span>
          </a>
        }
      }
    </mat-nav-list>
  `,
  styles: `
    mat-nav-list {
      padding: 8px 12px;
    }
    .nav__heading {
      font: var(--mat-sys-title-small);
      color: var(--mat-sys-on-surface-variant);
      margin: 0;
      padding: 8px 16px 4px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NavList {
  readonly groups = input.required<readonly NavGroup[]>();
  readonly navigated = output<void>();
}
