import type { Primitive, PrimitiveShape } from '../../schemas/part-document';
import { boxSolid, hollowBoxSolid } from '../primitives/box';
import { capsuleSolid } from '../primitives/capsule';
import { cylinderSolid, tubeSolid } from '../primitives/cylinder';
import { ellipsoidSolid } from '../primitives/ellipsoid';
import { frustumSolid } from '../primitives/frustum';
import { setAxialSolid, type Solid } from '../primitives/solid';
import { sphereSolid, sphericalShellSolid } from '../primitives/sphere';
import { torusSolid } from '../primitives/torus';

/** Dimension slots of each analytic shape, in a fixed order (m). Optional ones are 0 when absent. */
export const DIMENSION_NAMES: Record<PrimitiveShape, readonly string[]> = {
  box: ['size[0]', 'size[1]', 'size[2]', 'wall'],
  cylinder: ['radius', 'length', 'innerRadius'],
  cone: ['radius', 'length', 'topRadius'],
  sphere: ['radius', 'innerRadius'],
  ellipsoid: ['semiAxes[0]', 'semiAxes[1]', 'semiAxes[2]'],
  torus: ['majorRadius', 'minorRadius'],
  capsule: ['radius', 'length'],
  point: [],
  mesh: [],
};

/** The dimension values of a primitive in DIMENSION_NAMES order, and which of them the document states. */
export function primitiveDimensions(p: Primitive): { values: number[]; present: boolean[] } {
  let v: (number | undefined)[];
  switch (p.shape) {
    case 'box':
      v = [p.size[0], p.size[1], p.size[2], p.wall];
      break;
    case 'cylinder':
      v = [p.radius, p.length, p.innerRadius];
      break;
    case 'cone':
      v = [p.radius, p.length, p.topRadius];
      break;
    case 'sphere':
      v = [p.radius, p.innerRadius];
      break;
    case 'ellipsoid':
      v = [p.semiAxes[0], p.semiAxes[1], p.semiAxes[2]];
      break;
    case 'torus':
      v = [p.majorRadius, p.minorRadius];
      break;
    case 'capsule':
      v = [p.radius, p.length];
      break;
    default:
      v = [];
  }
  const values: number[] = [],
    present: boolean[] = [];
  for (let i = 0; i < v.length; i++) {
    values.push(v[i] ?? 0);
    present.push(v[i] !== undefined);
  }
  return { values, present };
}

/** Whether perturbed dimensions still describe a valid solid (the schema's rules). */
export function dimensionsValid(shape: PrimitiveShape, d: ArrayLike<number>): boolean {
  switch (shape) {
    case 'box':
      return d[0] > 0 && d[1] > 0 && d[2] > 0 && d[3] >= 0 && 2 * d[3] < Math.min(d[0], d[1], d[2]);
    case 'cylinder':
      return d[0] > 0 && d[1] > 0 && d[2] >= 0 && d[2] < d[0];
    case 'cone':
      return d[0] > 0 && d[1] > 0 && d[2] >= 0;
    case 'sphere':
      return d[0] > 0 && d[1] >= 0 && d[1] < d[0];
    case 'ellipsoid':
      return d[0] > 0 && d[1] > 0 && d[2] > 0;
    case 'torus':
      return d[0] > 0 && d[1] > 0 && d[1] < d[0];
    case 'capsule':
      return d[0] > 0 && d[1] >= 0;
    default:
      return true;
  }
}

/**
 * out = the unit-density local solid of an analytic shape from its dimensions (DIMENSION_NAMES order).
 * A point mass is a zero-volume solid. Precondition: dimensionsValid(shape, d); not for meshes.
 */
export function solidFromDimensions(out: Solid, shape: PrimitiveShape, d: ArrayLike<number>): Solid {
  switch (shape) {
    case 'box':
      return d[3] > 0 ? hollowBoxSolid(out, d[0], d[1], d[2], d[3]) : boxSolid(out, d[0], d[1], d[2]);
    case 'cylinder':
      return d[2] > 0 ? tubeSolid(out, d[0], d[2], d[1]) : cylinderSolid(out, d[0], d[1]);
    case 'cone':
      return frustumSolid(out, d[0], d[2], d[1]);
    case 'sphere':
      return d[1] > 0 ? sphericalShellSolid(out, d[0], d[1]) : sphereSolid(out, d[0]);
    case 'ellipsoid':
      return ellipsoidSolid(out, d[0], d[1], d[2]);
    case 'torus':
      return torusSolid(out, d[0], d[1]);
    case 'capsule':
      return capsuleSolid(out, d[0], d[1]);
    case 'point':
      return setAxialSolid(out, 0, 0, 0, 0, 0);
    default:
      throw new Error(`solidFromDimensions: ${shape} has no closed form`);
  }
}
