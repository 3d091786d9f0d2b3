import type { AbstractControl } from '@angular/forms';

/** The part of an API error a form needs. */
export interface FieldFault {
  message: string;
  field?: string;
}

/**
 * Puts a server error beside the control the server named (`field` of the error body). Returns
 * true when a control took it; false when the caller should show the message elsewhere.
 */
export function applyServerError(form: AbstractControl, fault: FieldFault, aliases: Record<string, string> = {}): boolean {
  if (!fault.field) return false;
  const control = form.get(aliases[fault.field] ?? fault.field);
  if (!control) return false;
  control.setErrors({ ...(control.errors ?? {}), server: fault.message });
  control.markAsTouched();
  return true;
}
