import { ErrorHandler, inject, Injectable, Injector } from '@angular/core';
import { Router } from '@angular/router';
import { ApiError } from '../http/api-error';
import { Notifier } from './notifier';
import { userMessageFor } from './user-message';

/** The last stop for failures no page handled: log for developers, one snack bar for the user. */
@Injectable()
export class AppErrorHandler implements ErrorHandler {
  // Resolved lazily: the error handler is created before the router and the overlay exist.
  private readonly injector = inject(Injector);

  handleError(error: unknown): void {
    const cause = unwrapRejection(error);
    console.error(cause);
    try {
      const signIn = cause instanceof ApiError && cause.status === 401;
      void this.injector
        .get(Notifier)
        .tell(userMessageFor(cause), signIn ? 'Sign in' : undefined)
        .then((chosen) => {
          if (chosen) void this.injector.get(Router).navigate(['/account/sign-in']);
        });
    } catch (notifyError) {
      console.error('Could not show the error', notifyError);
    }
  }
}

function unwrapRejection(error: unknown): unknown {
  if (typeof error === 'object' && error !== null && 'rejection' in error) return (error as { rejection: unknown }).rejection;
  return error;
}
