import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { ZodType } from 'zod';

/**
 * Validates a control with a shared zod schema, so the form enforces exactly the rule the server
 * checks. The error is `{ rule: message }`, the message being the schema's first issue.
 */
export function zodValidator(schema: ZodType): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const result = schema.safeParse(control.value);
    if (result.success) return null;
    return { rule: result.error.issues[0]?.message ?? 'is not valid' };
  };
}
