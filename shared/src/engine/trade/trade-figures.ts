import type { Body } from '../composition/body';
import { momentAboutLine } from './moment-about-line';

/** The grip frame of a part document: butt point (m), long axis into the part and face normal (unit, perpendicular). */
export interface GripFrame {
  point: ArrayLike<number>;
  axis: ArrayLike<number>;
  faceNormal: ArrayLike<number>;
}

/** Swingweight axis distance from the butt (common practice in racket sports). */
export const SWINGWEIGHT_DISTANCE = 0.1;
/** The bat pivot, 6 in = 0.1524 m from the knob (ASTM F2398). */
export const BAT_PIVOT_DISTANCE = 0.1524;

/** Trade figures in SI (m, kg·m²), each about the stated axis. */
export interface TradeFigures {
  /** Centre-of-mass distance from the butt along the long axis (m). */
  balancePoint: number;
  /** About the axis 0.1 m from the butt, perpendicular to the long axis and the face normal (kg·m²). */
  swingweight: number;
  /** About the parallel axis through the balance point (kg·m²). */
  recoilWeight: number;
  /** About the long axis through the butt (kg·m²). */
  twistweight: number;
  /** About the parallel swing axis through the pivot `distance` from the butt, with the centre of percussion (distance from the butt, m; null when the centre of mass is not beyond the pivot). */
  pivot: { distance: number; moment: number; centreOfPercussion: number | null };
}

/**
 * Balance point, swingweight, recoil weight, twistweight, pivot moment and centre of percussion of a
 * part from its grip frame. Swing axis direction: long axis × face normal (it lies in the face plane,
 * perpendicular to the long axis). Sources: common practice for balance point, swingweight, recoil
 * weight (= swingweight − m·(BP − 0.1 m)² when the centre of mass is on the long axis) and twistweight
 * (e.g. Taraborrelli et al., Sports Engineering 22 (2019)); pivot moment and centre of percussion
 * I_pivot/(m·d) from ASTM F2398.
 */
export function tradeFigures(body: Body, grip: GripFrame, pivotDistance = BAT_PIVOT_DISTANCE): TradeFigures {
  const p = grip.point,
    u = grip.axis,
    n = grip.faceNormal;
  const swing = [u[1] * n[2] - u[2] * n[1], u[2] * n[0] - u[0] * n[2], u[0] * n[1] - u[1] * n[0]];
  const along = (d: number) => [p[0] + d * u[0], p[1] + d * u[1], p[2] + d * u[2]];
  const balancePoint = (body.center[0] - p[0]) * u[0] + (body.center[1] - p[1]) * u[1] + (body.center[2] - p[2]) * u[2];
  const swingweight = momentAboutLine(body, along(SWINGWEIGHT_DISTANCE), swing);
  const recoilWeight = momentAboutLine(body, along(balancePoint), swing);
  const twistweight = momentAboutLine(body, p, u);
  const moment = momentAboutLine(body, along(pivotDistance), swing);
  const arm = balancePoint - pivotDistance;
  const centreOfPercussion = arm > 0 ? pivotDistance + moment / (body.mass * arm) : null;
  return { balancePoint, swingweight, recoilWeight, twistweight, pivot: { distance: pivotDistance, moment, centreOfPercussion } };
}

/** Radius of gyration k = √(I/m) (m) for a moment I (kg·m²) and mass m (kg). */
export function radiusOfGyration(moment: number, mass: number): number {
  return Math.sqrt(Math.max(0, moment) / mass);
}
