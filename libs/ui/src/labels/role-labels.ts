import type { Role } from '@tumblewise/shared';

/** How each role is written on screen. */
export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  admin: 'Admin',
  designer: 'Designer',
  reviewer: 'Reviewer',
};
