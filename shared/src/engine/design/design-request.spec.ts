import { solveRequestSchema, sweepRequestSchema, type DesignFigure } from '../../schemas/design-targets';
import { formatJsonPath } from '../../schemas/json-path';
import type { PartDocument, PartDocumentInput } from '../../schemas/part-document';
import { EngineInputError } from '../part/engine-input-error';
import { partMassProperties } from '../part/part-mass-properties';
import { validatePartDocument } from '../part/validate-part-document';
import { analyzeValidatedPart } from '../report/analyze-part';
import { SeededRandom } from '../scatter/seeded-random';
import { expectRelClose } from '../testing/expect-close';
import { designFigures, figureContext, figuresFromBody } from './design-figures';
import { DesignModel } from './design-model';
import { designParametersOf, readDesignParameter, writeDesignParameter } from './design-parameters';
import { goalSeek, type GoalSeekRequest } from './goal-seek';

function valid(doc: PartDocumentInput): PartDocument {
  const v = validatePartDocument(doc);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

// An invented bat-like part: a tapered barrel, a knob, a bored handle given by its mass, a removal and a material.
const partInput: PartDocumentInput = {
  name: 'Kestrel Bay fungo',
  primitives: [
    { id: 'knob', shape: 'cylinder', radius: 0.022, length: 0.012, position: [0, 0, 0.006], density: 700 },
    { id: 'handle', shape: 'cylinder', radius: 0.013, innerRadius: 0.004, length: 0.4, position: [0, 0, 0.212], mass: 0.18 },
    {
      id: 'barrel',
      shape: 'cone',
      radius: 0.033,
      topRadius: 0.014,
      length: 0.45,
      position: [0, 0, 0.637],
      rotationDeg: [180, 0, 0],
      materialId: 'ash',
    },
    { id: 'cup', shape: 'sphere', radius: 0.012, position: [0, 0, 0.85], density: 700, mode: 'remove' },
    { id: 'weight', shape: 'point', mass: 0.02, position: [0.001, 0, 0.7] },
    {
      id: 'plate',
      shape: 'box',
      size: [0.01, 0.03, 0.05],
      wall: 0.002,
      position: [0, 0.02, 0.5],
      rotationDeg: [10, 20, 30],
      density: 2700,
    },
    { id: 'ring', shape: 'torus', majorRadius: 0.02, minorRadius: 0.004, position: [0, 0, 0.3], density: 1100 },
  ],
  spin: { axis: [0, 1, 0], rate: 20 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};
const doc = valid(partInput);
const resolvers = { resolveMaterial: (id: string) => (id === 'ash' ? { density: 670 } : undefined) };

function thrown(fn: () => unknown): EngineInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EngineInputError) return e;
    throw e;
  }
  throw new Error('expected an EngineInputError');
}

describe('design parameters', () => {
  it('read and write a field by its document name; writing copies, never mutates', () => {
    const frozen = JSON.stringify(doc);
    const next = writeDesignParameter(doc, 'plate', 'size.1', 0.04);
    expect(readDesignParameter(next, 'plate', 'size.1')).toBe(0.04);
    expect(readDesignParameter(doc, 'plate', 'size.1')).toBe(0.03);
    expect(JSON.stringify(doc)).toBe(frozen);
    expect(next.primitives[0]).toBe(doc.primitives[0]); // untouched primitives are shared
    expect(readDesignParameter(doc, 'barrel', 'topRadius')).toBe(0.014);
    expect(readDesignParameter(doc, 'weight', 'position.0')).toBe(0.001);
    // An absent bore reads 0 (the solid cylinder); writing 0 removes it again.
    expect(readDesignParameter(doc, 'knob', 'innerRadius')).toBe(0);
    const bored = writeDesignParameter(doc, 'knob', 'innerRadius', 0.005);
    expect(writeDesignParameter(bored, 'knob', 'innerRadius', 0).primitives[0]).not.toHaveProperty('innerRadius');
  });

  it('lists what each primitive has: its mass or density, position and its own dimensions', () => {
    expect(designParametersOf(doc.primitives[1])).toEqual([
      'mass',
      'radius',
      'innerRadius',
      'length',
      'position.0',
      'position.1',
      'position.2',
    ]);
    expect(designParametersOf(doc.primitives[2])).toEqual(['radius', 'length', 'topRadius', 'position.0', 'position.1', 'position.2']);
    expect(designParametersOf(doc.primitives[4])).toEqual(['mass', 'position.0', 'position.1', 'position.2']);
    expect(designParametersOf(doc.primitives[5])).toEqual([
      'density',
      'wall',
      'position.0',
      'position.1',
      'position.2',
      'size.0',
      'size.1',
      'size.2',
    ]);
  });

  it('refuses a field the primitive lacks, a density set by a material, and a value breaking a rule, naming the path', () => {
    expect(thrown(() => readDesignParameter(doc, 'plate', 'radius', 'free[1]')).path).toBe('free[1].parameter');
    const material = thrown(() => readDesignParameter(doc, 'barrel', 'density', 'free[0]'));
    expect(material.path).toBe('free[0].parameter');
    expect(material.message).toMatch(/material ash/);
    expect(thrown(() => readDesignParameter(doc, 'knob', 'mass', 'free[0]')).path).toBe('free[0].parameter');
    expect(thrown(() => readDesignParameter(doc, 'nope', 'mass', 'free[2]')).path).toBe('free[2].primitive');
    expect(thrown(() => writeDesignParameter(doc, 'handle', 'innerRadius', 0.02, 'x')).message).toMatch(
      /innerRadius must be less than radius/,
    );
    expect(thrown(() => writeDesignParameter(doc, 'ring', 'minorRadius', -1, 'x')).path).toBe('x.value');
    const solidBox = valid({
      primitives: [{ id: 'b', shape: 'box', size: [0.1, 0.1, 0.1], density: 100 }],
      spin: { axis: [0, 0, 1], rate: 1 },
    });
    expect(thrown(() => readDesignParameter(solidBox, 'b', 'wall')).message).toMatch(/without a wall/);
  });
});

describe("the design model (fast path) against the engine's full analysis of the written document", () => {
  it('gives the same figures as partMassProperties + tradeFigures + classifySpin at seeded random points', () => {
    // The full analysis is itself checked against the handbook formulas in report/analyze-part.spec.ts.
    const refs = [
      { primitive: 'handle', parameter: 'mass' as const },
      { primitive: 'handle', parameter: 'radius' as const },
      { primitive: 'barrel', parameter: 'topRadius' as const },
      { primitive: 'weight', parameter: 'position.2' as const },
      { primitive: 'plate', parameter: 'size.2' as const },
      { primitive: 'plate', parameter: 'density' as const },
      { primitive: 'ring', parameter: 'minorRadius' as const },
      { primitive: 'cup', parameter: 'radius' as const },
    ];
    const ranges = [
      [0.1, 0.3],
      [0.01, 0.02],
      [0, 0.03],
      [0.3, 0.8],
      [0.03, 0.08],
      [1000, 8000],
      [0.002, 0.01],
      [0.005, 0.014],
    ];
    const mp = partMassProperties(doc, resolvers);
    const model = new DesignModel(doc, mp, refs, (i) => `free[${i}]`, 1e-9);
    const rng = new SeededRandom(11);
    const ctx = figureContext(doc, mp, {});
    const names: DesignFigure[] = [
      'mass',
      'balancePoint',
      'swingweight',
      'twistweight',
      'pivotMoment',
      'centreOfPercussion',
      'steadyMargin',
      'I1',
      'I2',
      'I3',
    ];
    for (let trial = 0; trial < 25; trial++) {
      const x = ranges.map(([lo, hi]) => lo + rng.uniform() * (hi - lo));
      expect(model.evaluate(x)).toBeNull();
      let written = doc;
      refs.forEach((r, i) => (written = writeDesignParameter(written, r.primitive, r.parameter, x[i])));
      const full = designFigures(written, names, resolvers);
      const fast = new Float64Array(names.length);
      figuresFromBody(model.body, model.principal, ctx, names, fast);
      names.forEach((name, k) => expectRelClose(fast[k], full[name]!, 1e-11, `${name} at trial ${trial}`));
      // designFigures reads the same quantities the spin report prints.
      const report = analyzeValidatedPart(written, resolvers);
      expectRelClose(full.mass!, report.mass, 1e-14, 'mass');
      expectRelClose(full.I2!, report.principal.moments[1], 1e-14, 'I2');
      expectRelClose(full.swingweight!, report.trade.swingweight!, 1e-14, 'swingweight');
      expectRelClose(full.centreOfPercussion!, report.trade.pivot!.centreOfPercussion!, 1e-14, 'centre of percussion');
    }
  });
});

describe('goal seek request validation', () => {
  const base: GoalSeekRequest = {
    free: [{ primitive: 'weight', parameter: 'mass', min: 0.001, max: 0.05 }],
    targets: [{ figure: 'swingweight', value: 0.2 }],
  };
  const seek = (request: unknown, part = doc) => thrown(() => goalSeek(part, request as GoalSeekRequest, resolvers));

  it('names the field of each problem', () => {
    expect(seek({ ...base, free: [{ primitive: 'weight', parameter: 'mass', min: 0.05, max: 0.05 }] }).path).toBe('free[0].max');
    expect(seek({ ...base, free: [{ primitive: 'lid', parameter: 'mass', min: 0.001, max: 0.05 }] }).path).toBe('free[0].primitive');
    expect(seek({ ...base, free: [{ primitive: 'plate', parameter: 'radius', min: 0.001, max: 0.05 }] }).path).toBe('free[0].parameter');
    expect(seek({ ...base, free: [{ primitive: 'weight', parameter: 'colour', min: 0, max: 1 }] }).path).toBe('free[0].parameter');
    expect(seek({ ...base, targets: [{ figure: 'spinniness', value: 1 }] }).path).toBe('targets[0].figure');
    expect(seek({ ...base, targets: [{ figure: 'mass' }] }).path).toBe('targets[0].value');
    expect(seek({ ...base, targets: [{ figure: 'mass', value: 1, max: 2 }] }).message).toMatch(/either value or min and\/or max/);
    expect(seek({ ...base, free: [{ primitive: 'ring', parameter: 'minorRadius', min: -0.01, max: 0.01 }] }).path).toBe('free[0].min');
    const dup = seek({ ...base, free: [base.free[0], { ...base.free[0], min: 0.002 }] });
    expect(dup.path).toBe('free[1]');
    expect(dup.message).toMatch(/repeats free\[0\]/);
    const nine = Array.from({ length: 9 }, (_, i) => ({
      primitive: 'weight',
      parameter: i < 3 ? `position.${i}` : 'mass',
      min: 0,
      max: 1,
    }));
    expect(seek({ ...base, free: nine }).path).toBe('free');
    expect(seek({ ...base, targets: Array.from({ length: 13 }, () => ({ figure: 'mass', min: 0 })) }).path).toBe('targets');
  });

  it('a grip-frame figure on a part without grip names the target', () => {
    const { grip: _grip, ...rest } = partInput;
    const e = seek(base, valid(rest));
    expect(e.path).toBe('targets[0].figure');
    expect(e.message).toMatch(/grip/);
  });

  it('the request body schemas give the same paths and messages', () => {
    const issues = (schema: typeof solveRequestSchema | typeof sweepRequestSchema, body: unknown) => {
      const r = schema.safeParse(body);
      return r.success ? [] : r.error.issues.map((i) => `${formatJsonPath(i.path)}: ${i.message}`);
    };
    expect(issues(solveRequestSchema, { part: partInput, ...base })).toEqual([]);
    expect(
      issues(solveRequestSchema, {
        part: partInput,
        free: [{ primitive: 'weight', parameter: 'mass', min: 1, max: 0 }],
        targets: base.targets,
      }),
    ).toEqual(['free[0].max: must be greater than min']);
    expect(issues(solveRequestSchema, { part: partInput, free: base.free, targets: [{ figure: 'mass', min: 2, max: 1 }] })).toEqual([
      'targets[0].max: must be at least min',
    ]);
    expect(issues(solveRequestSchema, { part: partInput, ...base, extra: 1 })).toHaveLength(1);
    expect(issues(solveRequestSchema, { part: { ...partInput, primitives: [] }, ...base })[0]).toMatch(/^part\.primitives: /);
    const axis = { primitive: 'weight', parameter: 'mass', from: 0.01, to: 0.02, steps: 5 };
    expect(issues(sweepRequestSchema, { part: partInput, axes: [axis], figures: ['mass', 'I1'] })).toEqual([]);
    expect(issues(sweepRequestSchema, { part: partInput, axes: [axis, axis], figures: ['mass'] })).toEqual([
      'axes[1]: repeats axes[0] (the same parameter of the same primitive)',
    ]);
    expect(issues(sweepRequestSchema, { part: partInput, axes: [axis], figures: ['mass', 'mass'] })).toEqual([
      'figures[1]: repeats figures[0]',
    ]);
    expect(issues(sweepRequestSchema, { part: partInput, axes: [{ ...axis, to: 0.01 }], figures: ['mass'] })).toEqual([
      'axes[0].to: must differ from from',
    ]);
    expect(issues(sweepRequestSchema, { part: partInput, axes: [], figures: ['mass'] })).toEqual(['axes: must hold one or two axes']);
  });
});
