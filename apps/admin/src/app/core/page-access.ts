import type { ActivatedRouteSnapshot } from '@angular/router';
import { can, type Permission, type Role } from '@tumblewise/shared';

/** Who may open an admin page: members whose role grants a permission, or platform operators. */
export type PageAccess = { permission: Permission } | { operator: true };

/** Pages without a rule of their own are for roles that manage the workspace. */
export const DEFAULT_PAGE_ACCESS: PageAccess = { permission: 'members.manage' };

/** Whether a member with `role` (null: no membership) who is or is not an operator may open a page. */
export function mayOpenPage(access: PageAccess | undefined, role: Role | null, isOperator: boolean): boolean {
  const rule = access ?? DEFAULT_PAGE_ACCESS;
  return 'operator' in rule ? isOperator : can(role, rule.permission);
}

/** The access rule of the deepest active route (its `data.access`). */
export function pageAccessOf(root: ActivatedRouteSnapshot): PageAccess | undefined {
  let route = root;
  while (route.firstChild) route = route.firstChild;
  return route.data['access'] as PageAccess | undefined;
}
