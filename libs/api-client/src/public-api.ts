/*
 * Public surface of the typed API client: calls, auth state, interceptors and workspace context.
 */
export * from './api-base-url';
export * from './return-to';
export * from './errors/api-error';
export * from './errors/error-interceptor';
export * from './auth/auth-state';
export * from './auth/auth-api';
export * from './auth/auth-interceptor';
export * from './auth/skip-refresh';
export * from './workspace/workspace-context';
export * from './members/members-api';
export * from './invitations/invitations-api';
export * from './audit/audit-api';
export * from './projects/projects-api';
export * from './materials/materials-api';
export * from './parts/parts-api';
export * from './variants/variants-api';
export * from './analysis/analysis-api';
export * from './design/design-api';
export * from './simulation/simulation-api';
export * from './reviews/reviews-api';
export * from './scatter/scatter-api';
export * from './measurements/measurements-api';
export * from './downloads/download-file';
export * from './billing/workspace-standing';
export * from './billing/billing-api';
export * from './billing/workspace-state-interceptor';
export * from './settings/settings-api';
export * from './operator/operator-api';
export * from './materials/material-library-api';
export * from './meshes/meshes-api';
