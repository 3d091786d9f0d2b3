import type { Mat3 } from './mat3';

const DEG = Math.PI / 180;

/**
 * Rotation matrix for `rotationDeg: [rx, ry, rz]` of the part document: rotate about the part's
 * fixed x axis by rx, then fixed y by ry, then fixed z by rz, i.e. R = Rz·Ry·Rx (extrinsic x-y-z).
 * Angles in degrees; R maps primitive-local coordinates to part coordinates.
 * Source: the elementary rotation matrices and their composition, e.g. Goldstein, Classical
 * Mechanics, 3rd ed., §4.4 (applied about fixed axes, so later rotations multiply on the left).
 */
export function rotationFromDegrees<T extends Mat3 | Float64Array>(out: T, rx: number, ry: number, rz: number): T {
  const cx = Math.cos(rx * DEG),
    sx = Math.sin(rx * DEG);
  const cy = Math.cos(ry * DEG),
    sy = Math.sin(ry * DEG);
  const cz = Math.cos(rz * DEG),
    sz = Math.sin(rz * DEG);
  // Rz·Ry·Rx written out.
  out[0] = cz * cy;
  out[1] = cz * sy * sx - sz * cx;
  out[2] = cz * sy * cx + sz * sx;
  out[3] = sz * cy;
  out[4] = sz * sy * sx + cz * cx;
  out[5] = sz * sy * cx - cz * sx;
  out[6] = -sy;
  out[7] = cy * sx;
  out[8] = cy * cx;
  return out;
}
