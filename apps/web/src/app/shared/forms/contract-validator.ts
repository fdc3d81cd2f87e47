import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';

/** The part of a contracts (zod) schema a validator needs; keeps the web app free of a direct zod import. */
export interface FieldSchema {
  safeParse(value: unknown): { success: true } | { success: false; error: { issues: readonly { message: string }[] } };
}

/**
 * Checks a field with the same schema the server uses, so both sides state the same limit in the same words.
 * The error is `{ contract: message }`, e.g. "must be at least 12 characters".
 */
export function contractValidator(schema: FieldSchema): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const result = schema.safeParse(control.value);
    if (result.success) return null;
    return { contract: result.error.issues[0]?.message ?? 'is not valid' };
  };
}
