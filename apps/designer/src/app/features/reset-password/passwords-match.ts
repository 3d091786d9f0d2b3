import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';

/** Group validator: the `confirm` control must repeat the `password` control; the error sits on `confirm`. */
export function passwordsMatch(): ValidatorFn {
  return (group: AbstractControl): ValidationErrors | null => {
    const password = group.get('password');
    const confirm = group.get('confirm');
    if (!password || !confirm) return null;
    const mismatch = !!confirm.value && password.value !== confirm.value;
    const { mismatch: _previous, ...others } = confirm.errors ?? {};
    if (mismatch) {
      confirm.setErrors({ ...others, mismatch: 'The two passwords differ.' });
    } else if (_previous) {
      confirm.setErrors(Object.keys(others).length ? others : null);
    }
    return null;
  };
}
