import { BufferGeometry, Float32BufferAttribute, Group, Line, LineBasicMaterial, Mesh, MeshStandardMaterial, SphereGeometry } from 'three';
import { sharedMaterial } from './shared-materials';
import { axisRod } from './axis-rod';
import { AXIS_ROLES, VIEWER_COLOURS } from './viewer-palette';

/** The polhode view's objects: the unit sphere, the path and the moving marker. */
export interface PolhodeScene {
  readonly root: Group;
  /** Put this at the current point of the path. */
  readonly marker: Mesh;
}

/**
 * The polhode on the angular-momentum sphere, in the body (principal) frame: x along the major
 * axis, y the intermediate, z the minor, so the principal axes are the coordinate axes drawn in the
 * legend's colours. `path` holds L/|L| in that frame (unit vectors), as the simulation returns it.
 */
export function buildPolhodeScene(path: readonly (readonly number[])[]): PolhodeScene {
  const root = new Group();
  root.name = 'polhode';
  const sphere = new Mesh(
    new SphereGeometry(1, 48, 24),
    sharedMaterial(
      'polhode:sphere',
      () => new MeshStandardMaterial({ color: '#dfe6ee', transparent: true, opacity: 0.45, depthWrite: false }),
    ),
  );
  sphere.name = 'momentum-sphere';
  root.add(sphere);
  const positions = new Float32Array(path.length * 3);
  path.forEach((p, i) => {
    // A hair outside the sphere so the path is not hidden by its surface.
    positions[3 * i] = p[0] * 1.005;
    positions[3 * i + 1] = p[1] * 1.005;
    positions[3 * i + 2] = p[2] * 1.005;
  });
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
  const line = new Line(
    geometry,
    sharedMaterial('polhode:path', () => new LineBasicMaterial({ color: '#1b1f24' })),
  );
  line.name = 'polhode-path';
  root.add(line);
  AXIS_ROLES.forEach((role, i) => {
    const rod = axisRod([i === 0 ? 1 : 0, i === 1 ? 1 : 0, i === 2 ? 1 : 0], 1.3, 0.012, VIEWER_COLOURS[role]);
    rod.name = `axis:${role}`;
    root.add(rod);
  });
  const marker = new Mesh(
    new SphereGeometry(0.05, 16, 12),
    sharedMaterial('polhode:marker', () => new MeshStandardMaterial({ color: VIEWER_COLOURS.momentum })),
  );
  marker.name = 'polhode-marker';
  if (path.length) marker.position.set(path[0][0], path[0][1], path[0][2]);
  root.add(marker);
  return { root, marker };
}
