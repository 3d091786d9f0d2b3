import { inject } from '@angular/core';
import { Routes } from '@angular/router';
import { AuthState } from '@tumblewise/api-client';
import { NotFound } from '@tumblewise/ui';
import { requireSession } from './core/require-session';
import type { PageAccess } from './core/page-access';

const access = (rule: PageAccess) => ({ access: rule });

/**
 * Routes of the admin app (served under /admin/); every page needs a session. A page's
 * `data.access` says who may open it; the root shows the not-allowed page to anyone else.
 */
export const routes: Routes = [
  {
    path: '',
    pathMatch: 'full',
    // An operator without a workspace of their own lands on the platform pages.
    redirectTo: () => {
      const auth = inject(AuthState);
      return auth.user()?.isOperator && !auth.memberships().length ? 'operator/workspaces' : 'members';
    },
  },
  {
    path: 'members',
    title: 'Members · Tumblewise admin',
    canActivate: [requireSession],
    loadComponent: () => import('./features/members/members').then((m) => m.Members),
  },
  {
    path: 'invitations',
    title: 'Invitations · Tumblewise admin',
    canActivate: [requireSession],
    loadComponent: () => import('./features/invitations/invitations').then((m) => m.Invitations),
  },
  {
    path: 'subscription',
    title: 'Subscription · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ permission: 'billing.read' }),
    loadComponent: () => import('./features/subscription/subscription').then((m) => m.Subscription),
  },
  {
    path: 'invoices',
    title: 'Invoices · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ permission: 'billing.read' }),
    loadComponent: () => import('./features/invoices/invoices').then((m) => m.Invoices),
  },
  {
    path: 'materials',
    title: 'Material library · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ permission: 'materials.manage' }),
    loadComponent: () => import('./features/materials/material-library').then((m) => m.MaterialLibrary),
  },
  {
    path: 'settings',
    title: 'Workspace settings · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ permission: 'settings.manage' }),
    loadComponent: () => import('./features/settings/workspace-settings').then((m) => m.WorkspaceSettingsPage),
  },
  {
    path: 'audit',
    title: 'Audit trail · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ permission: 'audit.read' }),
    loadComponent: () => import('./features/audit/audit').then((m) => m.Audit),
  },
  { path: 'operator', pathMatch: 'full', redirectTo: 'operator/workspaces' },
  {
    path: 'operator/workspaces',
    title: 'All workspaces · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ operator: true }),
    loadComponent: () => import('./features/operator/operator-workspaces').then((m) => m.OperatorWorkspaces),
  },
  {
    path: 'operator/health',
    title: 'Platform health · Tumblewise admin',
    canActivate: [requireSession],
    data: access({ operator: true }),
    loadComponent: () => import('./features/operator/platform-health').then((m) => m.PlatformHealth),
  },
  { path: '**', title: 'Not found · Tumblewise admin', canActivate: [requireSession], component: NotFound },
];
