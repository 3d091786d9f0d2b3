import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { AuthApi, toApiError } from '@tumblewise/api-client';
import { emailSchema, passwordSchema, personNameSchema, workspaceNameSchema } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';

/** Creates a workspace and its owner account, then opens the workspace. */
@Component({
  selector: 'tw-sign-up',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormField, MatLabel, MatError, MatHint, MatInput, MatButton, ErrorBanner, FieldErrorPipe],
  templateUrl: './sign-up.html',
})
export class SignUp {
  private readonly authApi = inject(AuthApi);
  private readonly router = inject(Router);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = inject(NonNullableFormBuilder).group({
    workspaceName: ['', [Validators.required, zodValidator(workspaceNameSchema)]],
    name: ['', [Validators.required, zodValidator(personNameSchema)]],
    email: ['', [Validators.required, zodValidator(emailSchema)]],
    password: ['', [Validators.required, zodValidator(passwordSchema)]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);

  /** Creates the workspace; a refused field gets the server's reason beside it. */
  protected createWorkspace(): void {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.submitting.set(true);
    const { workspaceName, name, email, password } = this.form.getRawValue();
    this.authApi.signUp({ workspaceName: workspaceName.trim(), name: name.trim(), email: email.trim(), password }).subscribe({
      next: () => {
        this.submitting.set(false);
        void this.router.navigateByUrl('/');
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        if (!applyServerError(this.form, fault)) this.failure.set(fault.message);
        focusFirstInvalid(this.host.nativeElement);
      },
    });
  }
}
