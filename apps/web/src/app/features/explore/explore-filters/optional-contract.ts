import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { FieldSchema } from '../../../shared/forms/contract-validator';

/** Like contractValidator, for a filter that may be left empty: empty passes, anything else must satisfy the schema. */
export function optionalContract(schema: FieldSchema): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const value = control.value;
    if (value === null || value === undefined || value === '') return null;
    const result = schema.safeParse(value);
    return result.success ? null : { contract: result.error.issues[0]?.message ?? 'is not valid' };
  };
}
