import { designParametersOf } from '@tumblewise/engine';
import { MAX_DIMENSION, type DesignFree, type DesignParameter, type PartDocument, type Primitive } from '@tumblewise/shared';
import { displayToSi, EDITOR_UNITS, roundSignificant, siToDisplay, type UnitChoice } from '../part-editor/display-value';
import { numericControls } from '../part-editor/primitive-form-model';
import { shapeLabel } from '../part-editor/primitive-fields';

/** One numeric field of a primitive that a goal seek may free, as the picker shows it. */
export interface ParameterField {
  /** Id of the primitive. */
  primitive: string;
  /** The field as the request names it (`radius`, `position.2`). */
  parameter: DesignParameter;
  /** The editor's own label of the field ("Base radius", "Position z"). */
  label: string;
  /** Display unit (the editor's: mm, g, kg/m³). */
  units: UnitChoice;
  /** The draft's value in the display unit (an absent bore or tip radius reads 0). */
  value: number;
  /** Lowest value the part document allows, in the display unit; `lowerOpen` excludes it. */
  lower: number;
  lowerOpen: boolean;
  /** Highest value the part document allows, in the display unit. */
  upper: number;
  /** Default bounds in the display unit. */
  defaultMin: number;
  defaultMax: number;
}

/** A primitive of the draft with the fields the picker offers. */
export interface PrimitiveParameters {
  id: string;
  /** The shape's name on screen ("Capsule"). */
  shapeName: string;
  fields: ParameterField[];
}

/** One free parameter as the form holds it (bounds in the display unit; null while empty). */
export interface FreeChoice {
  primitive: string;
  parameter: DesignParameter;
  min: number | null;
  max: number | null;
}

/** Share of a value the default bounds reach on either side (our default for a first search: ±20 %). */
export const DEFAULT_SPAN = 0.2;
/** Default half-width of the bounds of a position component that is 0 (m): ±20 mm. */
const ZERO_POSITION_SPAN = 0.02;
/** Significant digits of default bounds on screen. */
const BOUND_DIGITS = 4;
/** Significant digits kept in SI after conversion (clears mm→m binary noise, as the editor does). */
const SI_DIGITS = 12;
/** The part document's largest mass (kg) and density (kg/m³). */
const MAX_MASS = 10_000;
const MAX_DENSITY = 100_000;
/** How far a default bound stays inside a relation with another field (inner radius below radius, …). */
const RELATION_MARGIN = 0.99;

/** Fields whose absence means 0 (no bore, a pointed tip), and capsule length, which may be 0 (a sphere). */
const ZERO_ALLOWED = new Set<DesignParameter>(['innerRadius', 'topRadius']);

/** Key of a free parameter, unique within a request. */
export function freeKey(primitive: string, parameter: string): string {
  return `${primitive}\u0000${parameter}`;
}

/** `size.1` → `size[1]`, the path the editor's form names the control by. */
function controlPath(parameter: string): string {
  const dot = parameter.indexOf('.');
  return dot < 0 ? parameter : `${parameter.slice(0, dot)}[${parameter.slice(dot + 1)}]`;
}

/** The editor's label and display unit of a parameter on a primitive of `shape`. */
export function parameterLabel(shape: Primitive['shape'], parameter: string): { label: string; units: UnitChoice } {
  if (parameter === 'mass') return { label: 'Mass', units: EDITOR_UNITS.mass };
  if (parameter === 'density') return { label: 'Density', units: EDITOR_UNITS.density };
  const control = numericControls(shape).find((c) => c.path === controlPath(parameter));
  return control ? { label: control.label, units: control.units } : { label: parameter, units: EDITOR_UNITS.length };
}

/** The SI value of a parameter on a validated primitive (an absent bore or tip radius reads 0). */
export function parameterValueSi(p: Primitive, parameter: DesignParameter): number {
  const record = p as unknown as Record<string, unknown>;
  const dot = parameter.indexOf('.');
  if (dot >= 0) {
    const triple = record[parameter.slice(0, dot)];
    return Array.isArray(triple) ? Number(triple[Number(parameter.slice(dot + 1))]) : 0;
  }
  const v = record[parameter];
  return typeof v === 'number' ? v : 0;
}

/** The part document's range of a parameter (SI), as its schema states it. */
function domainOf(p: Primitive, parameter: DesignParameter): { lower: number; lowerOpen: boolean; upper: number } {
  if (parameter === 'mass') return { lower: 0, lowerOpen: true, upper: MAX_MASS };
  if (parameter === 'density') return { lower: 0, lowerOpen: true, upper: MAX_DENSITY };
  if (parameter.startsWith('position.')) return { lower: -1e6, lowerOpen: false, upper: 1e6 };
  const zero = ZERO_ALLOWED.has(parameter) || (p.shape === 'capsule' && parameter === 'length');
  return { lower: 0, lowerOpen: !zero, upper: MAX_DIMENSION };
}

/** The largest value a field may take while the primitive's other fields stay as they are (SI), or Infinity. */
function relationCeiling(p: Primitive, parameter: DesignParameter): number {
  switch (parameter) {
    case 'innerRadius':
      return p.shape === 'cylinder' || p.shape === 'sphere' ? p.radius * RELATION_MARGIN : Infinity;
    case 'minorRadius':
      return p.shape === 'torus' ? p.majorRadius * RELATION_MARGIN : Infinity;
    case 'wall':
      return p.shape === 'box' ? (Math.min(...p.size) / 2) * RELATION_MARGIN : Infinity;
    default:
      return Infinity;
  }
}

/**
 * Default bounds of a parameter (SI): the value ±20 %, kept inside the part document's range and
 * below the field's partner (an inner radius stays under the radius). A value of 0 has no
 * percentage: a position component gets ±20 mm, an absent bore or tip radius 0 to half the radius,
 * a capsule of straight length 0 the range 0 to 20 mm.
 */
export function defaultBoundsSi(p: Primitive, parameter: DesignParameter): { min: number; max: number } {
  const v = parameterValueSi(p, parameter);
  const domain = domainOf(p, parameter);
  let min: number, max: number;
  if (v !== 0) {
    const span = DEFAULT_SPAN * Math.abs(v);
    min = v - span;
    max = v + span;
  } else if (parameter.startsWith('position.')) {
    min = -ZERO_POSITION_SPAN;
    max = ZERO_POSITION_SPAN;
  } else if (parameter === 'innerRadius' || parameter === 'topRadius') {
    min = 0;
    max = 'radius' in p ? p.radius / 2 : ZERO_POSITION_SPAN;
  } else {
    min = 0;
    max = ZERO_POSITION_SPAN;
  }
  max = Math.min(max, domain.upper, relationCeiling(p, parameter));
  min = Math.max(min, domain.lower);
  return { min, max };
}

/** A number for a bound field: `digits` significant digits, no binary noise. */
function roundBound(x: number): number {
  return roundSignificant(x, BOUND_DIGITS);
}

/**
 * The named parameter a field takes its value from, if the document says so (`refs`): such a field
 * moves only with its parameter, so the picker does not offer it on its own.
 */
export function followedParameter(p: Primitive, parameter: string): string | null {
  const refs = (p as { refs?: Partial<Record<string, { param?: unknown }>> }).refs;
  const param = refs?.[parameter]?.param;
  return typeof param === 'string' ? param : null;
}

/**
 * The fields of one validated primitive that a goal seek may free, in the engine's order, with the
 * editor's labels and units (fields that follow a named parameter left out).
 */
export function parameterFieldsOf(p: Primitive): ParameterField[] {
  return designParametersOf(p)
    .filter((parameter) => followedParameter(p, parameter) === null)
    .map((parameter) => {
      const { label, units } = parameterLabel(p.shape, parameter);
      const domain = domainOf(p, parameter);
      const bounds = defaultBoundsSi(p, parameter);
      const shown = (si: number) => siToDisplay(si, units) ?? 0;
      return {
        primitive: p.id,
        parameter,
        label,
        units,
        value: shown(parameterValueSi(p, parameter)),
        lower: shown(domain.lower),
        lowerOpen: domain.lowerOpen,
        upper: shown(domain.upper),
        defaultMin: roundBound(shown(bounds.min)),
        defaultMax: roundBound(shown(bounds.max)),
      };
    });
}

/** Every primitive of a validated document with its free-able fields (primitives with none are left out). */
export function primitiveParameters(doc: PartDocument): PrimitiveParameters[] {
  return doc.primitives
    .map((p) => ({ id: p.id, shapeName: shapeLabel(p.shape), fields: parameterFieldsOf(p) }))
    .filter((p) => p.fields.length > 0);
}

/** What is wrong with a pair of bounds typed in display units, per bound (empty when both are fine). */
export function boundsProblems(
  field: Pick<ParameterField, 'lower' | 'lowerOpen' | 'upper' | 'units'>,
  min: number | null,
  max: number | null,
) {
  const problems: { min?: string; max?: string } = {};
  const unit = field.units.unit;
  if (min === null || !Number.isFinite(min)) problems.min = 'is required';
  else if (field.lowerOpen ? !(min > field.lower) : !(min >= field.lower))
    problems.min = field.lowerOpen && field.lower === 0 ? 'must be greater than zero' : `must be at least ${field.lower} ${unit}`;
  if (max === null || !Number.isFinite(max)) problems.max = 'is required';
  else if (max > field.upper) problems.max = `must be at most ${field.upper} ${unit}`;
  else if (min !== null && Number.isFinite(min) && !(max > min)) problems.max = 'must be greater than the lower bound';
  return problems;
}

/** A display value converted to SI for the request (12 significant digits, as the editor keeps). */
export function boundToSi(value: number, units: UnitChoice): number {
  return roundSignificant(displayToSi(value, units) ?? Number.NaN, SI_DIGITS);
}

/**
 * The request's free list: each choice's bounds from display units to SI. `fieldOf` finds the
 * field of a choice (for its unit); a choice whose field is gone or whose bounds are empty throws,
 * since the form does not send those.
 */
export function freeRequest(choices: readonly FreeChoice[], fieldOf: (c: FreeChoice) => ParameterField | undefined): DesignFree[] {
  return choices.map((c) => {
    const field = fieldOf(c);
    if (!field || c.min === null || c.max === null) throw new Error(`free parameter ${c.primitive} ${c.parameter} is not complete`);
    return { primitive: c.primitive, parameter: c.parameter, min: boundToSi(c.min, field.units), max: boundToSi(c.max, field.units) };
  });
}
