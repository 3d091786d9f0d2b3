import type { BufferGeometry, Material, Object3D } from 'three';

/**
 * Frees the GPU resources of `root` and everything under it (geometries and materials; the viewer
 * uses no textures) and detaches it from its parent.
 */
export function disposeObject(root: Object3D): void {
  root.traverse((o) => {
    const item = o as Object3D & { geometry?: BufferGeometry; material?: Material | Material[] };
    item.geometry?.dispose();
    const m = item.material;
    if (Array.isArray(m)) m.forEach((x) => x.dispose());
    else m?.dispose();
  });
  root.removeFromParent();
}
