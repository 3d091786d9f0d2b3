import {
  BoxGeometry,
  BufferGeometry,
  CapsuleGeometry,
  CylinderGeometry,
  Float32BufferAttribute,
  LatheGeometry,
  SphereGeometry,
  TorusGeometry,
  Vector2,
} from 'three';
import type { Primitive } from '@tumblewise/shared';

/** How finely round shapes are drawn (segments around the axis). */
const ROUND_SEGMENTS = 48;

/**
 * A three.js geometry of one primitive in its local frame (PRODUCT.md, "Shapes and their local
 * frames"; axis of symmetry along local z, metres): box centred; cylinder and capsule centred along
 * z; cone with its base centre at the origin and apex side toward +z; sphere and ellipsoid centred;
 * torus ring in the xy-plane. three.js builds its cylinders, cones and capsules along +y, so those
 * are turned by +90° about x (y → z). Hollow shapes (tube, shell, walled box) are drawn by their
 * outside except the tube, whose bore shows. Point masses and uploaded meshes (`meshId`) have no
 * geometry here: null. Inline meshes are built from their vertices and triangles times `scale`.
 */
export function primitiveGeometry(p: Primitive): BufferGeometry | null {
  switch (p.shape) {
    case 'box':
      return new BoxGeometry(p.size[0], p.size[1], p.size[2]);
    case 'cylinder':
      if (p.innerRadius !== undefined) return tubeGeometry(p.radius, p.innerRadius, p.length);
      return alongZ(new CylinderGeometry(p.radius, p.radius, p.length, ROUND_SEGMENTS));
    case 'cone': {
      const g = new CylinderGeometry(p.topRadius ?? 0, p.radius, p.length, ROUND_SEGMENTS);
      g.translate(0, p.length / 2, 0);
      return alongZ(g);
    }
    case 'sphere':
      return new SphereGeometry(p.radius, ROUND_SEGMENTS, ROUND_SEGMENTS / 2);
    case 'ellipsoid': {
      const g = new SphereGeometry(1, ROUND_SEGMENTS, ROUND_SEGMENTS / 2);
      g.scale(p.semiAxes[0], p.semiAxes[1], p.semiAxes[2]);
      return g;
    }
    case 'torus':
      return new TorusGeometry(p.majorRadius, p.minorRadius, ROUND_SEGMENTS / 2, ROUND_SEGMENTS);
    case 'capsule':
      return alongZ(new CapsuleGeometry(p.radius, p.length, 12, ROUND_SEGMENTS));
    case 'mesh':
      return p.vertices && p.triangles ? inlineMeshGeometry(p.vertices, p.triangles, p.scale ?? 1) : null;
    case 'point':
      return null;
  }
}

/** Turns a geometry built along +y so that it lies along +z (rotation of +90° about x). */
function alongZ(g: BufferGeometry): BufferGeometry {
  g.rotateX(Math.PI / 2);
  return g;
}

/** A closed tube: the annulus between the two radii swept around the axis, centred, along z. */
function tubeGeometry(outer: number, inner: number, length: number): BufferGeometry {
  const h = length / 2;
  // Lathe profile in (radius, height), counter-clockwise so the faces point outwards.
  const profile = [new Vector2(inner, h), new Vector2(inner, -h), new Vector2(outer, -h), new Vector2(outer, h), new Vector2(inner, h)];
  return alongZ(new LatheGeometry(profile, ROUND_SEGMENTS));
}

function inlineMeshGeometry(
  vertices: readonly (readonly number[])[],
  triangles: readonly (readonly number[])[],
  scale: number,
): BufferGeometry {
  const g = new BufferGeometry();
  const positions = new Float32Array(vertices.length * 3);
  vertices.forEach((v, i) => {
    positions[3 * i] = v[0] * scale;
    positions[3 * i + 1] = v[1] * scale;
    positions[3 * i + 2] = v[2] * scale;
  });
  g.setAttribute('position', new Float32BufferAttribute(positions, 3));
  g.setIndex(triangles.flatMap((t) => [t[0], t[1], t[2]]));
  g.computeVertexNormals();
  return g;
}
