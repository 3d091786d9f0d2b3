import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { MatTableModule } from '@angular/material/table';
import { InvitationsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { can, canAssignRole, emailSchema, ROLES, type Invitation, type Role } from '@tumblewise/shared';
import {
  applyServerError,
  Confirmation,
  EmptyState,
  ErrorBanner,
  FieldErrorPipe,
  focusFirstInvalid,
  LoadingState,
  PageHeader,
  ROLE_LABELS,
  zodValidator,
} from '@tumblewise/ui';
import { filter, switchMap } from 'rxjs';
import { deliveryLabel, mayResend, mayRevoke, STATUS_LABELS } from './invitation-status';

/** Invite by e-mail with a role; follow each invitation's status and delivery; re-send or revoke. */
@Component({
  selector: 'tw-invitations',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    ReactiveFormsModule,
    RouterLink,
    MatFormField,
    MatLabel,
    MatError,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    MatTableModule,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
  ],
  templateUrl: './invitations.html',
  styleUrl: './invitations.scss',
})
export class Invitations {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly invitationsApi = inject(InvitationsApi);
  private readonly confirmation = inject(Confirmation);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly roleLabels = ROLE_LABELS;
  protected readonly deliveryLabel = deliveryLabel;
  protected readonly mayResend = mayResend;
  protected readonly mayRevoke = mayRevoke;
  protected readonly columns = ['email', 'role', 'status', 'delivery', 'invitedBy', 'expires', 'actions'];

  protected readonly invitations = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.invitationsApi.list(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.invitations.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly mayManage = computed(() => can(this.workspace.role(), 'invitations.manage'));
  /** Roles the current user may invite with (admins cannot invite owners). */
  protected readonly invitableRoles = computed<Role[]>(() => {
    const actor = this.workspace.role();
    return actor ? ROLES.filter((role) => canAssignRole(actor, role)) : [];
  });

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, zodValidator(emailSchema)]],
    role: ['designer' as Role, [Validators.required]],
  });
  protected readonly submitting = signal(false);
  protected readonly formError = signal<string | null>(null);
  /** True after the server refused an invitation because every seat is taken. */
  protected readonly seatLimitReached = signal(false);
  /** Owners may buy seats; admins are told to ask one. */
  protected readonly mayBuySeats = computed(() => can(this.workspace.role(), 'billing.manage'));
  /** What the last invitation or re-send did, for the status line. */
  protected readonly notice = signal<string | null>(null);
  protected readonly actionError = signal<string | null>(null);
  protected readonly busyId = signal<string | null>(null);

  /** Sends the invitation; a refusal (already a member, already invited) shows beside the e-mail. */
  protected sendInvitation(formDirective: FormGroupDirective): void {
    const workspaceId = this.workspace.workspaceId();
    this.formError.set(null);
    this.seatLimitReached.set(false);
    this.notice.set(null);
    if (!workspaceId) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const { email, role } = this.form.getRawValue();
    this.submitting.set(true);
    this.invitationsApi.create(workspaceId, { email: email.trim(), role }).subscribe({
      next: (invitation) => {
        this.submitting.set(false);
        this.invitations.update((list) => [invitation, ...(list ?? []).filter((i) => i.id !== invitation.id)]);
        this.notice.set(
          invitation.delivery === 'sent'
            ? `Invitation sent to ${invitation.email}.`
            : `Invitation to ${invitation.email} saved, but the e-mail was ${deliveryLabel(invitation)}. Use "Re-send" once mail works again.`,
        );
        formDirective.resetForm({ email: '', role });
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        const mapped =
          applyServerError(this.form, fault) ||
          ((fault.code === 'already_member' || fault.code === 'already_invited') &&
            applyServerError(this.form, { field: 'email', message: fault.message }));
        if (!mapped) this.formError.set(fault.message);
        this.seatLimitReached.set(fault.code === 'seat_limit');
      },
    });
  }

  /** Sends the invitation e-mail again. */
  protected resendInvitation(invitation: Invitation): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.notice.set(null);
    this.busyId.set(invitation.id);
    this.invitationsApi.resend(workspaceId, invitation.id).subscribe({
      next: (updated) => {
        this.busyId.set(null);
        this.replace(updated);
        this.notice.set(
          updated.delivery === 'sent'
            ? `Invitation re-sent to ${updated.email}.`
            : `Re-sending to ${updated.email} failed: ${deliveryLabel(updated)}.`,
        );
      },
      error: (error: unknown) => {
        this.busyId.set(null);
        this.actionError.set(toApiError(error).message);
      },
    });
  }

  /** Asks for confirmation, then revokes the invitation so its link stops working. */
  protected revokeInvitation(invitation: Invitation): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.notice.set(null);
    this.confirmation
      .ask({
        title: `Revoke the invitation to ${invitation.email}?`,
        message: 'The link in the e-mail stops working. You can invite the address again later.',
        confirmLabel: 'Revoke',
        destructive: true,
      })
      .pipe(
        filter(Boolean),
        switchMap(() => {
          this.busyId.set(invitation.id);
          return this.invitationsApi.revoke(workspaceId, invitation.id);
        }),
      )
      .subscribe({
        next: (updated) => {
          this.busyId.set(null);
          this.replace(updated);
          this.notice.set(`Invitation to ${updated.email} revoked.`);
        },
        error: (error: unknown) => {
          this.busyId.set(null);
          this.actionError.set(toApiError(error).message);
        },
      });
  }

  /** A role as written on screen. */
  protected roleLabel(role: Role): string {
    return ROLE_LABELS[role] ?? role;
  }

  /** A status as written on screen. */
  protected statusLabel(status: Invitation['status']): string {
    return STATUS_LABELS[status] ?? status;
  }

  /** Loads the list again after a failure. */
  protected reloadInvitations(): void {
    this.invitations.reload();
  }

  private replace(updated: Invitation): void {
    this.invitations.update((list) => list?.map((i) => (i.id === updated.id ? updated : i)));
  }
}
