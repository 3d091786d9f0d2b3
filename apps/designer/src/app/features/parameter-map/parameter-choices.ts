import { DESIGN_PARAMETERS, type DesignParameter } from '@tumblewise/shared';
import { EDITOR_UNITS, type UnitChoice } from '../part-editor/display-value';
import type { DraftDocument, DraftPrimitive } from '../part-editor/draft-document';
import { shapeLabel } from '../part-editor/primitive-fields';
import { numericControls } from '../part-editor/primitive-form-model';

/** One field of one primitive that a sweep may step: where it lives, how the editor labels it, its unit and value. */
export interface ParameterChoice {
  /** Unique key of the choice in a select (`knob|radius`). */
  key: string;
  /** The primitive's id. */
  primitive: string;
  /** The field, as the sweep request names it (`radius`, `size.0`, `position.2`). */
  parameter: DesignParameter;
  /** The editor form's label of the field ("Ring radius", "Size x", "Position z"). */
  label: string;
  /** The editor's display unit of the field (SI in the document). */
  units: UnitChoice;
  /** The value in the draft (SI); an absent bore or tip radius is 0. */
  current: number;
}

/** Choices of one primitive, for an option group. */
export interface PrimitiveChoices {
  primitive: string;
  /** "knob (Sphere)". */
  heading: string;
  choices: ParameterChoice[];
}

/** Optional fields whose absence means 0 (no bore, a pointed tip): a sweep may start them from 0. */
const ZERO_WHEN_ABSENT = new Set(['innerRadius', 'topRadius']);
const SWEEPABLE = new Set<string>(DESIGN_PARAMETERS);

/** `size[1]` → `size.1`; `radius` stays. */
function parameterOfPath(path: string): string {
  return path.replace(/\[(\d)\]$/, '.$1');
}

/** The number a primitive holds at a parameter (`size.1` reads `size[1]`); undefined when absent or not a plain number. */
function readNumber(p: DraftPrimitive, parameter: string): number | undefined {
  const [field, component] = parameter.split('.');
  const raw = component === undefined ? p[field] : Array.isArray(p[field]) ? (p[field] as unknown[])[Number(component)] : undefined;
  return typeof raw === 'number' && Number.isFinite(raw) ? raw : undefined;
}

/** Whether the primitive takes this field from a named parameter (`refs`), so a value written there would not hold. */
function refersToParameter(p: DraftPrimitive, parameter: string): boolean {
  const refs = p['refs'];
  return !!refs && typeof refs === 'object' && parameter in refs;
}

/**
 * The fields of a draft's primitives a sweep may step, in the editor's order per primitive: the
 * shape's dimensions, then the stated density or mass, then the position. A field that holds no
 * plain number (left empty, or taken from a named parameter) is left out, except an absent inner or
 * top radius, which reads 0 (the solid shape). Rotations are not design parameters.
 */
export function parameterChoices(doc: DraftDocument): PrimitiveChoices[] {
  return doc.primitives
    .map((p) => {
      const choices: ParameterChoice[] = [];
      const add = (parameter: string, label: string, units: UnitChoice) => {
        if (!SWEEPABLE.has(parameter) || refersToParameter(p, parameter)) return;
        const value = readNumber(p, parameter) ?? (ZERO_WHEN_ABSENT.has(parameter) && p[parameter] === undefined ? 0 : undefined);
        if (value === undefined) return;
        choices.push({
          key: `${p.id}|${parameter}`,
          primitive: p.id,
          parameter: parameter as DesignParameter,
          label,
          units,
          current: value,
        });
      };
      const controls = numericControls(p.shape).filter((c) => !c.name.startsWith('rotation_'));
      for (const c of controls.filter((c) => !c.name.startsWith('position_'))) add(parameterOfPath(c.path), c.label, c.units);
      if (p.materialId === undefined) {
        add('density', 'Density', EDITOR_UNITS.density);
        add('mass', 'Mass', EDITOR_UNITS.mass);
      }
      for (const c of controls.filter((c) => c.name.startsWith('position_'))) add(parameterOfPath(c.path), c.label, c.units);
      return { primitive: p.id, heading: `${p.id} (${shapeLabel(p.shape)})`, choices };
    })
    .filter((g) => g.choices.length > 0);
}

/** Every choice of the groups, in order. */
export function allChoices(groups: readonly PrimitiveChoices[]): ParameterChoice[] {
  return groups.flatMap((g) => g.choices);
}

/** How a choice is named on screen and in axis titles: "knob · Radius". */
export function choiceName(choice: Pick<ParameterChoice, 'primitive' | 'label'>): string {
  return `${choice.primitive} · ${choice.label}`;
}

/**
 * The choices a new map starts from: the first field of the first primitive, and the first field
 * of another primitive (else the first primitive's second field). Null where there is none.
 */
export function defaultChoices(groups: readonly PrimitiveChoices[]): [ParameterChoice | null, ParameterChoice | null] {
  const first = groups[0]?.choices[0] ?? null;
  const second = groups[1]?.choices[0] ?? groups[0]?.choices[1] ?? null;
  return [first, second];
}
