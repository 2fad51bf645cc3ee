import { HttpContext, HttpContextToken } from '@angular/common/http';

/**
 * Whether the error interceptor shows a snack bar for a failed request. Forms and pages that
 * show the problem in place (beside a field, in a card) turn it off so it is not said twice.
 */
export const SHOW_ERROR_NOTICE = new HttpContextToken<boolean>(() => true);

/** Context for a request whose caller shows its own error message. */
export function withoutErrorNotice(): HttpContext {
  return new HttpContext().set(SHOW_ERROR_NOTICE, false);
}
