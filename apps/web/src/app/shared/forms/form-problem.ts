import { AbstractControl } from '@angular/forms';
import { ApiError } from '../../core/http/api-error';
import { applyServerFieldErrors } from './server-field-errors';

/** Messages a page gives for codes it expects, e.g. `{ invalid_credentials: 'E-mail or password is not right.' }`. */
export type KnownProblems = Readonly<Record<string, string>>;

/**
 * What to say above a form after a failed submit, or null when the field messages already say it.
 * Failures the user cannot fix from this form (server down, bugs) are rethrown for the app's error handler.
 */
export function formProblem(error: unknown, form: AbstractControl, known: KnownProblems = {}): string | null {
  if (!(error instanceof ApiError) || error.retryable) throw error;
  const stated = known[error.code];
  if (stated) return stated;
  if (error.code === 'invalid_input' && Object.keys(error.fields).length > 0) {
    const unplaced = applyServerFieldErrors(form, error.fields);
    return unplaced.length > 0 ? unplaced.join('. ') : null;
  }
  if (error.status === 429) return 'Too many attempts. Wait a minute and try again.';
  if (error.status === 401 || error.code === 'csrf') throw error;
  return error.message;
}
