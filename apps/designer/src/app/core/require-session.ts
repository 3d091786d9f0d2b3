import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { AuthState } from '@tumblewise/api-client';

/** Lets signed-in users through; sends others to sign-in, coming back here afterwards. */
export const requireSession: CanActivateFn = (_route, state) => {
  if (inject(AuthState).signedIn()) return true;
  return inject(Router).createUrlTree(['/signin'], { queryParams: state.url === '/' ? {} : { returnTo: state.url } });
};
