// Isomorphic code shared by the server and both apps: schemas, types and (later) the engine.
// No DOM and no Node-only APIs in this folder.
export * from './schemas/public-api';
export * from './engine/public-api';
