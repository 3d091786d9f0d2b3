import type { CategoryCheck } from '../checks/category-check';
import type { SpinAssessment } from '../spin/assess-spin';

type V3 = [number, number, number];

/**
 * All computed figures of one variant (SI units: kg, m³, m, kg·m², rad/s, s; angles in degrees).
 * The same shape is printed by the CLI and returned by the API. No NaN or Infinity anywhere:
 * figures that do not apply are null.
 */
export interface SpinReport {
  name: string | null;
  /** kg */
  mass: number;
  /** m³ (net of removals) */
  volume: number;
  /** m, part axes */
  centerOfMass: V3;
  /** kg·m² at the centre of mass, part axes, I = ∫((r·r)E − r rᵀ) dm */
  inertia: [V3, V3, V3];
  principal: {
    /** I1 ≥ I2 ≥ I3 (kg·m²) */
    moments: V3;
    /** Unit rows in part axes, right-handed; row i belongs to moments[i]. */
    axes: [V3, V3, V3];
  };
  spin: SpinAssessment;
  trade: {
    /** m from the butt; null without a grip frame. */
    balancePoint: number | null;
    /** kg·m² about the axis 0.1 m from the butt (perpendicular to the long axis and the face normal). */
    swingweight: number | null;
    /** kg·m² about the parallel axis through the balance point. */
    recoilWeight: number | null;
    /** kg·m² about the long axis. */
    twistweight: number | null;
    /** Moment about the swing axis through a pivot `distance` m from the butt, and the centre of percussion (m from the butt). */
    pivot: { distance: number; moment: number; centreOfPercussion: number | null } | null;
    /** Overall length along the long axis (m). */
    length: number | null;
    /** √(I/m) about each principal axis (m). */
    radiusOfGyration: { major: number; intermediate: number; minor: number };
  };
  checks: CategoryCheck[];
  notes: string[];
}
