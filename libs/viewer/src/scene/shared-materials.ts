import type { Material } from 'three';

/** Marks a material the viewer shares between drawings (userData key): disposing a scene leaves it. */
export const SHARED_MATERIAL = 'twSharedMaterial';

const materials = new Map<string, Material>();

/**
 * One material per `key` for every drawing. A scene is rebuilt at each change of the part; if its
 * materials were disposed with it, the renderer would drop their compiled shader programs and link
 * them again for the next drawing, a long pause on a CPU renderer. Shared ones keep the programs.
 * The few distinct materials (a colour and a look each) live as long as the page.
 */
export function sharedMaterial<T extends Material>(key: string, make: () => T): T {
  let material = materials.get(key) as T | undefined;
  if (!material) {
    material = make();
    material.userData[SHARED_MATERIAL] = true;
    materials.set(key, material);
  }
  return material;
}
