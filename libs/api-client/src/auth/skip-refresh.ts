import { HttpContext, HttpContextToken } from '@angular/common/http';

/** Marks a request whose 401 must not trigger a token refresh (the auth calls themselves). */
export const SKIP_REFRESH = new HttpContextToken<boolean>(() => false);

/** An HttpContext with {@link SKIP_REFRESH} set. */
export function skipRefreshContext(): HttpContext {
  return new HttpContext().set(SKIP_REFRESH, true);
}
