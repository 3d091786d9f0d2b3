import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { Billing } from '@tumblewise/shared';

/** Seats held now: every active member and every pending invitation takes one. */
export function seatsInUse(seats: Billing['seats']): number {
  return seats.members + seats.pendingInvitations;
}

/** "2 members and 1 pending invitation". */
export function seatHoldersText(seats: Billing['seats']): string {
  const members = `${seats.members} ${seats.members === 1 ? 'member' : 'members'}`;
  if (!seats.pendingInvitations) return members;
  return `${members} and ${seats.pendingInvitations} pending ${seats.pendingInvitations === 1 ? 'invitation' : 'invitations'}`;
}

/** "1 member holds a seat", "3 members and 1 pending invitation hold seats". */
export function seatHoldersClause(seats: Billing['seats']): string {
  const one = seatsInUse(seats) === 1;
  return `${seatHoldersText(seats)} ${one ? 'holds a seat' : 'hold seats'}`;
}

/**
 * The seat count rule: a whole number from 1 to 1000 (the server's limits) and never below the
 * seats in use, which `inUse` reports at the time of the check (it changes as billing reloads).
 */
export function seatCountValidator(inUse: () => { count: number; clause: string } | null): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const raw = control.value as number | string | null;
    if (raw === null || raw === '') return { required: true };
    const seats = Number(raw);
    if (!Number.isFinite(seats)) return { rule: 'must be a number' };
    if (!Number.isInteger(seats)) return { rule: 'must be a whole number' };
    if (seats < 1) return { rule: 'must be at least 1' };
    if (seats > 1000) return { rule: 'must be at most 1000' };
    const used = inUse();
    if (used && seats < used.count) {
      return { rule: `must be at least ${used.count}: ${used.clause}. Remove members or revoke invitations first` };
    }
    return null;
  };
}
