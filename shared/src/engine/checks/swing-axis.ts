/** Long axis × face normal: the width direction in the face plane (unit when both inputs are unit and perpendicular). */
export function swingAxis(axis: ArrayLike<number>, n: ArrayLike<number>): number[] {
  return [axis[1] * n[2] - axis[2] * n[1], axis[2] * n[0] - axis[0] * n[2], axis[0] * n[1] - axis[1] * n[0]];
}
