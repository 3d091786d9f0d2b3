import { Routes } from '@angular/router';
import { NotFound } from '@tumblewise/ui';
import { redirectSignedIn } from './core/redirect-signed-in';
import { requireSession } from './core/require-session';

/** Routes of the designer app; the account screens are public, everything else needs a session. */
export const routes: Routes = [
  {
    path: '',
    pathMatch: 'full',
    title: 'Projects · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/projects/projects').then((m) => m.Projects),
  },
  // The project list lives at the home address; `/projects` is where people type it.
  { path: 'projects', pathMatch: 'full', redirectTo: '' },
  {
    path: 'projects/:projectId',
    title: 'Project · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/project/project-parts').then((m) => m.ProjectParts),
  },
  {
    path: 'projects/:projectId/parts/:partId',
    title: 'Part editor · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/part-editor/part-editor').then((m) => m.PartEditor),
  },
  // Compare, scatter study and the review e-mail's link.
  {
    path: 'projects/:projectId/parts/:partId/compare',
    title: 'Compare variants · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/compare/compare').then((m) => m.Compare),
  },
  {
    path: 'projects/:projectId/parts/:partId/scatter',
    title: 'Scatter study · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/scatter/scatter-study').then((m) => m.ScatterStudyPage),
  },
  {
    path: 'projects/:projectId/parts/:partId/goal-seek',
    title: 'Goal seek · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/goal-seek/goal-seek').then((m) => m.GoalSeekPage),
  },
  {
    path: 'projects/:projectId/parts/:partId/parameter-map',
    title: 'Parameter map · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/parameter-map/parameter-map').then((m) => m.ParameterMapPage),
  },
  {
    path: 'projects/:projectId/parts/:partId/measurements',
    title: 'Measured data · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/measurements/measured-data').then((m) => m.MeasuredData),
  },
  {
    path: 'review/:variantId',
    title: 'Open for review · Tumblewise',
    canActivate: [requireSession],
    loadComponent: () => import('./features/review-link/review-link').then((m) => m.ReviewLink),
  },
  { path: 'signin', title: 'Sign in · Tumblewise', loadComponent: () => import('./features/sign-in/sign-in').then((m) => m.SignIn) },
  {
    path: 'signup',
    title: 'Create a workspace · Tumblewise',
    canActivate: [redirectSignedIn],
    loadComponent: () => import('./features/sign-up/sign-up').then((m) => m.SignUp),
  },
  {
    path: 'forgot-password',
    title: 'Forgot password · Tumblewise',
    loadComponent: () => import('./features/forgot-password/forgot-password').then((m) => m.ForgotPassword),
  },
  {
    path: 'reset-password',
    title: 'Choose a new password · Tumblewise',
    loadComponent: () => import('./features/reset-password/reset-password').then((m) => m.ResetPassword),
  },
  {
    path: 'invitations/accept',
    title: 'Join a workspace · Tumblewise',
    loadComponent: () => import('./features/accept-invitation/accept-invitation').then((m) => m.AcceptInvitation),
  },
  { path: '**', title: 'Not found · Tumblewise', component: NotFound },
];
