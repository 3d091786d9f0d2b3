import type { PartDocument, Primitive, Tolerance } from '../../schemas/part-document';
import { createBody, type Body } from '../composition/body';
import { composeBodies } from '../composition/compose-bodies';
import { placeSolid } from '../composition/place-solid';
import { mat3, type Mat3 } from '../linear/mat3';
import { rotationFromDegrees } from '../linear/rotation-from-degrees';
import { integrateIndexedMesh } from '../mesh/integrate-mesh';
import { validateIndexedMesh } from '../mesh/validate-mesh';
import { weldVertices } from '../mesh/weld-vertices';
import { createSolid, type Solid } from '../primitives/solid';
import { EngineInputError, type InputIssue } from './engine-input-error';
import { primitiveDimensions, solidFromDimensions } from './primitive-dimensions';

/** A material as the caller resolves it from `materialId`. */
export interface ResolvedMaterial {
  /** kg/m³ */
  density: number;
  /** Default scatter of primitives made of it. */
  tolerance?: Tolerance;
}

/** An uploaded mesh as the caller resolves it from `meshId`: a triangle soup (9 coordinates per triangle), as parseStl returns. */
export interface ResolvedMesh {
  corners: Float32Array | Float64Array;
  triangleCount: number;
}

/** How the engine reaches the caller's data. */
export interface PartResolvers {
  resolveMaterial?: (id: string) => ResolvedMaterial | undefined;
  resolveMesh?: (id: string) => ResolvedMesh | undefined;
}

/** One primitive as placed in the part. */
export interface PlacedPiece {
  index: number;
  primitive: Primitive;
  /** Positive density actually used (kg/m³); for a point mass, 0. */
  density: number;
  /** +1 for add, −1 for remove. */
  sign: 1 | -1;
  /** Unit-density solid in the primitive's local frame (m³, m, m⁵). */
  solid: Solid;
  /** Local → part rotation (row-major). */
  rotation: Mat3;
  /** Placed mass properties in part coordinates (signed). */
  body: Body;
  /** Dimensions in DIMENSION_NAMES order, and which the document states. */
  dimensions: number[];
  present: boolean[];
  /** Mesh vertices in local, scaled coordinates (meshes only), for reach and extents. */
  meshVertices?: Float64Array;
  /** Tolerance from the document, else from the material. */
  tolerance?: Tolerance;
}

/** Mass properties of a whole part with its pieces. */
export interface PartMassProperties {
  body: Body;
  pieces: PlacedPiece[];
  /** Whether any piece is a mesh (principal-moment equality then uses the looser mesh tolerance). */
  hasMesh: boolean;
}

/**
 * Mass, volume, centre of mass and inertia tensor at the centre of mass (part axes, SI) of a
 * validated part document: each primitive's closed form (or mesh integral) at unit density, scaled
 * by its density (from `density`, the resolved `materialId`, or `mass`/volume), rotated by
 * R = Rz·Ry·Rx and placed at `position`, removals with negative mass, composed by the parallel-axis
 * theorem. Throws EngineInputError('unanalysable') for an unknown material or mesh, a bad mesh, or
 * removals that leave no positive mass.
 */
export function partMassProperties(doc: PartDocument, resolvers: PartResolvers = {}): PartMassProperties {
  const issues: InputIssue[] = [];
  const pieces: PlacedPiece[] = [];
  let hasMesh = false;
  doc.primitives.forEach((p, index) => {
    const at = `primitives[${index}]`;
    const solid = createSolid();
    const { values, present } = primitiveDimensions(p);
    let meshVertices: Float64Array | undefined;
    if (p.shape === 'mesh') {
      hasMesh = true;
      const m = meshSolid(p, at, solid, issues, resolvers);
      if (!m) return;
      meshVertices = m;
    } else {
      solidFromDimensions(solid, p.shape, values);
    }
    let density = 0;
    let tolerance = p.tolerance;
    if (p.shape === 'point') {
      density = 0;
    } else if (p.density !== undefined) {
      density = p.density;
    } else if (p.materialId !== undefined) {
      const mat = resolvers.resolveMaterial?.(p.materialId);
      if (!mat || !(mat.density > 0) || !Number.isFinite(mat.density)) {
        issues.push({ path: `${at}.materialId`, message: `is not a known material (${p.materialId})` });
        return;
      }
      density = mat.density;
      tolerance = { ...mat.tolerance, ...p.tolerance };
    } else if (p.mass !== undefined) {
      density = p.mass / solid.volume;
    }
    const sign: 1 | -1 = p.mode === 'remove' ? -1 : 1;
    const rotation = rotationFromDegrees(mat3(), p.rotationDeg[0], p.rotationDeg[1], p.rotationDeg[2]);
    const body = createBody();
    if (p.shape === 'point') {
      body.mass = sign * p.mass!;
      body.volume = 0;
      body.center[0] = p.position[0];
      body.center[1] = p.position[1];
      body.center[2] = p.position[2];
    } else {
      placeSolid(body, solid, sign * density, rotation, p.position);
    }
    pieces.push({ index, primitive: p, density, sign, solid, rotation, body, dimensions: values, present, meshVertices, tolerance });
  });
  if (issues.length > 0) throw new EngineInputError('unanalysable', issues);
  const body = composeBodies(
    createBody(),
    pieces.map((x) => x.body),
  );
  if (!(body.mass > 0)) {
    const removals = pieces.filter((x) => x.sign < 0).sort((a, b) => a.body.mass - b.body.mass);
    const path = removals.length > 0 ? `primitives[${removals[0].index}]` : 'primitives';
    throw new EngineInputError('unanalysable', [
      { path, message: `removals leave no mass (total ${body.mass.toPrecision(4)} kg): a removal is larger than what it cuts` },
    ]);
  }
  return { body, pieces, hasMesh };
}

/** Integrates a mesh primitive into `solid`; returns its scaled local vertices, or null after recording issues. */
function meshSolid(
  p: Extract<Primitive, { shape: 'mesh' }>,
  at: string,
  solid: Solid,
  issues: InputIssue[],
  resolvers: PartResolvers,
): Float64Array | null {
  let vertices: Float64Array;
  let triangles: Uint32Array;
  let where: string;
  if (p.meshId !== undefined) {
    where = `${at}.meshId`;
    const resolved = resolvers.resolveMesh?.(p.meshId);
    if (!resolved) {
      issues.push({ path: where, message: `is not a known mesh (${p.meshId})` });
      return null;
    }
    ({ vertices, triangles } = weldVertices(resolved.corners, resolved.triangleCount));
  } else {
    where = `${at}.triangles`;
    vertices = Float64Array.from(p.vertices!.flat());
    triangles = Uint32Array.from(p.triangles!.flat());
  }
  const check = validateIndexedMesh(vertices, triangles);
  if (!check.ok) {
    for (const pr of check.problems.filter((x) => !x.fixed)) issues.push({ path: where, message: pr.message });
    return null;
  }
  integrateIndexedMesh(solid, vertices, triangles, p.scale);
  for (let i = 0; i < vertices.length; i++) vertices[i] *= p.scale;
  return vertices;
}
