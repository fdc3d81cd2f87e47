import { ValidationErrors } from '@angular/forms';

/**
 * One sentence for a field's first problem, naming the field: "Password must be at least 12 characters".
 * Server and contract messages are phrased to follow the field's label.
 */
export function fieldMessage(label: string, errors: ValidationErrors | null | undefined): string {
  if (!errors) return '';
  if (typeof errors['server'] === 'string') return joinLabel(label, errors['server']);
  if (errors['required']) return `${label} is required`;
  if (typeof errors['contract'] === 'string') return joinLabel(label, errors['contract']);
  if (errors['email']) return `${label} must be an e-mail address`;
  const min = errors['minlength'] as { requiredLength: number } | undefined;
  if (min) return `${label} must be at least ${min.requiredLength} characters`;
  const max = errors['maxlength'] as { requiredLength: number } | undefined;
  if (max) return `${label} must be at most ${max.requiredLength} characters`;
  return `${label} is not valid`;
}

/** "must be …" follows the label; a message that is already a sentence ("Pick a longer phrase.") stands alone. */
function joinLabel(label: string, message: string): string {
  const first = message.charAt(0);
  return first === first.toLowerCase() && first !== first.toUpperCase() ? `${label} ${message}` : message;
}
