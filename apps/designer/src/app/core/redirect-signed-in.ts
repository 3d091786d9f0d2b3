import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { AuthState } from '@tumblewise/api-client';

/** Sends a signed-in user from the sign-in and sign-up pages to the start page. */
export const redirectSignedIn: CanActivateFn = () => {
  if (!inject(AuthState).signedIn()) return true;
  return inject(Router).createUrlTree(['/']);
};
