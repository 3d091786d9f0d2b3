import { z } from 'zod';
import { gearCategorySchema } from './projects';

/**
 * The part document: engine input, API body and saved variant (PRODUCT.md "The part document").
 * SI units throughout (m, kg, kg/m³, s, rad/s); placement angles in degrees.
 */

/** Most primitives one part may hold. */
export const MAX_PRIMITIVES = 5000;
/** Largest inline mesh a part document may carry (uploaded meshes have their own limit). */
export const MAX_INLINE_MESH_VERTICES = 200_000;
export const MAX_INLINE_MESH_TRIANGLES = 400_000;
/** Largest dimension accepted anywhere in a part (m); a guard against unit slips (mm typed as m). */
export const MAX_DIMENSION = 100;
/** How far from 1 the length of an axis may be and still count as a unit vector. */
export const UNIT_AXIS_TOLERANCE = 1e-6;

const num = (what = 'a number') => z.number({ error: `must be ${what}` });
const positive = () =>
  num()
    .positive({ error: 'must be greater than zero' })
    .max(MAX_DIMENSION, { error: `must be at most ${MAX_DIMENSION} m` });
const nonNegative = () =>
  num()
    .min(0, { error: 'must not be negative' })
    .max(MAX_DIMENSION, { error: `must be at most ${MAX_DIMENSION} m` });

/** A point or offset [x, y, z] in metres. */
export const vec3Schema = z.tuple([num(), num(), num()], { error: 'must be three numbers [x, y, z]' });

/** A unit direction [x, y, z]; zero or non-unit vectors are refused. */
export const unitVec3Schema = vec3Schema.superRefine((v, ctx) => {
  const l = Math.hypot(v[0], v[1], v[2]);
  if (l === 0) ctx.addIssue({ code: 'custom', message: 'must not be the zero vector' });
  else if (Math.abs(l - 1) > UNIT_AXIS_TOLERANCE)
    ctx.addIssue({ code: 'custom', message: `must be a unit vector (its length is ${l.toPrecision(6)})` });
});

const positiveTriple = z.tuple([positive(), positive(), positive()], { error: 'must be three positive numbers' });

/** Per-primitive scatter for the scatter study: relative density (1 = 100 %) and absolute size (m), one standard deviation. */
export const toleranceSchema = z.strictObject({
  density: num().min(0, { error: 'must not be negative' }).max(1, { error: 'must be at most 1 (100 %)' }).optional(),
  size: num().min(0, { error: 'must not be negative' }).max(0.1, { error: 'must be at most 0.1 m' }).optional(),
});
export type Tolerance = z.infer<typeof toleranceSchema>;

const common = {
  id: z.string({ error: 'must be a text id' }).trim().min(1, { error: 'is required' }).max(64, { error: 'must be at most 64 characters' }),
  position: vec3Schema.default([0, 0, 0]),
  rotationDeg: vec3Schema.default([0, 0, 0]),
  density: num().positive({ error: 'must be greater than zero' }).max(100_000, { error: 'must be at most 100000 kg/m³' }).optional(),
  materialId: z.string({ error: 'must be a text id' }).min(1, { error: 'is required' }).max(64).optional(),
  mass: num().positive({ error: 'must be greater than zero' }).max(10_000, { error: 'must be at most 10000 kg' }).optional(),
  mode: z.enum(['add', 'remove'], { error: 'must be "add" or "remove"' }).default('add'),
  tolerance: toleranceSchema.optional(),
};

const boxSchema = z.strictObject({ ...common, shape: z.literal('box'), size: positiveTriple, wall: positive().optional() });
const cylinderSchema = z.strictObject({
  ...common,
  shape: z.literal('cylinder'),
  radius: positive(),
  length: positive(),
  innerRadius: positive().optional(),
});
const coneSchema = z.strictObject({
  ...common,
  shape: z.literal('cone'),
  radius: positive(),
  length: positive(),
  topRadius: nonNegative().optional(),
});
const sphereSchema = z.strictObject({ ...common, shape: z.literal('sphere'), radius: positive(), innerRadius: positive().optional() });
const ellipsoidSchema = z.strictObject({ ...common, shape: z.literal('ellipsoid'), semiAxes: positiveTriple });
const torusSchema = z.strictObject({ ...common, shape: z.literal('torus'), majorRadius: positive(), minorRadius: positive() });
const capsuleSchema = z.strictObject({ ...common, shape: z.literal('capsule'), radius: positive(), length: nonNegative() });
const pointSchema = z.strictObject({ ...common, shape: z.literal('point') });
const meshSchema = z.strictObject({
  ...common,
  shape: z.literal('mesh'),
  meshId: z.string({ error: 'must be a text id' }).min(1).max(64).optional(),
  vertices: z
    .array(vec3Schema, { error: 'must be a list of [x, y, z]' })
    .max(MAX_INLINE_MESH_VERTICES, { error: `must have at most ${MAX_INLINE_MESH_VERTICES} vertices` })
    .optional(),
  triangles: z
    .array(z.tuple([z.int(), z.int(), z.int()], { error: 'must be three vertex indices' }), { error: 'must be a list of [i, j, k]' })
    .max(MAX_INLINE_MESH_TRIANGLES, { error: `must have at most ${MAX_INLINE_MESH_TRIANGLES} triangles` })
    .optional(),
  scale: num().positive({ error: 'must be greater than zero' }).max(1000).default(1),
});

const SHAPES = ['box', 'cylinder', 'cone', 'sphere', 'ellipsoid', 'torus', 'capsule', 'point', 'mesh'] as const;
/** The primitive shapes a part may use. */
export const PRIMITIVE_SHAPES: readonly string[] = SHAPES;

/** One primitive: shape, placement, material and mode. */
export const primitiveSchema = z
  .discriminatedUnion(
    'shape',
    [boxSchema, cylinderSchema, coneSchema, sphereSchema, ellipsoidSchema, torusSchema, capsuleSchema, pointSchema, meshSchema],
    {
      error: (iss) => (iss.code === 'invalid_union' ? `must be one of ${SHAPES.join(', ')}` : undefined),
    },
  )
  .superRefine((p, ctx) => {
    const given = (['density', 'materialId', 'mass'] as const).filter((k) => p[k] !== undefined);
    if (p.shape === 'point') {
      if (p.mass === undefined) ctx.addIssue({ code: 'custom', path: ['mass'], message: 'is required for a point mass' });
      for (const k of given)
        if (k !== 'mass') ctx.addIssue({ code: 'custom', path: [k], message: 'does not apply to a point mass (give its mass)' });
    } else if (given.length === 0) {
      ctx.addIssue({ code: 'custom', path: ['density'], message: 'is required (or give materialId or mass)' });
    } else if (given.length > 1) {
      ctx.addIssue({
        code: 'custom',
        path: [given[1]],
        message: `conflicts with ${given[0]}: give exactly one of density, materialId, mass`,
      });
    }
    switch (p.shape) {
      case 'box':
        if (p.wall !== undefined && 2 * p.wall >= Math.min(...p.size))
          ctx.addIssue({ code: 'custom', path: ['wall'], message: 'must be less than half the smallest edge of size' });
        break;
      case 'cylinder':
      case 'sphere':
        if (p.innerRadius !== undefined && p.innerRadius >= p.radius)
          ctx.addIssue({ code: 'custom', path: ['innerRadius'], message: 'must be less than radius' });
        break;
      case 'torus':
        if (p.minorRadius >= p.majorRadius)
          ctx.addIssue({ code: 'custom', path: ['minorRadius'], message: 'must be less than majorRadius' });
        break;
      case 'mesh': {
        const inline = p.vertices !== undefined || p.triangles !== undefined;
        if (p.meshId !== undefined && inline)
          ctx.addIssue({ code: 'custom', path: ['meshId'], message: 'give either meshId or inline vertices and triangles, not both' });
        else if (p.meshId === undefined && !inline)
          ctx.addIssue({ code: 'custom', path: ['meshId'], message: 'is required (or give inline vertices and triangles)' });
        else if (inline) {
          if (!p.vertices) ctx.addIssue({ code: 'custom', path: ['vertices'], message: 'is required with triangles' });
          else if (!p.triangles) ctx.addIssue({ code: 'custom', path: ['triangles'], message: 'is required with vertices' });
          else {
            const n = p.vertices.length;
            if (p.triangles.length === 0) ctx.addIssue({ code: 'custom', path: ['triangles'], message: 'must not be empty' });
            for (let t = 0; t < p.triangles.length; t++) {
              const tri = p.triangles[t];
              for (let c = 0; c < 3; c++) {
                if (tri[c] < 0 || tri[c] >= n) {
                  ctx.addIssue({ code: 'custom', path: ['triangles', t, c], message: `must be a vertex index from 0 to ${n - 1}` });
                  return;
                }
              }
            }
          }
        }
        break;
      }
      default:
        break;
    }
  });
export type Primitive = z.infer<typeof primitiveSchema>;
export type PrimitiveInput = z.input<typeof primitiveSchema>;
export type PrimitiveShape = Primitive['shape'];

/** The intended spin: axis in part coordinates, rate (rad/s), and the small misalignment (degrees) the flip time is predicted from. */
export const spinSchema = z.strictObject({
  axis: unitVec3Schema,
  rate: num().positive({ error: 'must be greater than zero' }).max(10_000, { error: 'must be at most 10000 rad/s' }),
  misalignmentDeg: num().positive({ error: 'must be greater than zero' }).max(45, { error: 'must be at most 45°' }).default(1),
});

/** Where the trade figures are taken: butt end point, long axis into the part, face normal (perpendicular to the long axis). */
export const gripSchema = z
  .strictObject({
    point: vec3Schema,
    axis: unitVec3Schema,
    faceNormal: unitVec3Schema,
    /** Pivot distance from the butt along the long axis for the pivot moment and centre of percussion (m); default 6 in. */
    pivotDistance: nonNegative().optional(),
  })
  .superRefine((g, ctx) => {
    const d = g.axis[0] * g.faceNormal[0] + g.axis[1] * g.faceNormal[1] + g.axis[2] * g.faceNormal[2];
    if (Math.abs(d) > 1e-6) ctx.addIssue({ code: 'custom', path: ['faceNormal'], message: 'must be perpendicular to grip.axis' });
  });

/** The whole part document. */
export const partDocumentSchema = z
  .object({
    name: z
      .string({ error: 'must be text' })
      .trim()
      .min(1, { error: 'is required' })
      .max(200, { error: 'must be at most 200 characters' })
      .optional(),
    category: gearCategorySchema.optional(),
    /** Which implement class the category checks use where the rules have more than one (javelin). */
    division: z.enum(['men', 'women'], { error: 'must be "men" or "women"' }).optional(),
    primitives: z
      .array(primitiveSchema, { error: 'must be a list of primitives' })
      .min(1, { error: 'must hold at least one primitive' })
      .max(MAX_PRIMITIVES, { error: `must hold at most ${MAX_PRIMITIVES} primitives` }),
    spin: spinSchema,
    grip: gripSchema.optional(),
    dissipative: z.boolean({ error: 'must be true or false' }).default(false),
  })
  .superRefine((doc, ctx) => {
    const seen = new Map<string, number>();
    doc.primitives.forEach((p, i) => {
      if (seen.has(p.id))
        ctx.addIssue({ code: 'custom', path: ['primitives', i, 'id'], message: `repeats the id of primitives[${seen.get(p.id)}]` });
      else seen.set(p.id, i);
    });
    if (!doc.primitives.some((p) => p.mode === 'add'))
      ctx.addIssue({ code: 'custom', path: ['primitives'], message: 'must hold at least one primitive with mode "add"' });
  });

/** A validated part document, defaults filled in. */
export type PartDocument = z.infer<typeof partDocumentSchema>;
/** A part document as sent (defaults may be missing). */
export type PartDocumentInput = z.input<typeof partDocumentSchema>;
