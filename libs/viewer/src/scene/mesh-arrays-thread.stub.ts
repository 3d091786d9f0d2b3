/** The unit tests' stand-in for `mesh-arrays-thread.ts` (mapped in jest.angular.config.js): jsdom has no workers. */
export function startMeshArraysWorker(): Worker | null {
  return null;
}
