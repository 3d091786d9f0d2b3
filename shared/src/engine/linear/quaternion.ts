/**
 * Unit quaternions as Float64Array(4) in the order [x, y, z, w] (the order three.js reads).
 * A quaternion q represents the rotation v ↦ q v q*; output argument first, `out` may alias.
 */
export type Quat = Float64Array;

/** A new identity quaternion. */
export function quat(x = 0, y = 0, z = 0, w = 1): Quat {
  const q = new Float64Array(4);
  q[0] = x;
  q[1] = y;
  q[2] = z;
  q[3] = w;
  return q;
}

/** out = a ⊗ b (apply b first, then a). Hamilton product. */
export function quatMultiply(out: Quat, a: ArrayLike<number>, b: ArrayLike<number>): Quat {
  const ax = a[0],
    ay = a[1],
    az = a[2],
    aw = a[3];
  const bx = b[0],
    by = b[1],
    bz = b[2],
    bw = b[3];
  out[0] = aw * bx + ax * bw + ay * bz - az * by;
  out[1] = aw * by - ax * bz + ay * bw + az * bx;
  out[2] = aw * bz + ax * by - ay * bx + az * bw;
  out[3] = aw * bw - ax * bx - ay * by - az * bz;
  return out;
}

/**
 * out = q ⊗ r(axis i, angle): right-multiplies by a rotation about the body's i-th coordinate axis
 * (i = 0, 1, 2), angle in radians. Used by the splitting integrator, whose sub-flows are rotations
 * about one body axis each.
 */
export function quatRotateAboutBodyAxis(out: Quat, q: ArrayLike<number>, axis: 0 | 1 | 2, angle: number): Quat {
  const h = 0.5 * angle;
  const s = Math.sin(h),
    c = Math.cos(h);
  const qx = q[0],
    qy = q[1],
    qz = q[2],
    qw = q[3];
  // q ⊗ (s·e_axis, c)
  if (axis === 0) {
    out[0] = qw * s + qx * c;
    out[1] = qy * c + qz * s;
    out[2] = qz * c - qy * s;
    out[3] = qw * c - qx * s;
  } else if (axis === 1) {
    out[0] = qx * c - qz * s;
    out[1] = qw * s + qy * c;
    out[2] = qz * c + qx * s;
    out[3] = qw * c - qy * s;
  } else {
    out[0] = qx * c + qy * s;
    out[1] = qy * c - qx * s;
    out[2] = qw * s + qz * c;
    out[3] = qw * c - qz * s;
  }
  return out;
}

/** out = q / |q|. Precondition: |q| > 0. */
export function quatNormalize(out: Quat, q: ArrayLike<number>): Quat {
  const l = Math.hypot(q[0], q[1], q[2], q[3]);
  const s = 1 / l;
  out[0] = q[0] * s;
  out[1] = q[1] * s;
  out[2] = q[2] * s;
  out[3] = q[3] * s;
  return out;
}

/** out = the rotation matrix (row-major 3×3) of the unit quaternion q. */
export function quatToMat3(out: Float64Array, q: ArrayLike<number>): Float64Array {
  const x = q[0],
    y = q[1],
    z = q[2],
    w = q[3];
  out[0] = 1 - 2 * (y * y + z * z);
  out[1] = 2 * (x * y - z * w);
  out[2] = 2 * (x * z + y * w);
  out[3] = 2 * (x * y + z * w);
  out[4] = 1 - 2 * (x * x + z * z);
  out[5] = 2 * (y * z - x * w);
  out[6] = 2 * (x * z - y * w);
  out[7] = 2 * (y * z + x * w);
  out[8] = 1 - 2 * (x * x + y * y);
  return out;
}

/**
 * out = the unit quaternion of a proper rotation matrix m (row-major). Shepperd's method
 * (S. W. Shepperd, "Quaternion from rotation matrix", J. Guidance and Control 1(3), 1978):
 * picks the largest of the four squared components for accuracy.
 */
export function quatFromMat3(out: Quat, m: ArrayLike<number>): Quat {
  const m00 = m[0],
    m11 = m[4],
    m22 = m[8];
  const tr = m00 + m11 + m22;
  if (tr >= m00 && tr >= m11 && tr >= m22) {
    const s = 2 * Math.sqrt(1 + tr);
    out[3] = 0.25 * s;
    out[0] = (m[7] - m[5]) / s;
    out[1] = (m[2] - m[6]) / s;
    out[2] = (m[3] - m[1]) / s;
  } else if (m00 >= m11 && m00 >= m22) {
    const s = 2 * Math.sqrt(1 + m00 - m11 - m22);
    out[3] = (m[7] - m[5]) / s;
    out[0] = 0.25 * s;
    out[1] = (m[1] + m[3]) / s;
    out[2] = (m[2] + m[6]) / s;
  } else if (m11 >= m22) {
    const s = 2 * Math.sqrt(1 + m11 - m00 - m22);
    out[3] = (m[2] - m[6]) / s;
    out[0] = (m[1] + m[3]) / s;
    out[1] = 0.25 * s;
    out[2] = (m[5] + m[7]) / s;
  } else {
    const s = 2 * Math.sqrt(1 + m22 - m00 - m11);
    out[3] = (m[3] - m[1]) / s;
    out[0] = (m[2] + m[6]) / s;
    out[1] = (m[5] + m[7]) / s;
    out[2] = 0.25 * s;
  }
  return quatNormalize(out, out);
}
