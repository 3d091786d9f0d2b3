import { FormControl, FormGroup, Validators } from '@angular/forms';
import { passwordSchema } from '@tumblewise/shared';
import { fieldErrorMessage, FieldErrorPipe } from './field-error';
import { applyServerError } from './server-error';
import { zodValidator } from './zod-validator';

describe('fieldErrorMessage', () => {
  it('is empty without errors', () => {
    expect(fieldErrorMessage(null, 'E-mail')).toBe('');
    expect(fieldErrorMessage({}, 'E-mail')).toBe('');
  });

  it('phrases the built-in validators after the label', () => {
    expect(fieldErrorMessage({ required: true }, 'E-mail')).toBe('E-mail is required.');
    expect(fieldErrorMessage({ maxlength: { requiredLength: 80, actualLength: 90 } }, 'Name')).toBe('Name must be at most 80 characters.');
  });

  it('puts a lower-case rule message after the label and shows a sentence as it is', () => {
    expect(fieldErrorMessage({ rule: 'must be an e-mail address' }, 'E-mail')).toBe('E-mail must be an e-mail address.');
    expect(fieldErrorMessage({ server: 'This address is already a member.' }, 'E-mail')).toBe('This address is already a member.');
  });
});

describe('zodValidator with the shared password rule', () => {
  const control = new FormControl('', { nonNullable: true, validators: [zodValidator(passwordSchema)] });

  it('refuses a password under 10 characters with the schema message', () => {
    control.setValue('short');
    expect(new FieldErrorPipe().transform(control, 'Password')).toBe('Password must be at least 10 characters.');
  });

  it('refuses more than 72 bytes even under 72 characters', () => {
    control.setValue('é'.repeat(40)); // 40 characters, 80 UTF-8 bytes
    expect(control.errors?.['rule']).toMatch(/72 bytes/);
  });

  it('accepts a password of 10 to 72 characters', () => {
    control.setValue('ten chars!');
    expect(control.errors).toBeNull();
  });
});

describe('applyServerError', () => {
  const form = new FormGroup({ email: new FormControl('', { validators: [Validators.required] }), name: new FormControl('') });

  it('puts the message on the control the server named and marks it touched', () => {
    expect(applyServerError(form, { field: 'email', message: 'This address is already invited.' })).toBe(true);
    expect(form.controls.email.errors?.['server']).toBe('This address is already invited.');
    expect(form.controls.email.touched).toBe(true);
  });

  it('clears once the user edits the field', () => {
    applyServerError(form, { field: 'name', message: 'Too long.' });
    form.controls.name.setValue('Mira');
    expect(form.controls.name.errors).toBeNull();
  });

  it('reports false when no control matches, so the caller shows it elsewhere', () => {
    expect(applyServerError(form, { message: 'Server down.' })).toBe(false);
    expect(applyServerError(form, { field: 'workspaceId', message: 'Not found.' })).toBe(false);
  });
});
