/** What can be wrong with an uploaded or inline triangle mesh. */
export type MeshProblemCode =
  | 'unreadable'
  | 'too_large'
  | 'count_mismatch'
  | 'no_triangles'
  | 'non_finite'
  | 'degenerate'
  | 'open'
  | 'non_manifold'
  | 'inconsistent_orientation'
  | 'inside_out'
  | 'self_intersecting';

/**
 * One finding. `fixed: true` means the engine repaired it and says so (an inside-out mesh is
 * flipped); every other problem blocks integration.
 */
export interface MeshProblem {
  code: MeshProblemCode;
  message: string;
  /** How many triangles or edges are affected, where that is meaningful. */
  count?: number;
  /** The first affected triangle (0-based), where that is meaningful. */
  firstTriangle?: number;
  fixed?: boolean;
}
