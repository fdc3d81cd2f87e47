import { ApiError } from '../http/api-error';

/** What to tell the user about a failure nothing else handled. */
export function userMessageFor(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Something went wrong on this page. Reload it to try again.';
  if (error.status === 0) return error.message;
  if (error.status === 401) return 'Your session has ended. Sign in again to carry on.';
  if (error.code === 'csrf') return 'This page was open for a long time. Reload it and try again.';
  if (error.status === 403) return 'Your account is not allowed to do that.';
  if (error.retryable) return 'The server ran into a problem. Try again in a moment.';
  return error.message;
}
