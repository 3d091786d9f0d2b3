import { ChangeDetectionStrategy, Component, ElementRef, inject, input, OnInit, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { AuthApi, AuthState, safeReturnTo, toApiError } from '@tumblewise/api-client';
import { emailSchema } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, PageNavigation, zodValidator } from '@tumblewise/ui';

/** Sign-in with e-mail and password; afterwards goes to `returnTo` when it is a path on this site. */
@Component({
  selector: 'tw-sign-in',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, RouterLink, MatFormField, MatLabel, MatError, MatInput, MatButton, ErrorBanner, FieldErrorPipe],
  templateUrl: './sign-in.html',
})
export class SignIn implements OnInit {
  /** Where to go after signing in (query parameter); only same-origin paths are honoured. */
  readonly returnTo = input<string | undefined>();
  /** Pre-fills the e-mail field (query parameter). */
  readonly email = input<string | undefined>();

  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthState);
  private readonly router = inject(Router);
  private readonly page = inject(PageNavigation);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, zodValidator(emailSchema)]],
    password: ['', [Validators.required]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);

  ngOnInit(): void {
    if (this.auth.signedIn()) {
      this.goOn();
      return;
    }
    const email = this.email();
    if (email) this.form.controls.email.setValue(email);
  }

  /** Sends the credentials; shows the server's reason beside the field or above the form. */
  protected signIn(): void {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    this.submitting.set(true);
    this.authApi.signIn(this.form.getRawValue()).subscribe({
      next: () => {
        this.submitting.set(false);
        this.goOn();
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        if (!applyServerError(this.form, fault)) this.failure.set(fault.message);
      },
    });
  }

  private goOn(): void {
    const target = safeReturnTo(this.returnTo()) ?? '/';
    if (target === '/admin' || target.startsWith('/admin/')) {
      this.page.assign(target);
    } else {
      void this.router.navigateByUrl(target);
    }
  }
}
