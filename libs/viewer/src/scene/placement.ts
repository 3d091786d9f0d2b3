import { MathUtils, Matrix4, Quaternion, Vector3 } from 'three';

/** A position [x, y, z] (m) or a rotation [rx, ry, rz] (degrees) as the part document writes it. */
export type Triple = readonly [number, number, number];

/**
 * Rotation of `rotationDeg: [rx, ry, rz]` of the part document: about the part's fixed x axis by
 * rx, then fixed y by ry, then fixed z by rz, so R = Rz·Ry·Rx (extrinsic x-y-z). In three.js terms
 * that is an Euler of order 'ZYX' (three's order names the matrix product left to right), not the
 * default 'XYZ' (which is Rx·Ry·Rz). Angles in degrees. Writes into `out` and returns it.
 */
export function placementRotation(out: Matrix4, rotationDeg: Triple = [0, 0, 0]): Matrix4 {
  const [rx, ry, rz] = rotationDeg;
  const cx = Math.cos(rx * MathUtils.DEG2RAD),
    sx = Math.sin(rx * MathUtils.DEG2RAD);
  const cy = Math.cos(ry * MathUtils.DEG2RAD),
    sy = Math.sin(ry * MathUtils.DEG2RAD);
  const cz = Math.cos(rz * MathUtils.DEG2RAD),
    sz = Math.sin(rz * MathUtils.DEG2RAD);
  // Rz·Ry·Rx written out (row-major arguments of Matrix4.set).
  return out.set(
    cz * cy,
    cz * sy * sx - sz * cx,
    cz * sy * cx + sz * sx,
    0,
    sz * cy,
    sz * sy * sx + cz * cx,
    sz * sy * cx - cz * sx,
    0,
    -sy,
    cy * sx,
    cy * cx,
    0,
    0,
    0,
    0,
    1,
  );
}

const scratchRotation = new Matrix4();
const scratchQuaternion = new Quaternion();
const scratchScale = new Vector3(1, 1, 1);
const scratchPosition = new Vector3();

/**
 * Where a primitive's local frame goes in part coordinates: x_part = R·x_local + position, with R
 * from {@link placementRotation}. Writes into `out` and returns it.
 */
export function placementMatrix(out: Matrix4, position: Triple = [0, 0, 0], rotationDeg: Triple = [0, 0, 0]): Matrix4 {
  placementRotation(scratchRotation, rotationDeg);
  scratchQuaternion.setFromRotationMatrix(scratchRotation);
  scratchPosition.set(position[0], position[1], position[2]);
  return out.compose(scratchPosition, scratchQuaternion, scratchScale);
}
