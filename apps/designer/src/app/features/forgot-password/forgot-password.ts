import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { AuthApi, toApiError } from '@tumblewise/api-client';
import { emailSchema } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';

/** Asks for a password-reset e-mail. */
@Component({
  selector: 'tw-forgot-password',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormField, MatLabel, MatError, MatInput, MatButton, ErrorBanner, FieldErrorPipe],
  templateUrl: './forgot-password.html',
})
export class ForgotPassword {
  private readonly authApi = inject(AuthApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, zodValidator(emailSchema)]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** The server's confirmation once the request went through. */
  protected readonly sentMessage = signal<string | null>(null);

  /** Requests the reset link. */
  protected requestResetLink(): void {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.submitting.set(true);
    this.authApi.requestPasswordReset({ email: this.form.getRawValue().email.trim() }).subscribe({
      next: (answer) => {
        this.submitting.set(false);
        this.sentMessage.set(answer?.message || 'If an account exists for that address, a reset link is on its way.');
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        if (!applyServerError(this.form, fault)) this.failure.set(fault.message);
      },
    });
  }
}
