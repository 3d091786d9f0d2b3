/** The roles a member holds inside a workspace, most powerful first. */
// No zod here: the apps' first screen imports this, and zod belongs in the lazy chunks.
export const ROLES = ['owner', 'admin', 'designer', 'reviewer'] as const;
export type Role = (typeof ROLES)[number];

/**
 * What a role may do. The server checks these on every workspace route; the apps use the same
 * table to hide what the signed-in member may not do.
 */
export const PERMISSIONS = {
  'workspace.read': ['owner', 'admin', 'designer', 'reviewer'],
  'workspace.delete': ['owner'],
  'billing.manage': ['owner'],
  'billing.read': ['owner', 'admin'],
  'settings.manage': ['owner', 'admin'],
  'members.manage': ['owner', 'admin'],
  'invitations.manage': ['owner', 'admin'],
  'audit.read': ['owner', 'admin'],
  'materials.manage': ['owner', 'admin'],
  'projects.edit': ['owner', 'admin', 'designer'],
  'review.decide': ['owner', 'admin', 'reviewer'],
  'review.comment': ['owner', 'admin', 'designer', 'reviewer'],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

/** True when `role` grants `permission`. */
export function can(role: Role | null | undefined, permission: Permission): boolean {
  return !!role && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

/** Only owners may grant or take away the owner role. */
export function canAssignRole(actor: Role, target: Role): boolean {
  if (!can(actor, 'members.manage')) return false;
  return target !== 'owner' || actor === 'owner';
}
