import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import type { Role } from '@barwright/contracts';
import { Notifier } from '../error-handling/notifier';
import { AuthStore } from './auth-store';

/** Lets through accounts holding one of `roles`; the server checks again on every request. */
export function roleGuard(...roles: Role[]): CanActivateFn {
  return (_route, state) => {
    const auth = inject(AuthStore);
    const router = inject(Router);
    if (!auth.signedIn()) return router.createUrlTree(['/account/sign-in'], { queryParams: { next: state.url } });
    if (auth.hasRole(roles)) return true;
    inject(Notifier).tell(`That page is for ${roles.map((r) => `${r}s`).join(' and ')} only.`);
    return router.createUrlTree(['/']);
  };
}
