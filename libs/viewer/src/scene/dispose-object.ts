import type { BufferGeometry, Material, Object3D } from 'three';
import { SHARED_MATERIAL } from './shared-materials';

/** Marks a geometry a cache owns (userData key): disposing a drawn scene leaves it for the next one. */
export const CACHED_GEOMETRY = 'twCachedGeometry';

/**
 * Frees the GPU resources of `root` and everything under it (geometries and materials; the viewer
 * uses no textures) and detaches it from its parent. Geometries a cache owns (uploaded meshes,
 * marked with CACHED_GEOMETRY) stay for the next drawing; the cache frees them. Shared materials
 * (SHARED_MATERIAL) stay too: they keep their compiled shaders for the next drawing.
 */
export function disposeObject(root: Object3D): void {
  root.traverse((o) => {
    const item = o as Object3D & { geometry?: BufferGeometry; material?: Material | Material[] };
    if (item.geometry && !item.geometry.userData[CACHED_GEOMETRY]) item.geometry.dispose();
    const m = item.material;
    for (const x of Array.isArray(m) ? m : m ? [m] : []) if (!x.userData[SHARED_MATERIAL]) x.dispose();
  });
  root.removeFromParent();
}
