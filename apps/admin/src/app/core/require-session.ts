import { LocationStrategy } from '@angular/common';
import { inject } from '@angular/core';
import { CanActivateFn } from '@angular/router';
import { AuthState } from '@tumblewise/api-client';
import { PageNavigation } from '@tumblewise/ui';

/**
 * The admin app has no sign-in page of its own: without a session the browser goes to the
 * designer's sign-in, which brings the user back here afterwards.
 */
export const requireSession: CanActivateFn = (_route, state) => {
  if (inject(AuthState).signedIn()) return true;
  const here = inject(LocationStrategy).prepareExternalUrl(state.url);
  inject(PageNavigation).assign(`/signin?returnTo=${encodeURIComponent(here)}`);
  return false;
};
