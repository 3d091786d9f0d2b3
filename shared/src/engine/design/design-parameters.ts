import type { DesignParameter } from '../../schemas/design-targets';
import {
  MAX_DIMENSION,
  type ParameterReference,
  type PartDocument,
  type Primitive,
  type PrimitiveShape,
} from '../../schemas/part-document';
import { EngineInputError } from '../part/engine-input-error';
import { DIMENSION_NAMES } from '../part/primitive-dimensions';

/** Where a design parameter lives in the engine's piece model. */
export type ParameterSlot =
  | { kind: 'mass' }
  | { kind: 'density' }
  | { kind: 'position'; axis: 0 | 1 | 2 }
  /** A dimension, by its slot in DIMENSION_NAMES order. */
  | { kind: 'dimension'; slot: number };

/** The values a parameter may take (SI): the part document's own rule for the field. */
export interface ParameterDomain {
  lower: number;
  /** The lower end itself is excluded (the field must be greater than zero). */
  lowerOpen: boolean;
  upper: number;
  unit: 'kg' | 'kg/m³' | 'm';
}

const MAX_MASS = 10_000;
const MAX_DENSITY = 100_000;
const ANYWHERE = 1e6;

/** Optional dimensions whose absence means the value 0 (no bore, a pointed tip), so they may be freed from 0. */
const ZERO_WHEN_ABSENT = new Set<string>(['innerRadius', 'topRadius']);

/** `size.1` → `size[1]` (the engine's dimension-slot name); other names are the same. */
function slotName(parameter: DesignParameter): string {
  const dot = parameter.indexOf('.');
  return dot < 0 ? parameter : `${parameter.slice(0, dot)}[${parameter.slice(dot + 1)}]`;
}

/** The design parameters a primitive has, in DESIGN_PARAMETERS order: its mass or density (whichever it states), position and dimensions. */
export function designParametersOf(p: Primitive): DesignParameter[] {
  const out: DesignParameter[] = [];
  if (p.mass !== undefined) out.push('mass');
  if (p.density !== undefined) out.push('density');
  const dims = DIMENSION_NAMES[p.shape];
  const stated = new Set(dims.filter((name) => fieldValue(p, name) !== undefined || ZERO_WHEN_ABSENT.has(name)));
  for (const name of ['radius', 'innerRadius', 'length', 'topRadius', 'majorRadius', 'minorRadius', 'wall'] as const)
    if (stated.has(name)) out.push(name);
  out.push('position.0', 'position.1', 'position.2');
  for (const triple of ['size', 'semiAxes'] as const) if (stated.has(`${triple}[0]`)) out.push(`${triple}.0`, `${triple}.1`, `${triple}.2`);
  return out;
}

/** Raw value of a dimension slot name (`radius`, `size[1]`) on a primitive, or undefined when absent. */
function fieldValue(p: Primitive, name: string): number | undefined {
  const bracket = name.indexOf('[');
  const rec = p as unknown as Record<string, unknown>;
  if (bracket < 0) return rec[name] as number | undefined;
  const arr = rec[name.slice(0, bracket)] as number[] | undefined;
  return arr?.[Number(name.slice(bracket + 1, -1))];
}

/**
 * Where `parameter` lives on primitive `p`, or an explanation of why it does not apply (for an
 * EngineInputError): a field the shape lacks, `density` on a primitive given by its material or
 * mass, `mass` on one given by its density, `wall` on a solid box.
 */
export function parameterSlot(p: Primitive, parameter: DesignParameter): ParameterSlot | string {
  if (parameter === 'mass') {
    if (p.mass !== undefined) return { kind: 'mass' };
    if (p.materialId !== undefined)
      return `does not apply: ${p.id} takes its density from material ${p.materialId}, so its mass follows its size; free a dimension instead`;
    return `does not apply: ${p.id} is given by its density, not its mass; free density instead`;
  }
  if (parameter === 'density') {
    if (p.density !== undefined) return { kind: 'density' };
    if (p.shape === 'point') return `does not apply to a point mass; free mass instead`;
    if (p.materialId !== undefined)
      return `does not apply: ${p.id} takes its density from material ${p.materialId}; give it a density instead to free it`;
    return `does not apply: ${p.id} is given by its mass, not its density; free mass instead`;
  }
  if (parameter.startsWith('position.')) return { kind: 'position', axis: Number(parameter.slice(9)) as 0 | 1 | 2 };
  const name = slotName(parameter);
  const slot = DIMENSION_NAMES[p.shape].indexOf(name);
  const has = designParametersOf(p).filter((x) => x !== 'mass' && x !== 'density' && !x.startsWith('position.'));
  const list = has.length > 0 ? `its dimensions are ${has.join(', ')}` : 'it has no dimensions to vary';
  if (slot < 0) return `${parameter} is not a field of a ${p.shape} (${list})`;
  if (fieldValue(p, name) === undefined && !ZERO_WHEN_ABSENT.has(name))
    return `${p.id} is a solid box without a wall; give it a wall first to vary it`;
  return { kind: 'dimension', slot };
}

/**
 * The rule of the part document for a parameter's values on primitive `p`. A field that refers to a
 * named parameter (`referenced`) keeps its schema rule exactly: its bore cannot become 0 (absent).
 */
export function parameterDomain(p: Primitive, parameter: DesignParameter, referenced = false): ParameterDomain {
  if (parameter === 'mass') return { lower: 0, lowerOpen: true, upper: MAX_MASS, unit: 'kg' };
  if (parameter === 'density') return { lower: 0, lowerOpen: true, upper: MAX_DENSITY, unit: 'kg/m³' };
  if (parameter.startsWith('position.')) return { lower: -ANYWHERE, lowerOpen: false, upper: ANYWHERE, unit: 'm' };
  // A bore or tip radius of 0 is the solid primitive; a capsule of straight length 0 is a sphere.
  const zeroAllowed =
    (ZERO_WHEN_ABSENT.has(parameter) && !(referenced && parameter === 'innerRadius')) || (p.shape === 'capsule' && parameter === 'length');
  return { lower: 0, lowerOpen: !zeroAllowed, upper: MAX_DIMENSION, unit: 'm' };
}

/** Why `value` is outside a parameter's domain, or null. */
export function domainProblem(domain: ParameterDomain, value: number): string | null {
  if (!Number.isFinite(value)) return 'must be a finite number';
  if (domain.lowerOpen ? !(value > domain.lower) : !(value >= domain.lower)) {
    return domain.lowerOpen && domain.lower === 0
      ? 'must be greater than zero'
      : domain.lower === 0
        ? 'must not be negative'
        : `must be at least ${domain.lower} ${domain.unit}`;
  }
  if (value > domain.upper) return `must be at most ${domain.upper} ${domain.unit}`;
  return null;
}

/**
 * Why a shape's dimensions (DIMENSION_NAMES order, absent optional ones 0) break a relation of the
 * part document between two fields, or null: wall below half the smallest edge, inner radius below
 * the radius, minor radius below the major radius (the schema's rules in part-document.ts).
 */
export function relationProblem(shape: PrimitiveShape, d: ArrayLike<number>): string | null {
  switch (shape) {
    case 'box':
      return d[3] > 0 && !(2 * d[3] < Math.min(d[0], d[1], d[2])) ? 'wall must be less than half the smallest edge of size' : null;
    case 'cylinder':
      return d[2] > 0 && !(d[2] < d[0]) ? 'innerRadius must be less than radius' : null;
    case 'sphere':
      return d[1] > 0 && !(d[1] < d[0]) ? 'innerRadius must be less than radius' : null;
    case 'torus':
      return !(d[1] < d[0]) ? 'minorRadius must be less than majorRadius' : null;
    default:
      return null;
  }
}

/** Index of the primitive with this id, or −1. */
export function primitiveIndex(doc: PartDocument, id: string): number {
  return doc.primitives.findIndex((p) => p.id === id);
}

/** `where` + `.field`, or the field alone when `where` is empty. */
function at(where: string, field: string): string {
  return where ? `${where}.${field}` : field;
}

/** Finds primitive `id` and the slot of `parameter` on it, or throws EngineInputError('invalid') naming `<where>.primitive` or `<where>.parameter`. */
export function resolveParameter(
  doc: PartDocument,
  id: string,
  parameter: DesignParameter,
  where = '',
): { index: number; primitive: Primitive; slot: ParameterSlot } {
  const index = primitiveIndex(doc, id);
  if (index < 0) {
    const ids = doc.primitives.map((p) => p.id);
    const shown = ids.length > 8 ? `${ids.slice(0, 8).join(', ')}, …` : ids.join(', ');
    throw new EngineInputError('invalid', [
      { path: at(where, 'primitive'), message: `is not a primitive of this part (its ids: ${shown})` },
    ]);
  }
  const primitive = doc.primitives[index];
  const slot = parameterSlot(primitive, parameter);
  if (typeof slot === 'string') throw new EngineInputError('invalid', [{ path: at(where, 'parameter'), message: slot }]);
  return { index, primitive, slot };
}

/** The value (SI) of a parameter on a primitive; an absent bore or tip radius reads 0. */
export function parameterValue(p: Primitive, parameter: DesignParameter): number {
  if (parameter === 'mass') return p.mass!;
  if (parameter === 'density') return p.density!;
  if (parameter.startsWith('position.')) return p.position[Number(parameter.slice(9))];
  return fieldValue(p, slotName(parameter)) ?? 0;
}

/**
 * The value (SI) of primitive `id`'s numeric field `parameter` in a validated part document.
 * Throws EngineInputError('invalid') naming `<where>.primitive` for an unknown id and
 * `<where>.parameter` for a field the primitive does not have (see parameterSlot).
 */
export function readDesignParameter(doc: PartDocument, id: string, parameter: DesignParameter, where = ''): number {
  const { primitive } = resolveParameter(doc, id, parameter, where);
  return parameterValue(primitive, parameter);
}

/**
 * A new part document with primitive `id`'s field `parameter` set to `value` (SI); the input is not
 * changed (the primitive list, the primitive and a changed triple are copied; the rest is shared).
 * An absent bore or tip radius is written when the value is above 0, and an inner radius of 0 is
 * removed (the solid primitive). Throws EngineInputError('invalid') as readDesignParameter, and
 * naming `<where>.value` when the value breaks the field's rule or a relation with another field of
 * the primitive (e.g. innerRadius ≥ radius).
 */
export function writeDesignParameter(doc: PartDocument, id: string, parameter: DesignParameter, value: number, where = ''): PartDocument {
  const { index, primitive } = resolveParameter(doc, id, parameter, where);
  const followed = followsParameter(primitive, parameter);
  if (followed) throw new EngineInputError('invalid', [{ path: at(where, 'parameter'), message: followed }]);
  const bad = domainProblem(parameterDomain(primitive, parameter), value);
  if (bad) throw new EngineInputError('invalid', [{ path: at(where, 'value'), message: `${parameter} ${bad}` }]);
  const next = withParameter(primitive, parameter, value);
  const dims = DIMENSION_NAMES[next.shape].map((name) => fieldValue(next, name) ?? 0);
  const relation = relationProblem(next.shape, dims);
  if (relation) throw new EngineInputError('invalid', [{ path: at(where, 'value'), message: `${primitive.id}: ${relation}` }]);
  const primitives = doc.primitives.slice();
  primitives[index] = next;
  return { ...doc, primitives };
}

/**
 * Why a primitive's field cannot be varied on its own because it refers to a named parameter
 * (naming the parameter to vary instead), or null.
 */
export function followsParameter(p: Primitive, parameter: DesignParameter): string | null {
  const ref = p.refs?.[parameter];
  return ref
    ? `${parameter} of ${p.id} follows the parameter "${ref.param}"; vary the parameter instead ({ "param": "${ref.param}" })`
    : null;
}

/** A primitive field that refers to a named parameter. */
export interface ParameterUse {
  /** Index of the primitive in the document. */
  index: number;
  primitive: Primitive;
  field: DesignParameter;
  ref: ParameterReference;
}

/** Every primitive field that refers to the named parameter `name`, in document order. */
export function usesOfParameter(doc: PartDocument, name: string): ParameterUse[] {
  const uses: ParameterUse[] = [];
  doc.primitives.forEach((primitive, index) => {
    if (!primitive.refs) return;
    for (const [field, ref] of Object.entries(primitive.refs) as [DesignParameter, ParameterReference][])
      if (ref.param === name) uses.push({ index, primitive, field, ref });
  });
  return uses;
}

/**
 * The value of the named parameter `name` and the fields that refer to it; throws
 * EngineInputError('invalid') naming `<where>.param` when the part has no such parameter or no
 * field refers to it (varying it would change nothing).
 */
export function resolveNamedParameter(doc: PartDocument, name: string, where = ''): { value: number; uses: ParameterUse[] } {
  const params = doc.parameters ?? {};
  if (!Object.hasOwn(params, name)) {
    const names = Object.keys(params);
    const shown =
      names.length === 0 ? 'the part declares none' : `its parameters: ${names.slice(0, 8).join(', ')}${names.length > 8 ? ', …' : ''}`;
    throw new EngineInputError('invalid', [{ path: at(where, 'param'), message: `is not a parameter of this part (${shown})` }]);
  }
  const uses = usesOfParameter(doc, name);
  if (uses.length === 0)
    throw new EngineInputError('invalid', [
      { path: at(where, 'param'), message: `is not referred to by any primitive field, so varying it changes nothing` },
    ]);
  return { value: params[name], uses };
}

/** The value a field referring to a parameter takes when the parameter is `value`. */
export function referencedValue(ref: ParameterReference, value: number): number {
  return ref.scale * value + ref.offset;
}

/** A new document with the named parameter `name` set to `value` and every field that refers to it resolved again (no checks). */
export function withNamedParameter(doc: PartDocument, name: string, value: number): PartDocument {
  const primitives = doc.primitives.slice();
  for (const use of usesOfParameter(doc, name)) {
    primitives[use.index] = withParameter(primitives[use.index], use.field, referencedValue(use.ref, value));
  }
  return { ...doc, parameters: { ...doc.parameters, [name]: value }, primitives };
}

/**
 * A new document with the named parameter `name` set to `value` (SI) and every field that refers to
 * it resolved again. Throws EngineInputError('invalid') as resolveNamedParameter, and naming
 * `<where>.value` when a resolved field breaks its rule or a relation of its primitive.
 */
export function writeNamedParameter(doc: PartDocument, name: string, value: number, where = ''): PartDocument {
  const { uses } = resolveNamedParameter(doc, name, where);
  if (!Number.isFinite(value)) throw new EngineInputError('invalid', [{ path: at(where, 'value'), message: 'must be a finite number' }]);
  for (const use of uses) {
    const v = referencedValue(use.ref, value);
    const bad = domainProblem(parameterDomain(use.primitive, use.field, true), v);
    if (bad)
      throw new EngineInputError('invalid', [
        { path: at(where, 'value'), message: `${name} = ${value} makes ${use.field} of ${use.primitive.id} ${v}, which ${bad}` },
      ]);
  }
  const next = withNamedParameter(doc, name, value);
  for (const index of new Set(uses.map((u) => u.index))) {
    const p = next.primitives[index];
    const relation = relationProblem(
      p.shape,
      DIMENSION_NAMES[p.shape].map((n) => fieldValue(p, n) ?? 0),
    );
    if (relation)
      throw new EngineInputError('invalid', [{ path: at(where, 'value'), message: `${name} = ${value}: ${p.id}: ${relation}` }]);
  }
  return next;
}

/** A copy of `p` with one field set (no checks). */
export function withParameter(p: Primitive, parameter: DesignParameter, value: number): Primitive {
  const dot = parameter.indexOf('.');
  if (dot >= 0) {
    const field = parameter.slice(0, dot) as 'position' | 'size' | 'semiAxes';
    const triple = [...(p as unknown as Record<string, [number, number, number]>)[field]] as [number, number, number];
    triple[Number(parameter.slice(dot + 1))] = value;
    return { ...p, [field]: triple } as Primitive;
  }
  if (parameter === 'innerRadius' && value === 0) {
    const copy = { ...p } as Record<string, unknown>;
    delete copy.innerRadius;
    return copy as Primitive;
  }
  if (parameter === 'topRadius' && value === 0 && p.shape === 'cone' && p.topRadius === undefined) return p;
  return { ...p, [parameter]: value } as Primitive;
}
