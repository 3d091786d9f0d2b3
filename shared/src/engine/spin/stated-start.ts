const DEG = Math.PI / 180;

/**
 * The start the report predicts from: ω (rad/s) in the principal frame (moments I1 ≥ I2 ≥ I3) for
 * the intended axis `axisInBody` (unit, principal components) at `rate`, misaligned by at least
 * `misalignmentDeg` from the principal axis `about` (default: the nearest one).
 *
 * The start is the intended axis itself when it is at least `misalignmentDeg` from that axis;
 * otherwise that axis tilted by `misalignmentDeg` toward the intended axis's offset from it — or,
 * with no offset, toward the major axis (toward the intermediate one when `about` is the major axis).
 */
export function statedStart(
  axisInBody: ArrayLike<number>,
  rate: number,
  misalignmentDeg: number,
  about: number = nearestIndex(axisInBody),
): [number, number, number] {
  const along = axisInBody[about];
  const s = along >= 0 ? 1 : -1;
  const offset = [axisInBody[0], axisInBody[1], axisInBody[2]];
  offset[about] = 0;
  const perp = Math.hypot(offset[0], offset[1], offset[2]);
  if (Math.atan2(perp, Math.abs(along)) >= misalignmentDeg * DEG) {
    return [rate * axisInBody[0], rate * axisInBody[1], rate * axisInBody[2]];
  }
  let t: number[];
  if (perp > 1e-12) t = offset.map((x) => x / perp);
  else t = about === 0 ? [0, 1, 0] : [1, 0, 0];
  const c = Math.cos(misalignmentDeg * DEG),
    sn = Math.sin(misalignmentDeg * DEG);
  const w: [number, number, number] = [rate * sn * t[0], rate * sn * t[1], rate * sn * t[2]];
  w[about] = rate * s * c;
  return w;
}

/** Index of the principal axis nearest a unit direction (largest |component|; the first on a tie). */
export function nearestIndex(axisInBody: ArrayLike<number>): number {
  let best = 0;
  for (let r = 1; r < 3; r++) if (Math.abs(axisInBody[r]) > Math.abs(axisInBody[best])) best = r;
  return best;
}
