import { createSolid, type Solid } from '../primitives/solid';
import { integrateIndexedMesh } from './integrate-mesh';
import type { MeshProblem } from './mesh-problem';
import type { ParsedMesh } from './parse-stl';
import { validateIndexedMesh } from './validate-mesh';
import { weldVertices } from './weld-vertices';

/** Outcome of checking and integrating a parsed mesh. */
export type MeshAnalysis =
  | {
      ok: true;
      solid: Solid;
      problems: MeshProblem[];
      vertexCount: number;
      triangleCount: number;
      bounds: { min: [number, number, number]; max: [number, number, number] };
      /** The welded mesh that was checked (file units), for further checks. */
      welded: { vertices: Float64Array; triangles: Uint32Array };
    }
  | { ok: false; problems: MeshProblem[] };

/**
 * Welds, validates (closed 2-manifold, consistent orientation, no degenerate triangles; an inside-out
 * mesh is flipped and reported) and integrates a parsed STL at unit density, scaled by `scale`
 * (0.001 for millimetres). Output in m³, m, m⁵; bounds in scaled units.
 */
export function meshMassProperties(mesh: ParsedMesh, scale = 1): MeshAnalysis {
  const { vertices, triangles } = weldVertices(mesh.corners, mesh.triangleCount);
  const check = validateIndexedMesh(vertices, triangles);
  if (!check.ok) return { ok: false, problems: check.problems };
  const solid = integrateIndexedMesh(createSolid(), vertices, triangles, scale);
  const min: [number, number, number] = [Infinity, Infinity, Infinity],
    max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < vertices.length; i += 3) {
    for (let k = 0; k < 3; k++) {
      const v = vertices[i + k] * scale;
      if (v < min[k]) min[k] = v;
      if (v > max[k]) max[k] = v;
    }
  }
  return {
    ok: true,
    solid,
    problems: check.problems,
    vertexCount: vertices.length / 3,
    triangleCount: mesh.triangleCount,
    bounds: { min, max },
    welded: { vertices, triangles },
  };
}
