import { createBody, type Body } from './body';

/**
 * out = the composite of `count` bodies (all in one frame; removals carry negative mass and volume).
 * Parallel-axis theorem in tensor form (Abdulghany, Am. J. Phys. 85, 791 (2017)):
 *   c = Σ m_k c_k / Σ m_k,   I_c = Σ [I_k + m_k(|d_k|²E − d_k d_kᵀ)],  d_k = c_k − c.
 * Two passes (centre first, then offsets from it), so a part far from the origin keeps its accuracy.
 * Precondition: Σ m_k ≠ 0 (the caller refuses mass ≤ 0). `out` may be one of the inputs.
 */
export function composeBodies(out: Body = createBody(), bodies: readonly Body[], count = bodies.length): Body {
  let m = 0,
    v = 0,
    mx = 0,
    my = 0,
    mz = 0;
  for (let k = 0; k < count; k++) {
    const b = bodies[k];
    m += b.mass;
    v += b.volume;
    mx += b.mass * b.center[0];
    my += b.mass * b.center[1];
    mz += b.mass * b.center[2];
  }
  const cx = mx / m,
    cy = my / m,
    cz = mz / m;
  let i00 = 0,
    i11 = 0,
    i22 = 0,
    i01 = 0,
    i02 = 0,
    i12 = 0;
  for (let k = 0; k < count; k++) {
    const b = bodies[k],
      j = b.inertia;
    const dx = b.center[0] - cx,
      dy = b.center[1] - cy,
      dz = b.center[2] - cz;
    i00 += j[0] + b.mass * (dy * dy + dz * dz);
    i11 += j[4] + b.mass * (dx * dx + dz * dz);
    i22 += j[8] + b.mass * (dx * dx + dy * dy);
    i01 += j[1] - b.mass * dx * dy;
    i02 += j[2] - b.mass * dx * dz;
    i12 += j[5] - b.mass * dy * dz;
  }
  out.mass = m;
  out.volume = v;
  out.center[0] = cx;
  out.center[1] = cy;
  out.center[2] = cz;
  const o = out.inertia;
  o[0] = i00;
  o[4] = i11;
  o[8] = i22;
  o[1] = o[3] = i01;
  o[2] = o[6] = i02;
  o[5] = o[7] = i12;
  return out;
}
