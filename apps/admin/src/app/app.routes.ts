import { Routes } from '@angular/router';
import { NotFound } from '@tumblewise/ui';
import { requireSession } from './core/require-session';

/** Routes of the admin app (served under /admin/); every page needs a session. */
export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'members' },
  { path: 'members', title: 'Members · Tumblewise admin', canActivate: [requireSession], loadComponent: () => import('./features/members/members').then((m) => m.Members) },
  { path: 'invitations', title: 'Invitations · Tumblewise admin', canActivate: [requireSession], loadComponent: () => import('./features/invitations/invitations').then((m) => m.Invitations) },
  { path: 'audit', title: 'Audit trail · Tumblewise admin', canActivate: [requireSession], loadComponent: () => import('./features/audit/audit').then((m) => m.Audit) },
  { path: '**', title: 'Not found · Tumblewise admin', canActivate: [requireSession], component: NotFound },
];
