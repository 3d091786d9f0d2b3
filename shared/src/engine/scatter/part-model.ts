import type { PartDocument, Tolerance } from '../../schemas/part-document';
import { createBody, type Body } from '../composition/body';
import { composeBodies } from '../composition/compose-bodies';
import { placeSolid } from '../composition/place-solid';
import type { PartMassProperties } from '../part/part-mass-properties';
import { DIMENSION_NAMES, dimensionsValid, solidFromDimensions } from '../part/primitive-dimensions';
import { createSolid } from '../primitives/solid';

/** One scatter parameter: a primitive's density or one of its stated dimensions. */
export interface ScatterParameter {
  piece: number;
  primitiveId: string;
  /** `density` (relative scatter; for a point mass, its mass) or a dimension name such as `radius`, `size[0]`. */
  name: string;
  /** Slot in DIMENSION_NAMES order, or −1 for density. */
  slot: number;
  nominal: number;
  /** The nominal in physical units: density (kg/m³), point mass (kg) or the dimension (m). */
  physical: number;
  /** One standard deviation: relative for density, absolute (m) for dimensions. */
  sigma: number;
}

/** Default scatter when neither the study, the primitive nor its material states one (common practice: ±5 % density is a usual design allowance). */
export const DEFAULT_TOLERANCE: Required<Tolerance> = { density: 0.05, size: 0 };

/**
 * A part reduced to what varies: per piece its nominal density (or point mass), dimensions and
 * scatter, with fixed placement. `evaluate` recomputes the composite body for given parameter
 * values without allocation.
 */
export class PartModel {
  readonly parameters: ScatterParameter[] = [];
  private readonly bodies: Body[];
  private readonly solid = createSolid();
  /** Current values of every parameter (density as a factor of nominal, dimensions in m). */
  readonly values: Float64Array;
  private readonly dims: number[][];

  constructor(
    readonly doc: PartDocument,
    private readonly mp: PartMassProperties,
    tolerances: { default?: Tolerance; primitives?: Record<string, Tolerance> } = {},
  ) {
    this.bodies = mp.pieces.map(() => createBody());
    this.dims = mp.pieces.map((p) => [...p.dimensions]);
    mp.pieces.forEach((piece, k) => {
      const p = piece.primitive;
      const tol = { ...DEFAULT_TOLERANCE, ...tolerances.default, ...piece.tolerance, ...tolerances.primitives?.[p.id] };
      this.parameters.push({
        piece: k,
        primitiveId: p.id,
        name: p.shape === 'point' ? 'mass' : 'density',
        slot: -1,
        nominal: 1,
        physical: p.shape === 'point' ? p.mass! : piece.density,
        sigma: tol.density,
      });
      if (p.shape === 'mesh') return;
      DIMENSION_NAMES[p.shape].forEach((name, slot) => {
        if (piece.present[slot])
          this.parameters.push({
            piece: k,
            primitiveId: p.id,
            name,
            slot,
            nominal: piece.dimensions[slot],
            physical: piece.dimensions[slot],
            sigma: tol.size,
          });
      });
    });
    this.values = Float64Array.from(this.parameters, (q) => q.nominal);
  }

  /** Sets every parameter back to nominal. */
  reset(): void {
    this.parameters.forEach((q, i) => (this.values[i] = q.nominal));
  }

  /** Whether the current dimensions of every piece form valid solids and densities stay positive. */
  valid(): boolean {
    this.loadDims();
    for (let i = 0; i < this.parameters.length; i++) if (this.parameters[i].slot < 0 && !(this.values[i] > 0)) return false;
    return this.mp.pieces.every((piece, k) => dimensionsValid(piece.primitive.shape, this.dims[k]));
  }

  /** out = the composite body at the current parameter values. Precondition: valid(). */
  evaluate(out: Body): Body {
    this.loadDims();
    const pieces = this.mp.pieces;
    let pi = 0;
    for (let k = 0; k < pieces.length; k++) {
      const piece = pieces[k],
        p = piece.primitive,
        b = this.bodies[k];
      const factor = this.values[pi];
      while (pi < this.parameters.length && this.parameters[pi].piece === k) pi++;
      if (p.shape === 'point') {
        b.mass = piece.sign * p.mass! * factor;
        b.volume = 0;
        b.center[0] = p.position[0];
        b.center[1] = p.position[1];
        b.center[2] = p.position[2];
        b.inertia.fill(0);
        continue;
      }
      const solid = p.shape === 'mesh' ? piece.solid : solidFromDimensions(this.solid, p.shape, this.dims[k]);
      // A primitive given by its mass keeps its density (the mass follows the dimensions).
      placeSolid(b, solid, piece.sign * piece.density * factor, piece.rotation, p.position);
    }
    return composeBodies(out, this.bodies);
  }

  private loadDims(): void {
    for (let i = 0; i < this.parameters.length; i++) {
      const q = this.parameters[i];
      if (q.slot >= 0) this.dims[q.piece][q.slot] = this.values[i];
    }
  }
}
