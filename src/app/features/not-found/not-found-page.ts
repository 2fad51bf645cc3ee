import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** Shown for any address the app does not know. */
@Component({
  selector: 'app-not-found-page',
  imports: [MatButton, MatIcon, RouterLink],
  template: `
    <main class="not-found">
      <mat-icon class="not-found__icon" aria-hidden="true">explore_off</mat-icon>
      <h1>This page does not exist</h1>
      <p>The address may be mistyped, or the page has moved. Start again from the home page.</p>
      <a mat-flat-button routerLink="/">Go to the home page</a>
    </main>
  `,
  styles: `
    .not-found {
      box-sizing: border-box;
      min-height: 100dvh;
      display: flex;
      flex-direction: column;
      align-items: center;
      justify-content: center;
      padding: 24px;
      text-align: center;
    }
    .not-found__icon {
      font-size: 56px;
      width: 56px;
      height: 56px;
      color: var(--mat-sys-tertiary);
    }
    h1 {
      font: var(--mat-sys-headline-medium);
      margin: 16px 0 8px;
    }
    p {
      max-width: 28rem;
      margin: 0 0 24px;
      color: var(--mat-sys-on-surface-variant);
    }
    a {
      min-height: 48px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFoundPage {}
