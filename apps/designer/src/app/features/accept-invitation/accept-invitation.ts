import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { AuthApi, AuthState, InvitationsApi, toApiError, type ApiError } from '@tumblewise/api-client';
import { passwordSchema, personNameSchema } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, LoadingState, ROLE_LABELS, zodValidator } from '@tumblewise/ui';
import { switchMap } from 'rxjs';

/** Which way the page offers to accept. */
export type AcceptMode = 'create-account' | 'sign-in' | 'signed-in';

/**
 * The page an invitation e-mail links to (`/invitations/accept?token=…`): shows what the
 * invitation offers and lets the invitee join — with a new account, by signing in to an existing
 * one, or with one button when already signed in.
 */
@Component({
  selector: 'tw-accept-invitation',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    RouterLink,
    DatePipe,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatInput,
    MatButton,
    ErrorBanner,
    FieldErrorPipe,
    LoadingState,
  ],
  templateUrl: './accept-invitation.html',
  styleUrl: './accept-invitation.scss',
})
export class AcceptInvitation {
  /** The invitation token from the e-mail link (query parameter). */
  readonly token = input<string | undefined>();

  private readonly invitationsApi = inject(InvitationsApi);
  private readonly authApi = inject(AuthApi);
  protected readonly auth = inject(AuthState);
  private readonly router = inject(Router);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly formBuilder = inject(NonNullableFormBuilder);

  protected readonly roleLabels = ROLE_LABELS;
  protected readonly preview = rxResource({
    params: () => this.token() || undefined,
    stream: ({ params: token }) => this.invitationsApi.preview(token),
  });
  protected readonly previewError = computed(() => {
    const error = this.preview.error();
    return error ? toApiError(error) : null;
  });

  /** Set when the server answered `account_exists` to an account creation. */
  private readonly accountFound = signal(false);
  protected readonly mode = computed<AcceptMode>(() => {
    if (this.auth.signedIn()) return 'signed-in';
    if (this.accountFound() || this.preview.value()?.accountExists) return 'sign-in';
    return 'create-account';
  });
  /** True when the signed-in user's address is not the invited one. */
  protected readonly emailMismatch = computed(() => {
    const invited = this.preview.value()?.email;
    const mine = this.auth.user()?.email;
    return !!invited && !!mine && invited.toLowerCase() !== mine.toLowerCase();
  });

  protected readonly createForm = this.formBuilder.group({
    name: ['', [Validators.required, zodValidator(personNameSchema)]],
    password: ['', [Validators.required, zodValidator(passwordSchema)]],
  });
  protected readonly signInForm = this.formBuilder.group({
    password: ['', [Validators.required]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);

  /** Creates the invitee's account with name and password and joins the workspace. */
  protected createAccountAndJoin(): void {
    const token = this.token();
    if (!token || !this.checkForm(this.createForm)) return;
    const { name, password } = this.createForm.getRawValue();
    this.start();
    this.invitationsApi.accept({ token, name: name.trim(), password }).subscribe({
      next: () => this.finish(),
      error: (error: unknown) => {
        const fault = this.stop(error);
        if (fault.code === 'account_exists') {
          this.accountFound.set(true);
          this.failure.set('This address already has an account. Sign in to accept the invitation.');
        } else if (!applyServerError(this.createForm, fault)) {
          this.failure.set(fault.message);
        }
      },
    });
  }

  /** Signs in to the invited address's existing account, then joins the workspace. */
  protected signInAndJoin(): void {
    const token = this.token();
    const email = this.preview.value()?.email;
    if (!token || !email || !this.checkForm(this.signInForm)) return;
    this.start();
    this.authApi
      .signIn({ email, password: this.signInForm.getRawValue().password })
      .pipe(switchMap(() => this.invitationsApi.accept({ token })))
      .subscribe({
        next: () => this.finish(),
        error: (error: unknown) => {
          const fault = this.stop(error);
          if (fault.code === 'invalid_credentials') {
            applyServerError(this.signInForm, { field: 'password', message: fault.message });
          } else if (!applyServerError(this.signInForm, fault)) {
            this.failure.set(fault.message);
          }
        },
      });
  }

  /** Adds the invited membership to the signed-in account. */
  protected joinWorkspace(): void {
    const token = this.token();
    if (!token) return;
    this.start();
    this.invitationsApi.accept({ token }).subscribe({
      next: () => this.finish(),
      error: (error: unknown) => this.failure.set(this.stop(error).message),
    });
  }

  /** Signs out so the invitee can sign in with the invited address. */
  protected signOutToSwitchAccount(): void {
    this.authApi.signOut().subscribe({ error: () => undefined });
  }

  private checkForm(form: { invalid: boolean; markAllAsTouched(): void }): boolean {
    this.failure.set(null);
    if (!form.invalid) return true;
    form.markAllAsTouched();
    focusFirstInvalid(this.host.nativeElement);
    return false;
  }

  private start(): void {
    this.failure.set(null);
    this.submitting.set(true);
  }

  private stop(error: unknown): ApiError {
    this.submitting.set(false);
    return toApiError(error);
  }

  private finish(): void {
    this.submitting.set(false);
    void this.router.navigateByUrl('/');
  }
}
