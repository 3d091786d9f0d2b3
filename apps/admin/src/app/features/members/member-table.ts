import type { Member } from '@tumblewise/shared';
import { ROLE_LABELS } from '@tumblewise/ui';

/** Matches a member against the filter text: name, e-mail or role, ignoring case. */
export function memberMatchesFilter(member: Member, filter: string): boolean {
  const needle = filter.trim().toLowerCase();
  if (!needle) return true;
  return [member.name, member.email, ROLE_LABELS[member.role] ?? member.role].some((value) => value.toLowerCase().includes(needle));
}

/** The value a column sorts by: names and e-mails without case, roles by rank, joining by date. */
export function memberSortValue(member: Member, column: string): string | number {
  switch (column) {
    case 'name':
      return member.name.toLocaleLowerCase();
    case 'email':
      return member.email.toLowerCase();
    case 'role':
      return ROLE_RANK[member.role] ?? 99;
    case 'joined':
      return Date.parse(member.joinedAt) || 0;
    default:
      return '';
  }
}

const ROLE_RANK: Record<string, number> = { owner: 0, admin: 1, designer: 2, reviewer: 3 };
