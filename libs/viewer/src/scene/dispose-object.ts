import type { BufferGeometry, Material, Object3D } from 'three';

/** Marks a geometry a cache owns (userData key): disposing a drawn scene leaves it for the next one. */
export const CACHED_GEOMETRY = 'twCachedGeometry';

/**
 * Frees the GPU resources of `root` and everything under it (geometries and materials; the viewer
 * uses no textures) and detaches it from its parent. Geometries a cache owns (uploaded meshes,
 * marked with CACHED_GEOMETRY) stay for the next drawing; the cache frees them.
 */
export function disposeObject(root: Object3D): void {
  root.traverse((o) => {
    const item = o as Object3D & { geometry?: BufferGeometry; material?: Material | Material[] };
    if (item.geometry && !item.geometry.userData[CACHED_GEOMETRY]) item.geometry.dispose();
    const m = item.material;
    if (Array.isArray(m)) m.forEach((x) => x.dispose());
    else m?.dispose();
  });
  root.removeFromParent();
}
