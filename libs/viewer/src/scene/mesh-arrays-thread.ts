/**
 * Starts the mesh-drawing worker (the builder bundles `mesh-arrays.worker.ts` as its own file), or
 * answers null where there are no workers. Kept apart because of `import.meta`, which the unit
 * tests' CommonJS cannot load; they use `mesh-arrays-thread.stub.ts`.
 */
export function startMeshArraysWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  return new Worker(new URL('./mesh-arrays.worker', import.meta.url), { type: 'module', name: 'mesh-arrays' });
}
