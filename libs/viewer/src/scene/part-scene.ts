import {
  Box3,
  type BufferGeometry,
  DoubleSide,
  Group,
  Matrix4,
  Mesh,
  MeshStandardMaterial,
  SphereGeometry,
  TorusGeometry,
  Vector3,
} from 'three';
import { sharedMaterial } from './shared-materials';
import type { PartDocument } from '@tumblewise/shared';
import type { SpinReport } from '@tumblewise/engine';
import { axisRod } from './axis-rod';
import type { MeshGeometryState } from './mesh-geometry';
import { placementMatrix } from './placement';
import { primitiveGeometry } from './primitive-geometry';
import { AXIS_ROLES, VIEWER_COLOURS } from './viewer-palette';

/** The drawn part: a body frame (centred on the centre of mass, turned by the attitude) holding the solids and the body axes. */
export interface PartScene {
  /** Rotate this by the attitude (part → space); its origin is the centre of mass. */
  readonly body: Group;
  /** Radius of a sphere about the centre of mass that holds the whole part (m); at least 1 mm. */
  readonly reach: number;
  /** Ids of primitives that could not be drawn (uploaded meshes not at hand). */
  readonly notDrawn: string[];
  /** Uploaded meshes (`meshId` primitives): drawn, still loading, or failed with the reason. */
  readonly uploadedMeshes: UploadedMeshStatus;
}

/** Where the uploaded meshes of one drawing stand (primitive ids). */
export interface UploadedMeshStatus {
  drawn: string[];
  pending: string[];
  failed: { id: string; message: string }[];
}

/** Answers the geometry of an uploaded mesh at a scale (see MeshGeometryCache). */
export type UploadedMeshLookup = (meshId: string, scale: number) => MeshGeometryState;

/**
 * Builds the part of a part document as three.js objects in part coordinates, shifted so the
 * centre of mass of the report sits at the origin: added solids opaque, removals ghosted
 * (translucent, drawn after the solids), point masses as small markers, the three principal axes
 * as rods coloured by role, and the intended spin axis as a dark rod with a ring around it.
 * Uploaded meshes come from `uploaded` (times their `scale`, drawn two-sided since a file's facing
 * is its own); one not at hand yet, or that failed, is left out and listed in `uploadedMeshes`.
 * `geometryOf` gives each primitive's geometry (a PrimitiveGeometryCache keeps them between drawings).
 */
export function buildPartScene(
  doc: PartDocument,
  report: SpinReport,
  uploaded?: UploadedMeshLookup,
  geometryOf: (p: PartDocument['primitives'][number]) => BufferGeometry | null = primitiveGeometry,
): PartScene {
  const body = new Group();
  body.name = 'body';
  const solids = new Group();
  solids.name = 'solids';
  const c = report.centerOfMass;
  solids.position.set(-c[0], -c[1], -c[2]);
  body.add(solids);

  const solid = sharedMaterial(
    'part:solid',
    () => new MeshStandardMaterial({ color: VIEWER_COLOURS.solid, roughness: 0.65, metalness: 0.05 }),
  );
  const removal = sharedMaterial(
    'part:removal',
    () =>
      new MeshStandardMaterial({ color: VIEWER_COLOURS.removal, transparent: true, opacity: 0.35, depthWrite: false, side: DoubleSide }),
  );
  const twoSided = {
    add: sharedMaterial(
      'part:solid-two-sided',
      () => new MeshStandardMaterial({ color: VIEWER_COLOURS.solid, roughness: 0.65, metalness: 0.05, side: DoubleSide }),
    ),
    remove: removal,
  };
  const placement = new Matrix4();
  const points: Group[] = [];
  const notDrawn: string[] = [];
  const uploadedMeshes: UploadedMeshStatus = { drawn: [], pending: [], failed: [] };
  for (const p of doc.primitives) {
    placementMatrix(placement, p.position, p.rotationDeg);
    if (p.shape === 'point') {
      const marker = new Group();
      marker.name = `point:${p.id}`;
      marker.position.set(p.position[0], p.position[1], p.position[2]);
      solids.add(marker);
      points.push(marker);
      continue;
    }
    let geometry = geometryOf(p);
    let material = p.mode === 'remove' ? removal : solid;
    if (!geometry && p.shape === 'mesh' && p.meshId) {
      const found: MeshGeometryState = uploaded
        ? uploaded(p.meshId, p.scale ?? 1)
        : { state: 'failed', message: 'this view has no access to uploaded meshes' };
      if (found.state === 'ready') {
        geometry = found.geometry;
        material = p.mode === 'remove' ? twoSided.remove : twoSided.add;
        uploadedMeshes.drawn.push(p.id);
      } else if (found.state === 'pending') uploadedMeshes.pending.push(p.id);
      else uploadedMeshes.failed.push({ id: p.id, message: found.message });
    }
    if (!geometry) {
      notDrawn.push(p.id);
      continue;
    }
    const mesh = new Mesh(geometry, material);
    mesh.name = `${p.mode}:${p.id}`;
    mesh.matrixAutoUpdate = false;
    mesh.matrix.copy(placement);
    if (p.mode === 'remove') mesh.renderOrder = 1;
    solids.add(mesh);
  }

  solids.updateMatrixWorld(true);
  const box = new Box3().setFromObject(solids);
  const reach = Math.max(
    1e-3,
    box.isEmpty() ? 0 : farthestCorner(box, new Vector3()),
    ...doc.primitives.map((p) => distance(p.position, c)),
  );

  const markerGeometry = new SphereGeometry(reach * 0.035, 16, 12);
  const markerMaterial = sharedMaterial(
    'part:point-mass',
    () => new MeshStandardMaterial({ color: VIEWER_COLOURS.pointMass, roughness: 0.4 }),
  );
  for (const marker of points) marker.add(new Mesh(markerGeometry, markerMaterial));

  const rodRadius = reach * 0.008;
  report.principal.axes.forEach((axis, i) => {
    const rod = axisRod(axis, reach * 1.25, rodRadius, VIEWER_COLOURS[AXIS_ROLES[i]]);
    rod.name = `axis:${AXIS_ROLES[i]}`;
    body.add(rod);
  });
  const spin = axisRod(doc.spin.axis, reach * 1.45, rodRadius * 0.6, VIEWER_COLOURS.spinAxis);
  spin.name = 'axis:spin';
  const ring = new Mesh(
    new TorusGeometry(reach * 0.12, rodRadius * 0.6, 8, 40, Math.PI * 1.6),
    sharedMaterial('part:spin-ring', () => new MeshStandardMaterial({ color: VIEWER_COLOURS.spinAxis })),
  );
  // The rod is built along +y; the ring goes round that axis near the tip.
  ring.rotation.x = Math.PI / 2;
  ring.position.y = reach * 1.2;
  spin.add(ring);
  body.add(spin);
  return { body, reach, notDrawn, uploadedMeshes };
}

/** Largest distance from `centre` to a corner of `box`. */
function farthestCorner(box: Box3, centre: Vector3): number {
  let best = 0;
  for (const x of [box.min.x, box.max.x])
    for (const y of [box.min.y, box.max.y])
      for (const z of [box.min.z, box.max.z]) {
        best = Math.max(best, Math.hypot(x - centre.x, y - centre.y, z - centre.z));
      }
  return best;
}

function distance(a: readonly number[], b: readonly number[]): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}
