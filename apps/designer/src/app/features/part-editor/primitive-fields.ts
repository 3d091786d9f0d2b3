import type { PrimitiveShape } from '@tumblewise/shared';
import { EDITOR_UNITS, type UnitChoice } from './display-value';

/** One dimension field of a primitive's form: the document key, its label and unit, and whether it is a triple. */
export interface DimensionField {
  /** Key in the primitive (`radius`, `size`). */
  key: string;
  /** Label on screen. */
  label: string;
  /** Display unit (SI in the document). */
  units: UnitChoice;
  /** May be left empty (then absent from the document). */
  optional?: boolean;
  /** Labels of the three components when the value is [x, y, z]. */
  components?: readonly [string, string, string];
  /** One-line help under the field. */
  hint?: string;
}

const mm = EDITOR_UNITS.length;
const XYZ = ['x', 'y', 'z'] as const;

/** The dimension fields of each shape (PRODUCT.md "Shapes and their local frames"). */
export const SHAPE_FIELDS: Record<PrimitiveShape, readonly DimensionField[]> = {
  box: [
    { key: 'size', label: 'Size', units: mm, components: XYZ, hint: 'Edge lengths, centred on the position' },
    { key: 'wall', label: 'Wall', units: mm, optional: true, hint: 'Leave empty for a solid box' },
  ],
  cylinder: [
    { key: 'radius', label: 'Radius', units: mm },
    { key: 'length', label: 'Length', units: mm, hint: 'Along local z, centred' },
    { key: 'innerRadius', label: 'Inner radius', units: mm, optional: true, hint: 'Makes a tube; leave empty for solid' },
  ],
  cone: [
    { key: 'radius', label: 'Base radius', units: mm },
    { key: 'length', label: 'Height', units: mm, hint: 'Base at the position, apex toward local +z' },
    { key: 'topRadius', label: 'Top radius', units: mm, optional: true, hint: 'Makes a frustum; leave empty for a point' },
  ],
  sphere: [
    { key: 'radius', label: 'Radius', units: mm },
    { key: 'innerRadius', label: 'Inner radius', units: mm, optional: true, hint: 'Makes a shell; leave empty for solid' },
  ],
  ellipsoid: [{ key: 'semiAxes', label: 'Semi-axes', units: mm, components: ['a', 'b', 'c'] }],
  torus: [
    { key: 'majorRadius', label: 'Ring radius', units: mm, hint: 'Centre of the ring to centre of the tube; ring in the local xy-plane' },
    { key: 'minorRadius', label: 'Tube radius', units: mm },
  ],
  capsule: [
    { key: 'radius', label: 'Radius', units: mm },
    { key: 'length', label: 'Straight length', units: mm, hint: 'Between the two hemispherical ends, centred' },
  ],
  point: [],
  mesh: [],
};

/** Names of the shapes in the palette, in palette order, with their icons. */
export const SHAPE_PALETTE: readonly { shape: PrimitiveShape; label: string; icon: string }[] = [
  { shape: 'box', label: 'Box', icon: 'check_box_outline_blank' },
  { shape: 'cylinder', label: 'Cylinder', icon: 'view_agenda' },
  { shape: 'cone', label: 'Cone', icon: 'change_history' },
  { shape: 'sphere', label: 'Sphere', icon: 'circle' },
  { shape: 'ellipsoid', label: 'Ellipsoid', icon: 'egg' },
  { shape: 'torus', label: 'Torus', icon: 'trip_origin' },
  { shape: 'capsule', label: 'Capsule', icon: 'medication' },
  { shape: 'point', label: 'Point mass', icon: 'fiber_manual_record' },
  { shape: 'mesh', label: 'Mesh', icon: 'view_in_ar' },
];

/** The shape's name on screen. */
export function shapeLabel(shape: string): string {
  return SHAPE_PALETTE.find((s) => s.shape === shape)?.label ?? shape;
}
