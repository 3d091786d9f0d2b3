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

/**
 * The numeric primitive fields that may refer to a named parameter instead of stating a number
 * (and that a design study may vary), `.0`, `.1`, `.2` for the components of a triple.
 */
export const REFERABLE_FIELDS = [
  'mass',
  'density',
  'radius',
  'innerRadius',
  'length',
  'topRadius',
  'majorRadius',
  'minorRadius',
  'wall',
  'position.0',
  'position.1',
  'position.2',
  'size.0',
  'size.1',
  'size.2',
  'semiAxes.0',
  'semiAxes.1',
  'semiAxes.2',
] as const;
export type ReferableField = (typeof REFERABLE_FIELDS)[number];

/** Most named parameters one part may declare. */
export const MAX_PARAMETERS = 64;
/** Longest name of a parameter. */
export const MAX_PARAMETER_NAME = 64;
/** A parameter's name: a letter or _, then letters, digits or _ (an identifier). */
export const PARAMETER_NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;
const NAME_RULE = 'must be a name of letters, digits and _ that does not start with a digit';

/** Why `name` is not a valid parameter name, or null. */
function parameterNameProblem(name: string): string | null {
  if (name.length === 0) return 'must not be empty';
  if (name.length > MAX_PARAMETER_NAME) return `must be at most ${MAX_PARAMETER_NAME} characters`;
  return PARAMETER_NAME.test(name) ? null : NAME_RULE;
}

/** The name of a parameter, as a reference or a design study gives it. */
export const parameterNameSchema = z.string({ error: 'must be the name of a parameter' }).superRefine((name, ctx) => {
  const bad = parameterNameProblem(name);
  if (bad) ctx.addIssue({ code: 'custom', message: bad });
});

/**
 * A field's value taken from a named parameter: value = scale × parameters[param] + offset
 * (scale default 1, offset default 0, in the field's SI unit).
 */
export const parameterReferenceSchema = z.strictObject(
  {
    param: parameterNameSchema,
    scale: num().default(1),
    offset: num().default(0),
  },
  {
    error: (iss) =>
      iss.code === 'unrecognized_keys'
        ? `has the unknown key ${iss.keys.join(', ')} (a parameter reference holds param, scale and offset)`
        : undefined,
  },
);
/** A reference as validated: scale and offset filled in. */
export type ParameterReference = z.infer<typeof parameterReferenceSchema>;
export type ParameterReferenceInput = z.input<typeof parameterReferenceSchema>;

/** The named parameters of a part: name → value (SI, a finite number). */
export const parametersSchema = z
  .record(z.string(), num(), { error: 'must be an object of named numbers, e.g. { "hoopRadius": 0.16 }' })
  .superRefine((params, ctx) => {
    const names = Object.keys(params);
    if (names.length > MAX_PARAMETERS)
      ctx.addIssue({ code: 'custom', message: `must hold at most ${MAX_PARAMETERS} parameters (it holds ${names.length})` });
    for (const name of names) {
      const bad = parameterNameProblem(name);
      if (bad) ctx.addIssue({ code: 'custom', path: [name], message: `is not a valid parameter name: it ${bad}` });
    }
  });

/** A union's message: a number's own rule comes through as it is; a broken reference names what is wrong with it. */
function numberOrReferenceError(iss: z.core.$ZodRawIssue): string | undefined {
  if (iss.code !== 'invalid_union') return undefined;
  const input = iss.input;
  if (input !== null && typeof input === 'object' && !Array.isArray(input)) {
    const first = (iss as { errors?: { path: PropertyKey[]; message: string }[][] }).errors?.[1]?.[0];
    if (first) return `is a parameter reference whose ${first.path.length > 0 ? first.path.join('.') + ' ' : ''}${first.message}`;
    return 'must be a parameter reference { "param": name, "scale"?: number, "offset"?: number }';
  }
  return 'must be a number';
}

/** A number under `rule`, or a reference to a named parameter (checked by the same rule once resolved). */
const orReference = <T extends z.ZodType<number>>(rule: T) => z.union([rule, parameterReferenceSchema], { error: numberOrReferenceError });

const positiveRule = positive();
const nonNegativeRule = nonNegative();
const anyNumberRule = num();
const densityRule = num().positive({ error: 'must be greater than zero' }).max(100_000, { error: 'must be at most 100000 kg/m³' });
const massRule = num().positive({ error: 'must be greater than zero' }).max(10_000, { error: 'must be at most 10000 kg' });

const positiveTriple = z.tuple([orReference(positiveRule), orReference(positiveRule), orReference(positiveRule)], {
  error: 'must be three positive numbers',
});
/** Where a primitive's local origin goes [x, y, z] (m); each component a number or a reference. */
const positionSchema = z.tuple([orReference(anyNumberRule), orReference(anyNumberRule), orReference(anyNumberRule)], {
  error: 'must be three numbers [x, y, z]',
});

/** Per-primitive scatter for the scatter study: relative density (1 = 100 %) and absolute size (m), one standard deviation. */
export const toleranceSchema = z.strictObject({
  density: num().min(0, { error: 'must not be negative' }).max(1, { error: 'must be at most 1 (100 %)' }).optional(),
  size: num().min(0, { error: 'must not be negative' }).max(0.1, { error: 'must be at most 0.1 m' }).optional(),
});
export type Tolerance = z.infer<typeof toleranceSchema>;

const common = {
  id: z.string({ error: 'must be a text id' }).trim().min(1, { error: 'is required' }).max(64, { error: 'must be at most 64 characters' }),
  position: positionSchema.default([0, 0, 0]),
  rotationDeg: vec3Schema.default([0, 0, 0]),
  density: orReference(densityRule).optional(),
  materialId: z.string({ error: 'must be a text id' }).min(1, { error: 'is required' }).max(64).optional(),
  mass: orReference(massRule).optional(),
  mode: z.enum(['add', 'remove'], { error: 'must be "add" or "remove"' }).default('add'),
  tolerance: toleranceSchema.optional(),
  /**
   * Which fields take their value from a named parameter, as the validated document records them
   * (each field then also holds its resolved number). Sent back, a field named here is computed
   * from its reference again; a document may instead write the reference in the field itself.
   */
  refs: z
    .partialRecord(z.enum(REFERABLE_FIELDS), parameterReferenceSchema, {
      error: (iss) => {
        const keys = (iss as { keys?: string[] }).keys;
        return keys ? `names ${keys.join(', ')}, which cannot refer to a parameter` : 'must be an object of field → parameter reference';
      },
    })
    .optional(),
};

const positiveOrRef = orReference(positiveRule);
const nonNegativeOrRef = orReference(nonNegativeRule);
const boxSchema = z.strictObject({ ...common, shape: z.literal('box'), size: positiveTriple, wall: positiveOrRef.optional() });
const cylinderSchema = z.strictObject({
  ...common,
  shape: z.literal('cylinder'),
  radius: positiveOrRef,
  length: positiveOrRef,
  innerRadius: positiveOrRef.optional(),
});
const coneSchema = z.strictObject({
  ...common,
  shape: z.literal('cone'),
  radius: positiveOrRef,
  length: positiveOrRef,
  topRadius: nonNegativeOrRef.optional(),
});
const sphereSchema = z.strictObject({
  ...common,
  shape: z.literal('sphere'),
  radius: positiveOrRef,
  innerRadius: positiveOrRef.optional(),
});
const ellipsoidSchema = z.strictObject({ ...common, shape: z.literal('ellipsoid'), semiAxes: positiveTriple });
const torusSchema = z.strictObject({ ...common, shape: z.literal('torus'), majorRadius: positiveOrRef, minorRadius: positiveOrRef });
const capsuleSchema = z.strictObject({ ...common, shape: z.literal('capsule'), radius: positiveOrRef, length: nonNegativeOrRef });
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
    // With references the relations are checked once they are resolved (partDocumentSchema).
    if (!hasReferences(p)) relationIssues(p as unknown as Primitive, (path, message) => ctx.addIssue({ code: 'custom', path, message }));
    switch (p.shape) {
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
/** A field's type with parameter references taken out (a triple's components too). */
type WithoutReferences<T> = T extends readonly unknown[]
  ? { [K in keyof T]: Exclude<T[K], ParameterReference> }
  : Exclude<T, ParameterReference>;
/** A primitive as validated: every field a number, `refs` recording which came from a parameter. */
type Resolved<P> = P extends unknown ? { [K in keyof P]: K extends 'refs' ? P[K] : WithoutReferences<P[K]> } : never;
/** One primitive as the engine reads it: plain numbers (references resolved), defaults filled in. */
export type Primitive = Resolved<z.infer<typeof primitiveSchema>>;
export type PrimitiveInput = z.input<typeof primitiveSchema>;
export type PrimitiveShape = Primitive['shape'];
/** Which fields of a primitive came from which parameter. */
export type PrimitiveReferences = Partial<Record<ReferableField, ParameterReference>>;
type UnresolvedPrimitive = z.infer<typeof primitiveSchema>;
type IssueSink = (path: PropertyKey[], message: string) => void;

/** The relations between a primitive's fields (wall below half the smallest edge, inner radius below radius, minor below major radius). */
function relationIssues(p: Primitive, add: IssueSink): void {
  switch (p.shape) {
    case 'box':
      if (p.wall !== undefined && 2 * p.wall >= Math.min(...p.size)) add(['wall'], 'must be less than half the smallest edge of size');
      break;
    case 'cylinder':
    case 'sphere':
      if (p.innerRadius !== undefined && p.innerRadius >= p.radius) add(['innerRadius'], 'must be less than radius');
      break;
    case 'torus':
      if (p.minorRadius >= p.majorRadius) add(['minorRadius'], 'must be less than majorRadius');
      break;
    default:
      break;
  }
}

const SCALAR_FIELDS = ['mass', 'density', 'radius', 'innerRadius', 'length', 'topRadius', 'majorRadius', 'minorRadius', 'wall'] as const;
const TRIPLE_FIELDS = ['position', 'size', 'semiAxes'] as const;

function isReference(v: unknown): v is ParameterReference {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

/** Whether a primitive refers to a parameter anywhere (in a field, or through `refs`). */
function hasReferences(p: UnresolvedPrimitive): boolean {
  if (p.refs !== undefined) return true;
  const rec = p as unknown as Record<string, unknown>;
  for (const k of SCALAR_FIELDS) if (isReference(rec[k])) return true;
  for (const k of TRIPLE_FIELDS) {
    const t = rec[k];
    if (Array.isArray(t) && (isReference(t[0]) || isReference(t[1]) || isReference(t[2]))) return true;
  }
  return false;
}

/** `size.1` → ['size', 1]; `radius` → ['radius']. */
function fieldPath(field: ReferableField): [string] | [string, number] {
  const dot = field.indexOf('.');
  return dot < 0 ? [field] : [field.slice(0, dot), Number(field.slice(dot + 1))];
}

function readField(rec: Record<string, unknown>, field: ReferableField): unknown {
  const path = fieldPath(field);
  const v = rec[path[0]];
  return path.length === 1 ? v : Array.isArray(v) ? (v as unknown[])[path[1]] : undefined;
}

/** The referable fields of each shape (those its schema has). */
const FIELDS_OF_SHAPE: ReadonlyMap<string, ReadonlySet<ReferableField>> = new Map(
  [boxSchema, cylinderSchema, coneSchema, sphereSchema, ellipsoidSchema, torusSchema, capsuleSchema, pointSchema, meshSchema].map((s) => [
    s.shape.shape.value,
    new Set(REFERABLE_FIELDS.filter((f) => fieldPath(f)[0] in s.shape)),
  ]),
);

/** The rule a field's value keeps on a shape (the same one its schema applies to a stated number). */
function fieldRule(shape: PrimitiveShape, field: ReferableField): z.ZodType<number> {
  switch (fieldPath(field)[0]) {
    case 'mass':
      return massRule;
    case 'density':
      return densityRule;
    case 'position':
      return anyNumberRule;
    case 'topRadius':
      return nonNegativeRule;
    case 'length':
      return shape === 'capsule' ? nonNegativeRule : positiveRule;
    default:
      return positiveRule;
  }
}

/**
 * A primitive with its references resolved against `parameters` (value = scale × parameter + offset)
 * and recorded in `refs`; one without references is returned as it is. With `add`, every problem is
 * reported at its field's path under `at`: an unknown parameter, a resolved value that breaks the
 * field's rule, a relation between fields, a `refs` entry that does not fit the primitive.
 */
function resolvePrimitive(
  p: UnresolvedPrimitive,
  parameters: Readonly<Record<string, number>> | undefined,
  at: PropertyKey[],
  add?: IssueSink,
): Primitive {
  if (!hasReferences(p)) return p as unknown as Primitive;
  const out: Record<string, unknown> = { ...p };
  for (const k of TRIPLE_FIELDS) if (Array.isArray(out[k])) out[k] = [...(out[k] as unknown[])];
  const refs: PrimitiveReferences = {};
  for (const field of REFERABLE_FIELDS) {
    const v = readField(out, field);
    if (isReference(v)) refs[field] = v;
  }
  const fields = FIELDS_OF_SHAPE.get(p.shape);
  for (const [key, ref] of Object.entries(p.refs ?? {}) as [ReferableField, ParameterReference][]) {
    const where = [...at, 'refs', key];
    if (refs[key]) add?.(where, `repeats the reference written in ${key} itself; give it in one place`);
    else if (!fields?.has(key)) add?.(where, `names ${key}, which a ${p.shape} does not have`);
    else if (readField(out, key) === undefined)
      add?.(where, `names ${key}, which this primitive does not give; write the reference in ${key} instead`);
    else refs[key] = ref;
  }
  let resolved = true;
  for (const [field, ref] of Object.entries(refs) as [ReferableField, ParameterReference][]) {
    const path = fieldPath(field);
    const base = parameters && Object.hasOwn(parameters, ref.param) ? parameters[ref.param] : undefined;
    if (base === undefined) {
      add?.([...at, ...path], `refers to an unknown parameter "${ref.param}"`);
      resolved = false;
      continue;
    }
    const value = ref.scale * base + ref.offset;
    if (path.length === 1) out[path[0]] = value;
    else (out[path[0]] as unknown[])[path[1]] = value;
    if (add) {
      const checked = fieldRule(p.shape, field).safeParse(value);
      if (!checked.success) {
        resolved = false;
        for (const issue of checked.error.issues)
          add([...at, ...path], `${issue.message} (it is ${value} from the parameter "${ref.param}")`);
      }
    }
  }
  if (Object.keys(refs).length > 0) out.refs = refs;
  else delete out.refs;
  if (add && resolved) relationIssues(out as unknown as Primitive, (path, message) => add([...at, ...path], message));
  return out as unknown as Primitive;
}

/** The document with every reference resolved (the schema has checked them). */
function resolveDocument<D extends { primitives: UnresolvedPrimitive[]; parameters?: Record<string, number> }>(
  doc: D,
): Omit<D, 'primitives'> & { primitives: Primitive[] } {
  if (!doc.primitives.some(hasReferences)) return doc as unknown as Omit<D, 'primitives'> & { primitives: Primitive[] };
  return { ...doc, primitives: doc.primitives.map((p) => resolvePrimitive(p, doc.parameters, [])) };
}

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
    /** Named values (SI) that primitive fields may refer to with { "param": name, "scale"?, "offset"? }. */
    parameters: parametersSchema.optional(),
    primitives: z
      .array(primitiveSchema, { error: 'must be a list of primitives' })
      .min(1, { error: 'must hold at least one primitive' })
      .max(MAX_PRIMITIVES, { error: `must hold at most ${MAX_PRIMITIVES} primitives` }),
    spin: spinSchema,
    grip: gripSchema.optional(),
    dissipative: z.boolean({ error: 'must be true or false' }).default(false),
    /** Time the gear is in the air (s); decides whether a predicted flip is seen. Default: the category's estimate. */
    flightTime: num().positive({ error: 'must be greater than zero' }).max(600, { error: 'must be at most 600 s' }).optional(),
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
    // References resolved first, then checked by the field's own rule and the primitive's relations, at the field's path.
    const add: IssueSink = (path, message) => ctx.addIssue({ code: 'custom', path, message });
    doc.primitives.forEach((p, i) => {
      if (hasReferences(p)) resolvePrimitive(p, doc.parameters, ['primitives', i], add);
    });
  })
  .transform(resolveDocument);

/**
 * A validated part document, defaults filled in and every field a number: a field written as a
 * parameter reference holds its resolved value, and its primitive's `refs` records the reference
 * (`parameters` is kept). Sent again, it validates to the same document.
 */
export type PartDocument = z.infer<typeof partDocumentSchema>;
/** A part document as sent (defaults may be missing). */
export type PartDocumentInput = z.input<typeof partDocumentSchema>;

/**
 * A validated document as a client writes it: each reference back in its field (scale 1 and
 * offset 0 left out) instead of `refs`, the resolved numbers of those fields dropped. Validating
 * the result gives the same document again.
 */
export function partDocumentInputOf(doc: PartDocument): PartDocumentInput {
  if (!doc.primitives.some((p) => p.refs !== undefined)) return doc as PartDocumentInput;
  const primitives = doc.primitives.map((p) => {
    if (p.refs === undefined) return p;
    const { refs, ...rest } = p;
    const out: Record<string, unknown> = { ...rest };
    for (const k of TRIPLE_FIELDS) if (Array.isArray(out[k])) out[k] = [...(out[k] as unknown[])];
    for (const [field, ref] of Object.entries(refs) as [ReferableField, ParameterReference][]) {
      const inline: ParameterReferenceInput = { param: ref.param };
      if (ref.scale !== 1) inline.scale = ref.scale;
      if (ref.offset !== 0) inline.offset = ref.offset;
      const path = fieldPath(field);
      if (path.length === 1) out[path[0]] = inline;
      else (out[path[0]] as unknown[])[path[1]] = inline;
    }
    return out;
  });
  return { ...doc, primitives } as PartDocumentInput;
}
