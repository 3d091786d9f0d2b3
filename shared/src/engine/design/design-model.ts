import type { DesignParameter } from '../../schemas/design-targets';
import type { PartDocument, Primitive } from '../../schemas/part-document';
import { createBody, type Body } from '../composition/body';
import { composeBodies } from '../composition/compose-bodies';
import { placeSolid } from '../composition/place-solid';
import { EngineInputError } from '../part/engine-input-error';
import type { PartMassProperties, PlacedPiece } from '../part/part-mass-properties';
import { solidFromDimensions } from '../part/primitive-dimensions';
import { createSolid, type Solid } from '../primitives/solid';
import { principalOfPart } from '../report/analyze-part';
import { createPrincipalAxes, type PrincipalAxes } from '../principal/principal-axes';
import {
  domainProblem,
  followsParameter,
  parameterDomain,
  parameterSlot,
  relationProblem,
  resolveNamedParameter,
  resolveParameter,
  parameterValue,
  type ParameterDomain,
  type ParameterSlot,
} from './design-parameters';

/**
 * One free parameter as the caller names it: a primitive's field (`primitive` and `parameter`) or a
 * named parameter of the part (`param`), as in design-targets.ts.
 */
export interface ParameterRef {
  primitive?: string;
  parameter?: DesignParameter;
  param?: string;
}

/** One field a free parameter sets: field = scale × value + offset (a primitive's own field: scale 1, offset 0). */
export interface ParameterTarget {
  /** Index into `changing`. */
  changed: number;
  primitive: string;
  field: DesignParameter;
  slot: ParameterSlot;
  domain: ParameterDomain;
  scale: number;
  offset: number;
}

/** A free parameter resolved to the pieces it moves. */
export interface BoundParameter {
  ref: ParameterRef;
  /** The named parameter's name, or undefined for a primitive's field. */
  name?: string;
  /** The fields it sets: one for a primitive's field, every field that refers to a named parameter. */
  targets: ParameterTarget[];
}

/** A piece whose body is recomputed at every evaluation. */
interface ChangingPiece {
  piece: PlacedPiece;
  primitive: Primitive;
  dims: number[];
  position: [number, number, number];
  /** Stated density (kg/m³), the resolved material's, or NaN when the document gives the mass. */
  density: number;
  /** Stated mass (kg) for a point mass or a primitive given by its mass, else NaN. */
  mass: number;
  body: Body;
}

/**
 * A part reduced to its free parameters, for the goal seek's and the sweep's hot loops: the pieces
 * no parameter touches are composed once; an evaluation recomputes only the changed pieces' bodies
 * (the closed forms of MECHANICS §1 at unit density, placed by placeSolid) and composes them with that fixed sum
 * (parallel-axis theorem, composeBodies). It mirrors what partMassProperties gives for the document
 * writeDesignParameter (or writeNamedParameter) writes, including the document's semantics: a
 * primitive given by its mass keeps that mass when its dimensions change (its density follows). A
 * named parameter is one free value that sets every field referring to it, so every piece with such
 * a field is a changing piece.
 */
export class DesignModel {
  readonly parameters: BoundParameter[] = [];
  /** The document's values of the free parameters (SI). */
  readonly start: Float64Array;
  /** Composite body of the last valid evaluation (part frame, SI). */
  readonly body = createBody();
  /** Principal axes of the last valid evaluation. */
  readonly principal: PrincipalAxes = createPrincipalAxes();
  private readonly changing: ChangingPiece[] = [];
  private readonly bodies: Body[];
  private readonly solid: Solid = createSolid();
  private readonly massProperties: PartMassProperties;
  /** Per changing piece: density and mass of the evaluation under way. */
  private readonly scratch: { density: Float64Array; mass: Float64Array };

  /**
   * Resolves `refs` on the document (EngineInputError naming `<where(i)>.primitive` or `.parameter`
   * for an unknown primitive, a field it lacks or a field that follows a named parameter, and
   * `<where(i)>.param` for an unknown named parameter or one no field refers to). A named parameter
   * moves every piece that refers to it. `mp` is partMassProperties(doc, …).
   */
  constructor(
    readonly doc: PartDocument,
    mp: PartMassProperties,
    refs: readonly ParameterRef[],
    where: (i: number) => string,
    private readonly equalMoments: number,
  ) {
    const changedIndex = new Map<number, number>();
    const changingOf = (index: number): number => {
      let c = changedIndex.get(index);
      if (c === undefined) {
        c = this.changing.length;
        changedIndex.set(index, c);
        const piece = mp.pieces[index];
        const primitive = doc.primitives[index];
        const given = primitive.shape === 'point' || primitive.mass !== undefined;
        this.changing.push({
          piece,
          primitive,
          dims: [...piece.dimensions],
          position: [primitive.position[0], primitive.position[1], primitive.position[2]],
          density: given ? Number.NaN : piece.density,
          mass: given ? primitive.mass! : Number.NaN,
          body: createBody(),
        });
      }
      return c;
    };
    const start: number[] = [];
    refs.forEach((ref, i) => {
      if (ref.param !== undefined) {
        const { value, uses } = resolveNamedParameter(doc, ref.param, where(i));
        const targets = uses.map((use): ParameterTarget => {
          const slot = parameterSlot(use.primitive, use.field);
          if (typeof slot === 'string') throw new EngineInputError('invalid', [{ path: `${where(i)}.param`, message: slot }]);
          return {
            changed: changingOf(use.index),
            primitive: use.primitive.id,
            field: use.field,
            slot,
            domain: parameterDomain(use.primitive, use.field, true),
            scale: use.ref.scale,
            offset: use.ref.offset,
          };
        });
        this.parameters.push({ ref, name: ref.param, targets });
        start.push(value);
        return;
      }
      const { index, primitive, slot } = resolveParameter(doc, ref.primitive ?? '', ref.parameter!, where(i));
      const followed = followsParameter(primitive, ref.parameter!);
      if (followed) throw new EngineInputError('invalid', [{ path: `${where(i)}.parameter`, message: followed }]);
      const target: ParameterTarget = {
        changed: changingOf(index),
        primitive: primitive.id,
        field: ref.parameter!,
        slot,
        domain: parameterDomain(primitive, ref.parameter!),
        scale: 1,
        offset: 0,
      };
      this.parameters.push({ ref, targets: [target] });
      start.push(parameterValue(primitive, ref.parameter!));
    });
    this.start = Float64Array.from(start);
    const fixed = mp.pieces.filter((p) => !changedIndex.has(p.index)).map((p) => p.body);
    // Compose the fixed pieces once when their net mass is well away from zero; otherwise keep them apart.
    const net = fixed.reduce((s, b) => s + b.mass, 0),
      gross = fixed.reduce((s, b) => s + Math.abs(b.mass), 0);
    const fixedBodies = fixed.length > 1 && Math.abs(net) > 1e-6 * gross ? [composeBodies(createBody(), fixed)] : fixed;
    this.bodies = [...fixedBodies, ...this.changing.map((c) => c.body)];
    this.massProperties = { body: this.body, pieces: mp.pieces, hasMesh: mp.hasMesh };
    this.scratch = { density: new Float64Array(this.changing.length), mass: new Float64Array(this.changing.length) };
  }

  /** The document's dimensions (DIMENSION_NAMES order) of the free primitive `id`. */
  pieceDimensions(id: string): readonly number[] {
    const c = this.changing.find((x) => x.primitive.id === id);
    if (!c) throw new Error(`DesignModel: ${id} has no free parameter`);
    return c.piece.dimensions;
  }

  /**
   * Sets the free parameters to `values` (SI, in the order of the refs) and recomputes the part;
   * returns null when it is valid (body and principal axes updated), else a short reason: a value
   * outside its field's rule, a broken relation (inner radius ≥ radius, …), removals that leave no
   * mass, or no rotational inertia / a broken triangle inequality (principalOfPart's refusals).
   */
  evaluate(values: ArrayLike<number>): string | null {
    for (const c of this.changing) {
      for (let s = 0; s < c.dims.length; s++) c.dims[s] = c.piece.dimensions[s];
      c.position[0] = c.primitive.position[0];
      c.position[1] = c.primitive.position[1];
      c.position[2] = c.primitive.position[2];
    }
    const scratch = this.scratch;
    for (let i = 0; i < this.changing.length; i++) {
      scratch.density[i] = this.changing[i].density;
      scratch.mass[i] = this.changing[i].mass;
    }
    for (let i = 0; i < this.parameters.length; i++) {
      const q = this.parameters[i],
        x = values[i];
      for (const t of q.targets) {
        const v = t.scale * x + t.offset;
        const bad = domainProblem(t.domain, v);
        if (bad) return q.name === undefined ? `${t.primitive}: ${t.field} ${bad}` : `${t.primitive}: ${t.field} ${bad} (${q.name} = ${x})`;
        const c = this.changing[t.changed];
        switch (t.slot.kind) {
          case 'mass':
            scratch.mass[t.changed] = v;
            break;
          case 'density':
            scratch.density[t.changed] = v;
            break;
          case 'position':
            c.position[t.slot.axis] = v;
            break;
          case 'dimension':
            c.dims[t.slot.slot] = v;
            break;
        }
      }
    }
    for (let i = 0; i < this.changing.length; i++) {
      const c = this.changing[i],
        p = c.primitive,
        b = c.body,
        sign = c.piece.sign;
      if (p.shape === 'point') {
        b.mass = sign * scratch.mass[i];
        b.volume = 0;
        b.center[0] = c.position[0];
        b.center[1] = c.position[1];
        b.center[2] = c.position[2];
        b.inertia.fill(0);
        continue;
      }
      let solid: Solid;
      if (p.shape === 'mesh') solid = c.piece.solid;
      else {
        const relation = relationProblem(p.shape, c.dims);
        if (relation) return `${p.id}: ${relation}`;
        solid = solidFromDimensions(this.solid, p.shape, c.dims);
      }
      const density = Number.isNaN(scratch.mass[i]) ? scratch.density[i] : scratch.mass[i] / solid.volume;
      placeSolid(b, solid, sign * density, c.piece.rotation, c.position);
    }
    composeBodies(this.body, this.bodies);
    if (!(this.body.mass > 0)) return 'removals leave no mass: a removal is larger than what it cuts';
    try {
      principalOfPart(this.doc, this.massProperties, this.equalMoments, this.principal);
    } catch (e) {
      if (e instanceof EngineInputError) return e.issues[0]?.message ?? e.message;
      throw e;
    }
    for (let i = 0; i < 9; i++)
      if (!Number.isFinite(this.body.inertia[i])) return 'the part gives a non-finite inertia; check its dimensions and densities';
    return null;
  }
}
