import { DOCUMENT, Injectable, inject } from '@angular/core';

/**
 * Full-page navigation for the paths the server owns (sign-in and sign-out go through the
 * identity provider), kept behind a service so tests can watch it instead of leaving the page.
 */
@Injectable({ providedIn: 'root' })
export class PageNavigator {
  private readonly document = inject(DOCUMENT);

  goTo(url: string): void {
    this.document.location.assign(url);
  }
}
