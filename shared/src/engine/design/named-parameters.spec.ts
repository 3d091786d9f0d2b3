import type { PartDocument, PartDocumentInput } from '../../schemas/part-document';
import { EngineInputError } from '../part/engine-input-error';
import { partMassProperties } from '../part/part-mass-properties';
import { validatePartDocument } from '../part/validate-part-document';
import { analyzeValidatedPart } from '../report/analyze-part';
import { SeededRandom } from '../scatter/seeded-random';
import { expectRelClose } from '../testing/expect-close';
import { designFigures, figureContext, figuresFromBody } from './design-figures';
import { DesignModel } from './design-model';
import { withNamedParameter, writeDesignParameter, writeNamedParameter } from './design-parameters';
import { solveDesignRequest, sweepDesignRequest } from './design-requests';
import { goalSeek, type GoalSeekRequest } from './goal-seek';
import { sweepDesign } from './sweep';

// References: Machinery's Handbook, "Volumes of solids" (rectangular prism V = a·b·c) and
// "Moments of inertia" (rectangular prism about its central axis parallel to c: m·(a² + b²)/12);
// the parallel-axis theorem (I = I_c + m·d²).

function valid(doc: PartDocumentInput): PartDocument {
  const v = validatePartDocument(doc);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

function thrown(fn: () => unknown): EngineInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EngineInputError) return e;
    throw e;
  }
  throw new Error('expected an EngineInputError');
}

const RHO = 2700;
const A = [0.02, 0.04],
  B = [0.03, 0.01],
  X = [-0.1, 0.1];
// Two invented bars of a Kestrel Bay practice frame, along z at x = ±0.1, whose length is one parameter;
// a third primitive (a point mass) that no parameter touches.
const frame = valid({
  name: 'Kestrel Bay frame',
  parameters: { barLength: 0.3, unused: 1 },
  primitives: [
    { id: 'left', shape: 'box', size: [A[0], B[0], { param: 'barLength' }], density: RHO, position: [X[0], 0, 0] },
    { id: 'right', shape: 'box', size: [A[1], B[1], { param: 'barLength' }], density: RHO, position: [X[1], 0, 0] },
    { id: 'tag', shape: 'point', mass: 0.004, position: [0, 0, 0] },
  ],
  spin: { axis: [0, 0, 1], rate: 20 },
});
const TAG = 0.004;
/** m = ρ·a·b·L per bar (Machinery's Handbook), plus the tag. */
const massAt = (L: number) => RHO * (A[0] * B[0] + A[1] * B[1]) * L + TAG;

/** Principal moments (descending) of the frame at length L: the bars' central moments plus m·d² (parallel-axis theorem); no products of inertia by symmetry. */
function momentsAt(L: number): number[] {
  const m = [RHO * A[0] * B[0] * L, RHO * A[1] * B[1] * L];
  const total = m[0] + m[1] + TAG;
  const xBar = (m[0] * X[0] + m[1] * X[1]) / total;
  const d2 = m[0] * (X[0] - xBar) ** 2 + m[1] * (X[1] - xBar) ** 2 + TAG * xBar ** 2;
  const ixx = (m[0] * (B[0] ** 2 + L * L)) / 12 + (m[1] * (B[1] ** 2 + L * L)) / 12;
  const iyy = (m[0] * (A[0] ** 2 + L * L)) / 12 + (m[1] * (A[1] ** 2 + L * L)) / 12 + d2;
  const izz = (m[0] * (A[0] ** 2 + B[0] ** 2)) / 12 + (m[1] * (A[1] ** 2 + B[1] ** 2)) / 12 + d2;
  return [ixx, iyy, izz].sort((p, q) => q - p);
}

describe('goal seek on a named parameter', () => {
  it('recovers the shared length that gives a target mass: L = (m − m_tag) / (ρ·(a₁b₁ + a₂b₂))', () => {
    const target = 0.05;
    const L = (target - TAG) / (RHO * (A[0] * B[0] + A[1] * B[1])); // hand solution of the one linear equation
    const r = goalSeek(frame, { free: [{ param: 'barLength', min: 0.01, max: 0.5 }], targets: [{ figure: 'mass', value: target }] });
    expect(r.status).toBe('met');
    expect(r.changes).toHaveLength(1);
    expect(r.changes[0].primitive).toBeUndefined();
    expect(r.changes[0].parameter).toBe('barLength');
    expect(r.changes[0].from).toBe(0.3);
    expectRelClose(r.changes[0].to, L, 1e-4, 'barLength');
    expect(r.part.parameters?.barLength).toBe(r.changes[0].to);
    expect(r.part.parameters?.unused).toBe(1);
    // Both bars moved together, and the answer part still records the references.
    for (const p of r.part.primitives.slice(0, 2)) {
      if (p.shape !== 'box') throw new Error('expected a bar');
      expect(p.size[2]).toBe(r.changes[0].to);
      expect(p.refs?.['size.2']?.param).toBe('barLength');
    }
    expectRelClose(r.report.mass, target, 1e-3, 'answer mass');
    // Sent back (it is what a client saves), it validates to itself.
    expect(valid(JSON.parse(JSON.stringify(r.part)) as PartDocumentInput)).toEqual(r.part);
  });

  it('follows scale and offset: the right bar is 0.5·L + 0.02 long, so m = ρ·(A₁·L + A₂·(0.5·L + 0.02)) + m_tag', () => {
    const scaled = valid({
      parameters: { barLength: 0.3 },
      primitives: [
        { id: 'left', shape: 'box', size: [A[0], B[0], { param: 'barLength' }], density: RHO, position: [X[0], 0, 0] },
        {
          id: 'right',
          shape: 'box',
          size: [A[1], B[1], { param: 'barLength', scale: 0.5, offset: 0.02 }],
          density: RHO,
          position: [X[1], 0, 0],
        },
        { id: 'tag', shape: 'point', mass: TAG, position: [0, 0, 0] },
      ],
      spin: { axis: [0, 0, 1], rate: 20 },
    });
    const target = 0.1;
    const a1 = A[0] * B[0],
      a2 = A[1] * B[1];
    const L = ((target - TAG) / RHO - 0.02 * a2) / (a1 + 0.5 * a2);
    const r = goalSeek(scaled, { free: [{ param: 'barLength', min: 0.01, max: 0.5 }], targets: [{ figure: 'mass', value: target }] });
    expect(r.status).toBe('met');
    expectRelClose(r.changes[0].to, L, 1e-4, 'barLength');
    const right = r.part.primitives[1];
    if (right.shape !== 'box') throw new Error('expected a bar');
    expectRelClose(right.size[2], 0.5 * r.changes[0].to + 0.02, 1e-12, 'right bar length');
  });

  it('names the request path of each problem', () => {
    const base: GoalSeekRequest = { free: [{ param: 'barLength', min: 0.01, max: 0.5 }], targets: [{ figure: 'mass', value: 0.05 }] };
    const seek = (free: unknown) => thrown(() => goalSeek(frame, { ...base, free } as GoalSeekRequest));
    const unknown = seek([{ param: 'hoopRadius', min: 0, max: 1 }]);
    expect(unknown.path).toBe('free[0].param');
    expect(unknown.issues[0].message).toBe('is not a parameter of this part (its parameters: barLength, unused)');
    expect(seek([{ param: 'unused', min: 0, max: 2 }]).issues[0].message).toMatch(/not referred to by any primitive field/);
    const direct = seek([{ primitive: 'left', parameter: 'size.2', min: 0.01, max: 0.5 }]);
    expect(direct.path).toBe('free[0].parameter');
    expect(direct.message).toMatch(/follows the parameter "barLength"/);
    const bound = seek([{ param: 'barLength', min: -0.1, max: 0.5 }]);
    expect(bound.path).toBe('free[0].min');
    expect(bound.issues[0].message).toBe('makes size.2 of left -0.1, which must be greater than zero');
    expect(seek([{ param: 'barLength', primitive: 'left', min: 0.01, max: 0.5 }]).path).toBe('free[0].primitive');
    expect(seek([{ min: 0.01, max: 0.5 }]).issues.map((i) => i.path)).toEqual(['free[0].primitive', 'free[0].parameter']);
    expect(seek([{ param: '2x', min: 0.01, max: 0.5 }]).path).toBe('free[0].param');
    const twice = seek([base.free[0], { param: 'barLength', min: 0.02, max: 0.4 }]);
    expect(twice.path).toBe('free[1]');
    expect(twice.message).toMatch(/the same named parameter/);
    // Through the request bodies: the part's own reference problems keep their paths under part.
    const part = { ...frame, parameters: { length: 0.3 } };
    const body = { part, free: base.free, targets: base.targets };
    expect(thrown(() => solveDesignRequest(body)).issues.map((i) => [i.path, i.message])).toEqual([
      ['part.primitives[0].size[2]', 'refers to an unknown parameter "barLength"'],
      ['part.primitives[1].size[2]', 'refers to an unknown parameter "barLength"'],
    ]);
    const sweepBody = { part: frame, axes: [{ param: 'barLength', parameter: 'size.2', from: 0.1, to: 0.2, steps: 2 }], figures: ['mass'] };
    expect(thrown(() => sweepDesignRequest(sweepBody)).path).toBe('axes[0].parameter');
    // The direct write of a field that follows a parameter is refused the same way.
    expect(thrown(() => writeDesignParameter(frame, 'right', 'size.2', 0.2, 'x')).path).toBe('x.parameter');
    expect(thrown(() => writeNamedParameter(frame, 'barLength', 0, 'x')).path).toBe('x.value');
  });
});

describe('sweep over a named parameter', () => {
  it('moves both bars at every point: mass and principal moments against the handbook formulas', () => {
    const s = sweepDesign(frame, { axes: [{ param: 'barLength', from: 0.1, to: 0.5, steps: 5 }], figures: ['mass', 'I1', 'I2', 'I3'] });
    expect(s.axes).toEqual([{ parameter: 'barLength', values: [0.1, 0.2, 0.30000000000000004, 0.4, 0.5] }]);
    for (const p of s.points) {
      const L = p.values[0];
      expectRelClose(p.figures.mass!, massAt(L), 1e-12, `mass at L = ${L}`);
      const I = momentsAt(L);
      expectRelClose(p.figures.I1!, I[0], 1e-10, `I1 at L = ${L}`);
      expectRelClose(p.figures.I2!, I[1], 1e-10, `I2 at L = ${L}`);
      expectRelClose(p.figures.I3!, I[2], 1e-10, `I3 at L = ${L}`);
    }
  });

  it('steps a named parameter beside a primitive’s own field, and marks the values that make no valid part', () => {
    const s = sweepDesign(frame, {
      axes: [
        { param: 'barLength', from: -0.1, to: 0.2, steps: 4 },
        { primitive: 'left', parameter: 'density', from: 1000, to: 3000, steps: 3 },
      ],
      figures: ['mass'],
    });
    expect(s.axes.map((a) => [a.primitive, a.parameter])).toEqual([
      [undefined, 'barLength'],
      ['left', 'density'],
    ]);
    expect(s.points).toHaveLength(12);
    for (const p of s.points) {
      const [L, rho1] = p.values;
      if (L <= 0) {
        expect(p.figures.mass).toBeNull();
        expect(p.error).toMatch(/^left: size\.2 must be greater than zero \(barLength = /);
      } else expectRelClose(p.figures.mass!, (rho1 * A[0] * B[0] + RHO * A[1] * B[1]) * L + TAG, 1e-12, `mass at ${L}, ${rho1}`);
    }
  });
});

describe('the design model with a named parameter against the full analysis of the written document', () => {
  it('gives the same figures as designFigures of withNamedParameter at seeded points', () => {
    // A hoop of radius 2·r + 0.01 on a handle whose position follows r; the full analysis is itself
    // checked against the handbook formulas in report/analyze-part.spec.ts.
    const doc = valid({
      parameters: { r: 0.1 },
      primitives: [
        { id: 'handle', shape: 'cylinder', radius: 0.012, length: 0.3, density: 700, position: [0, 0, 0.15] },
        {
          id: 'hoop',
          shape: 'torus',
          majorRadius: { param: 'r', scale: 2, offset: 0.01 },
          minorRadius: 0.008,
          density: 1200,
          position: [0, 0, { param: 'r', scale: 2, offset: 0.31 }],
          rotationDeg: [90, 0, 0],
        },
        { id: 'cap', shape: 'sphere', radius: { param: 'r', scale: 0.1 }, mass: 0.01, position: [0, 0, 0] },
      ],
      spin: { axis: [0, 1, 0], rate: 20 },
      grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
    });
    const mp = partMassProperties(doc);
    const model = new DesignModel(doc, mp, [{ param: 'r' }, { primitive: 'handle', parameter: 'length' }], (i) => `free[${i}]`, 1e-9);
    expect(model.parameters[0].targets.map((t) => `${t.primitive}.${t.field}`)).toEqual([
      'hoop.majorRadius',
      'hoop.position.2',
      'cap.radius',
    ]);
    const ctx = figureContext(doc, mp, {});
    const names = ['mass', 'balancePoint', 'swingweight', 'twistweight', 'I1', 'I2', 'I3'] as const;
    const rng = new SeededRandom(5);
    for (let trial = 0; trial < 10; trial++) {
      const x = [0.05 + rng.uniform() * 0.1, 0.2 + rng.uniform() * 0.2];
      expect(model.evaluate(x)).toBeNull();
      const written = writeDesignParameter(withNamedParameter(doc, 'r', x[0]), 'handle', 'length', x[1]);
      const full = designFigures(written, [...names]);
      const fast = new Float64Array(names.length);
      figuresFromBody(model.body, model.principal, ctx, [...names], fast);
      names.forEach((name, k) => expectRelClose(fast[k], full[name]!, 1e-11, `${name} at trial ${trial}`));
      expectRelClose(full.mass!, analyzeValidatedPart(written).mass, 1e-14, 'mass');
    }
  });
});
