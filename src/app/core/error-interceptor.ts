import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';
import { readApiProblem } from './api-problem';
import { SHOW_ERROR_NOTICE } from './error-notice-context';
import { Session } from './session';

const noticeDurationMs = 8000;

/**
 * Turns failed API calls into a message a person can read, and a 401 on a signed-in session
 * into the signed-out state. The error still reaches the caller, which may show more.
 */
export const errorInterceptor: HttpInterceptorFn = (request, next) => {
  const session = inject(Session);
  const snackBar = inject(MatSnackBar);
  const router = inject(Router);
  return next(request).pipe(
    catchError((error: unknown) => {
      if (error instanceof HttpErrorResponse && error.status === 401 && session.signedIn()) {
        session.markSignedOut();
        const returnTo = router.url;
        snackBar.open('Your session has ended. Sign in again to carry on.', 'Close', {
          duration: noticeDurationMs,
        });
        void router.navigate(['/welcome'], { queryParams: { returnTo } });
      } else if (request.context.get(SHOW_ERROR_NOTICE)) {
        snackBar.open(readApiProblem(error).message, 'Close', { duration: noticeDurationMs });
      }
      return throwError(() => error);
    }),
  );
};
