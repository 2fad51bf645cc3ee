import { inject } from '@angular/core';
import { CanActivateFn, CanMatchFn, Router } from '@angular/router';
import type { Role } from '@shared/auth/roles';
import { notOpenToYourAccount } from './access-words';
import { Notices } from './notices';
import { Session } from './session';

/** Lets signed-in people through; sends everyone else to the welcome page with a way back. */
export const signedInGuard: CanActivateFn = async (_route, state) => {
  const session = inject(Session);
  const router = inject(Router);
  await session.ensureLoaded();
  if (session.signedIn()) return true;
  return router.createUrlTree(['/welcome'], { queryParams: { returnTo: state.url } });
};

/** The welcome page is for visitors; a signed-in person goes straight home. */
export const signedOutGuard: CanActivateFn = async () => {
  const session = inject(Session);
  const router = inject(Router);
  await session.ensureLoaded();
  return session.signedIn() ? router.createUrlTree(['/']) : true;
};

/**
 * Admits people holding at least one of the given roles; others go home with a notice saying
 * why (a link or a typed address would otherwise seem to do nothing), visitors to the welcome
 * page. Used as `canMatch`, so a section's lazy chunk is not even downloaded for someone who
 * may not open it.
 */
export function roleGuard(...allowed: Role[]): CanMatchFn & CanActivateFn {
  return async () => {
    const session = inject(Session);
    const router = inject(Router);
    const notices = inject(Notices);
    await session.ensureLoaded();
    if (session.hasAnyRole(allowed)) return true;
    if (session.signedIn()) {
      notices.show(`${notOpenToYourAccount} Here is your home page instead.`);
      return router.createUrlTree(['/']);
    }
    const target = router.currentNavigation()?.extractedUrl.toString() ?? '/';
    return router.createUrlTree(['/welcome'], { queryParams: { returnTo: target } });
  };
}
