import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { AuthStore } from './auth-store';

/** Lets signed-in accounts through; sends visitors to sign in and back here afterwards. */
export const authGuard: CanActivateFn = (_route, state) => {
  const auth = inject(AuthStore);
  if (auth.signedIn()) return true;
  return inject(Router).createUrlTree(['/account/sign-in'], { queryParams: { next: state.url } });
};
