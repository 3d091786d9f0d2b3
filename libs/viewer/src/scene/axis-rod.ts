import { ConeGeometry, CylinderGeometry, Group, Mesh, MeshBasicMaterial, Quaternion, Vector3 } from 'three';
import { sharedMaterial } from './shared-materials';

const Y = new Vector3(0, 1, 0);

/**
 * A visible line for an axis: a thin rod through the origin from −length to +length along the unit
 * `direction`, with a cone head at the + end (a WebGL line is always one pixel wide, a rod is not).
 * `twoSided: false` draws only the + half (a vector rather than an axis).
 */
export function axisRod(direction: readonly number[], length: number, radius: number, colour: string, twoSided = true): Group {
  const group = new Group();
  const material = sharedMaterial(`rod:${colour}`, () => new MeshBasicMaterial({ color: colour }));
  const from = twoSided ? -length : 0;
  const headLength = radius * 8;
  const shaft = new CylinderGeometry(radius, radius, length - from - headLength, 12);
  shaft.translate(0, (from + length - headLength) / 2, 0);
  const head = new ConeGeometry(radius * 3, headLength, 16);
  head.translate(0, length - headLength / 2, 0);
  group.add(new Mesh(shaft, material), new Mesh(head, material));
  const d = new Vector3(direction[0], direction[1], direction[2]).normalize();
  group.quaternion.copy(new Quaternion().setFromUnitVectors(Y, d));
  return group;
}
