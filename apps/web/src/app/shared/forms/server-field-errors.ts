import { AbstractControl } from '@angular/forms';

/**
 * Puts the server's field messages (dotted paths, `{ 'password': 'is too common' }`) on the matching controls
 * as `{ server: message }`; the next edit of a control clears its message. Returns the messages no control took.
 */
export function applyServerFieldErrors(form: AbstractControl, fields: Readonly<Record<string, string>>): string[] {
  const unplaced: string[] = [];
  for (const [path, message] of Object.entries(fields)) {
    const control = path ? form.get(path) : null;
    if (control) {
      control.setErrors({ ...(control.errors ?? {}), server: message });
      control.markAsTouched();
    } else {
      unplaced.push(path ? `${path} ${message}` : message);
    }
  }
  return unplaced;
}
