import { EnvironmentInjector, Injectable, inject } from '@angular/core';
import type { MatSnackBar } from '@angular/material/snack-bar';

const noticeDurationMs = 8000;

/**
 * Short notices at the foot of the screen for code that runs before any page (the HTTP error
 * interceptor). The snack bar, its overlay and its button load on the first notice, not with
 * the app: they were a fifth of what a phone fetched before it could show the sign-in page.
 */
@Injectable({ providedIn: 'root' })
export class Notices {
  private readonly injector = inject(EnvironmentInjector);
  private snackBar?: Promise<MatSnackBar>;

  show(message: string): void {
    this.snackBar ??= import('@angular/material/snack-bar').then((m) =>
      this.injector.get(m.MatSnackBar),
    );
    void this.snackBar.then((bar) => bar.open(message, 'Close', { duration: noticeDurationMs }));
  }
}
