import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, throwError } from 'rxjs';
import { AuthStore } from '../auth/auth-store';
import { ApiError } from './api-error';

/** Routes whose 401 means "wrong answer", not "your session ended". */
const SESSION_NEUTRAL = ['/api/auth/sign-in', '/api/auth/me'];

/** Turns every failed HTTP call into an {@link ApiError}; a 401 elsewhere means the session has ended. */
export const errorInterceptor: HttpInterceptorFn = (request, next) => {
  const auth = inject(AuthStore);
  return next(request).pipe(
    catchError((failure: unknown) => {
      const error = failure instanceof HttpErrorResponse ? ApiError.fromHttp(failure) : failure;
      if (error instanceof ApiError && error.status === 401 && !SESSION_NEUTRAL.some((p) => request.url.endsWith(p))) {
        auth.forget();
      }
      return throwError(() => error);
    }),
  );
};
