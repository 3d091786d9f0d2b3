// Isomorphic schemas and types shared by the server and both apps. No DOM and no Node-only APIs.
// The mechanics engine has its own entry point, `@tumblewise/engine` (shared/src/engine/public-api.ts),
// so the apps load it (and mathjs) only where they use it.
export * from './schemas/public-api';
export * from './compare/comparison';
