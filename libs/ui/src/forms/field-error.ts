import { Pipe, PipeTransform } from '@angular/core';
import type { AbstractControl, ValidationErrors } from '@angular/forms';

/** Known Angular validator keys and their phrasing. */
const BUILT_IN: Record<string, (value: unknown) => string> = {
  required: () => 'is required',
  email: () => 'must be an e-mail address',
  minlength: (v) => `must be at least ${(v as { requiredLength: number }).requiredLength} characters`,
  maxlength: (v) => `must be at most ${(v as { requiredLength: number }).requiredLength} characters`,
};

/**
 * The first error of a control as a sentence. String-valued errors are messages: one starting in
 * lower case reads after the field's label ("Password must be at least 10 characters."), one
 * starting in upper case (a server's full sentence) is shown as it is.
 */
export function fieldErrorMessage(errors: ValidationErrors | null | undefined, label: string): string {
  if (!errors) return '';
  const [key, value] = Object.entries(errors)[0] ?? [];
  if (key === undefined) return '';
  const phrase = typeof value === 'string' ? value : (BUILT_IN[key]?.(value) ?? 'is not valid');
  const sentence = /^[a-z]/.test(phrase) ? `${label} ${phrase}` : phrase;
  return /[.!?]$/.test(sentence) ? sentence : `${sentence}.`;
}

/** `{{ form.controls.email | fieldError: 'E-mail' }}` — the control's current error as a sentence. */
@Pipe({ name: 'fieldError', pure: false })
export class FieldErrorPipe implements PipeTransform {
  /** Formats the control's first error after `label`. */
  transform(control: AbstractControl | null | undefined, label: string): string {
    return fieldErrorMessage(control?.errors, label);
  }
}
