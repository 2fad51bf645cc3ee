import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';
import { readApiProblem } from './api-problem';
import { SHOW_ERROR_NOTICE } from './error-notice-context';
import { Notices } from './notices';
import { Session } from './session';

/**
 * Turns failed API calls into a message a person can read, and a 401 on a signed-in session
 * into the signed-out state. The error still reaches the caller, which may show more.
 */
export const errorInterceptor: HttpInterceptorFn = (request, next) => {
  const session = inject(Session);
  const notices = inject(Notices);
  const router = inject(Router);
  return next(request).pipe(
    catchError((error: unknown) => {
      if (error instanceof HttpErrorResponse && error.status === 401 && session.signedIn()) {
        session.markSignedOut();
        const returnTo = router.url;
        // A session ended from elsewhere (device signed out, member deactivated) says why.
        const problem = readApiProblem(error);
        notices.show(
          problem.code === 'session-ended'
            ? problem.message
            : 'Your session has ended. Sign in again to carry on.',
        );
        void router.navigate(['/welcome'], { queryParams: { returnTo } });
      } else if (request.context.get(SHOW_ERROR_NOTICE)) {
        notices.show(readApiProblem(error).message);
      }
      return throwError(() => error);
    }),
  );
};
