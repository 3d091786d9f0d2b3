import { ChangeDetectionStrategy, Component, ElementRef, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { AuthApi, toApiError } from '@tumblewise/api-client';
import { passwordSchema } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';
import { passwordsMatch } from './passwords-match';

/** Sets a new password with the token from the reset e-mail (`/reset-password?token=…`). */
@Component({
  selector: 'tw-reset-password',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormField, MatLabel, MatError, MatHint, MatInput, MatButton, ErrorBanner, FieldErrorPipe],
  templateUrl: './reset-password.html',
})
export class ResetPassword {
  /** The single-use token from the e-mail link (query parameter). */
  readonly token = input<string | undefined>();

  private readonly authApi = inject(AuthApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = inject(NonNullableFormBuilder).group(
    {
      password: ['', [Validators.required, zodValidator(passwordSchema)]],
      confirm: ['', [Validators.required]],
    },
    { validators: [passwordsMatch()] },
  );
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** True when the server said the link is expired or used (410). */
  protected readonly linkExpired = signal(false);
  protected readonly doneMessage = signal<string | null>(null);

  /** Saves the new password. */
  protected saveNewPassword(): void {
    this.failure.set(null);
    const token = this.token();
    if (!token) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.submitting.set(true);
    this.authApi.confirmPasswordReset({ token, password: this.form.getRawValue().password }).subscribe({
      next: (answer) => {
        this.submitting.set(false);
        this.doneMessage.set(answer?.message || 'Your password has been changed.');
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        if (fault.status === 410 || fault.field === 'token') {
          this.linkExpired.set(true);
          this.failure.set(fault.message);
        } else if (!applyServerError(this.form, fault)) {
          this.failure.set(fault.message);
        }
      },
    });
  }
}
