// The mesh-drawing worker: reads an uploaded mesh into drawable arrays off the page's main thread,
// so a large STL does not freeze the editor while it is read (see mesh-arrays-builder.ts).
import { meshArraysFromData } from './mesh-arrays';
import type { MeshArraysReply, MeshArraysRequest } from './mesh-arrays-builder';

/** The worker's global scope, typed as far as used here (the apps compile with the DOM library). */
const scope = self as unknown as {
  onmessage: ((event: MessageEvent<MeshArraysRequest>) => void) | null;
  postMessage(message: MeshArraysReply, transfer?: Transferable[]): void;
};

scope.onmessage = ({ data: { id, data, scale } }) => {
  try {
    const arrays = meshArraysFromData(data, scale);
    scope.postMessage({ id, ok: true, arrays }, [arrays.positions.buffer, arrays.normals.buffer]);
  } catch (err) {
    scope.postMessage({ id, ok: false, message: err instanceof Error && err.message ? err.message : 'it could not be read' });
  }
};
