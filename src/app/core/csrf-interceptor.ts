import { HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { csrfHeaderName } from '@shared/auth/csrf-header';
import { Session } from './session';

const stateChangingMethods = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** Same-origin paths only: the token must never travel to another site. */
function isSameOriginPath(url: string): boolean {
  return url.startsWith('/') && !url.startsWith('//');
}

/** Echoes the session's CSRF token on every state-changing request to our own server. */
export const csrfInterceptor: HttpInterceptorFn = (request, next) => {
  if (!stateChangingMethods.has(request.method) || !isSameOriginPath(request.url)) {
    return next(request);
  }
  const token = inject(Session).csrfToken();
  if (!token) return next(request);
  return next(request.clone({ setHeaders: { [csrfHeaderName]: token } }));
};
