import type { GearCategory, PartDocumentInput } from '@tumblewise/shared';

/**
 * The draft a new part starts from: no primitives yet, spin about the part's z axis at 5 rev/s
 * (stored in rad/s), and the grip frame at the origin with the long axis along z.
 */
export function starterDraft(name: string, category: GearCategory): PartDocumentInput {
  return {
    name,
    category,
    primitives: [],
    spin: { axis: [0, 0, 1], rate: 10 * Math.PI, misalignmentDeg: 1 },
    grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
    dissipative: false,
  };
}
