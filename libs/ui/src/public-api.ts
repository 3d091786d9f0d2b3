/*
 * Public surface of the shared UI: the app shell and the common building blocks of both apps.
 */
export * from './app-shell/app-shell';
export * from './app-shell/shell-link';
export * from './workspace-switcher/workspace-switcher';
export * from './page-header/page-header';
export * from './empty-state/empty-state';
export * from './loading-state/loading-state';
export * from './error-banner/error-banner';
export * from './confirm-dialog/confirm-dialog';
export * from './confirm-dialog/confirmation';
export * from './cautions/cautions';
export * from './forms/zod-validator';
export * from './forms/field-error';
export * from './forms/server-error';
export * from './labels/role-labels';
export * from './browser/page-navigation';
export * from './forms/focus-first-invalid';
export * from './not-found/not-found';
export * from './overlay/labelled-overlay-container';
export * from './chips/verdict-chip';
export * from './chips/status-chip';
export * from './workspace-state-banner/workspace-notice';
export * from './workspace-state-banner/workspace-state-banner';
