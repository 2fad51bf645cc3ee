import { BreakpointObserver } from '@angular/cdk/layout';
import { NgComponentOutlet } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  ElementRef,
  computed,
  effect,
  inject,
  signal,
  viewChild,
  type Type,
} from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbar } from '@angular/material/toolbar';
import { RouterLink, RouterOutlet } from '@angular/router';
import { map } from 'rxjs';
import { navGroupsFor } from '../navigation';
import { Session } from '../session';
import { TOOLBAR_WIDGETS } from '../toolbar-widgets';
import { AccountMenu } from './account-menu';
import { NavList } from './nav-list';

/** Wide enough for the navigation to sit beside the page instead of sliding over it. */
const wideLayoutQuery = '(min-width: 840px)';

/** Toolbar and side navigation around every signed-in page. */
@Component({
  selector: 'app-shell',
  imports: [
    MatToolbar,
    MatIconButton,
    NgComponentOutlet,
    MatIcon,
    MatSidenavModule,
    RouterLink,
    RouterOutlet,
    AccountMenu,
    NavList,
  ],
  templateUrl: './app-shell.html',
  styleUrl: './app-shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { class: 'shell' },
})
export class AppShell {
  private readonly session = inject(Session);

  protected readonly wide = toSignal(
    inject(BreakpointObserver)
      .observe(wideLayoutQuery)
      .pipe(map((state) => state.matches)),
    { initialValue: false },
  );
  protected readonly drawerOpen = signal(false);
  protected readonly navGroups = computed(() => navGroupsFor(this.session.roles()));
  protected readonly info = this.session.info;
  private readonly mainContent = viewChild.required<ElementRef<HTMLElement>>('mainContent');
  private readonly widgets = inject(TOOLBAR_WIDGETS);
  protected readonly toolbarWidgets = signal<readonly Type<unknown>[]>([]);

  constructor() {
    effect(() => {
      const roles = this.session.roles();
      const wanted = this.widgets.filter((w) => w.audience.some((role) => roles.includes(role)));
      void Promise.all(wanted.map((widget) => widget.load())).then((loaded) =>
        this.toolbarWidgets.set(loaded),
      );
    });
  }

  /** A plain `#main-content` link would resolve against `<base href>` and leave the page. */
  protected skipToContent(event: Event): void {
    event.preventDefault();
    this.mainContent().nativeElement.focus();
  }

  protected toggleDrawer(): void {
    this.drawerOpen.update((open) => !open);
  }

  /** On a phone the drawer covers the page, so it gets out of the way once a page is chosen. */
  protected closeDrawerOnPhone(): void {
    if (!this.wide()) this.drawerOpen.set(false);
  }
}
