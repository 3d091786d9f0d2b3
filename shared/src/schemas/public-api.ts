export * from './common';
export * from './roles';
export * from './role-schema';
export * from './error-body';
export * from './accounts';
export * from './members';
export * from './projects';
export * from './part-document';
