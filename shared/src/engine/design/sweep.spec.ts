import type { PartDocument, PartDocumentInput } from '../../schemas/part-document';
import { EngineInputError } from '../part/engine-input-error';
import { validatePartDocument } from '../part/validate-part-document';
import { expectRelClose } from '../testing/expect-close';
import { sweepDesign } from './sweep';

function valid(doc: PartDocumentInput): PartDocument {
  const v = validatePartDocument(doc);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

// A box a × b × c (edges along x, y, z) spun about x. Machinery's Handbook rectangular prism: Ixx = m(b² + c²)/12,
// Iyy = m(a² + c²)/12, Izz = m(a² + b²)/12. With c < a, Ixx < Izz for every b, so x is the minor axis while b < a and the
// intermediate one once b > a (the crossing Ixx = Iyy at b = a, MECHANICS §9); Ixx = Izz would need c = a, out of range.
const a = 0.1,
  c = 0.05,
  rho = 800;
const block = valid({
  name: 'Kestrel Bay test block',
  primitives: [{ id: 'block', shape: 'box', size: [a, 0.08, c], density: rho }],
  spin: { axis: [1, 0, 0], rate: 10 },
});

describe('sweepDesign', () => {
  it('the verdict changes role exactly between the two grid points around b = a, and the moments follow the handbook formulas', () => {
    const from = 0.06,
      to = 0.14,
      steps = 10;
    const s = sweepDesign(block, {
      axes: [{ primitive: 'block', parameter: 'size.1', from, to, steps }],
      figures: ['I1', 'I2', 'I3', 'mass', 'steadyMargin'],
    });
    expect(s.points).toHaveLength(steps);
    const below = Math.floor(((a - from) / (to - from)) * (steps - 1)); // last grid index with b < a
    expect(s.points[below].values[0]).toBeLessThan(a);
    expect(s.points[below + 1].values[0]).toBeGreaterThan(a);
    s.points.forEach((p, k) => {
      const b = p.values[0];
      expect(p.nearestAxis).toBe(k <= below ? 'minor' : 'intermediate');
      if (k > below) expect(p.verdict).toBe('flip-prone');
      else expect(p.verdict).not.toBe('flip-prone');
      expect(Math.sign(p.figures.steadyMargin!)).toBe(k <= below ? 1 : -1);
      const m = rho * a * b * c;
      const I = [(m * (b * b + c * c)) / 12, (m * (a * a + c * c)) / 12, (m * (a * a + b * b)) / 12].sort((x, y) => y - x);
      expectRelClose(p.figures.mass!, m, 1e-12, `mass at b = ${b}`);
      expectRelClose(p.figures.I1!, I[0], 1e-12, `I1 at b = ${b}`);
      expectRelClose(p.figures.I2!, I[1], 1e-12, `I2 at b = ${b}`);
      expectRelClose(p.figures.I3!, I[2], 1e-12, `I3 at b = ${b}`);
    });
  });

  it('two axes come in row-major order (the first varies slowest), each point with its own values', () => {
    const s = sweepDesign(block, {
      axes: [
        { primitive: 'block', parameter: 'size.1', from: 0.06, to: 0.1, steps: 3 },
        { primitive: 'block', parameter: 'size.2', from: 0.02, to: 0.05, steps: 4 },
      ],
      figures: ['mass'],
    });
    expect(s.points).toHaveLength(12);
    expect(s.axes[0].values).toEqual([0.06, 0.08, 0.1]);
    expect(s.axes[1].values).toEqual([0.02, 0.03, 0.04, 0.05]);
    s.points.forEach((p, k) => {
      const b = s.axes[0].values[Math.floor(k / 4)],
        cc = s.axes[1].values[k % 4];
      expect(p.values).toEqual([b, cc]);
      expectRelClose(p.figures.mass!, rho * a * b * cc, 1e-12, `mass at ${k}`); // box volume abc
    });
  });

  it('a point that makes the part invalid has null verdict and figures and a short error, and the sweep goes on', () => {
    const tube = valid({
      primitives: [{ id: 'shaft', shape: 'cylinder', radius: 0.02, innerRadius: 0.01, length: 0.5, density: 1500 }],
      spin: { axis: [0, 0, 1], rate: 5 },
    });
    const s = sweepDesign(tube, {
      axes: [{ primitive: 'shaft', parameter: 'innerRadius', from: 0, to: 0.03, steps: 4 }],
      figures: ['mass'],
    });
    expect(s.points.map((p) => p.verdict === null)).toEqual([false, false, true, true]); // 0, 0.01 fit; 0.02, 0.03 do not
    expect(s.points[2].error).toMatch(/innerRadius must be less than radius/);
    expect(s.points[3].figures.mass).toBeNull();
    // Tube mass ρπ(r2² − r1²)h (Machinery's Handbook hollow cylinder); an inner radius of 0 is the solid cylinder.
    expectRelClose(s.points[0].figures.mass!, 1500 * Math.PI * 0.02 ** 2 * 0.5, 1e-12, 'solid');
    expectRelClose(s.points[1].figures.mass!, 1500 * Math.PI * (0.02 ** 2 - 0.01 ** 2) * 0.5, 1e-12, 'bored');
  });

  it('reports progress up to the total', () => {
    const seen: number[] = [];
    sweepDesign(
      block,
      { axes: [{ primitive: 'block', parameter: 'density', from: 100, to: 1000, steps: 250 }], figures: ['mass'] },
      {},
      (done, total) => {
        expect(total).toBe(250);
        seen.push(done);
      },
    );
    expect(seen[seen.length - 1]).toBe(250);
    expect(seen.every((d, i) => i === 0 || d > seen[i - 1])).toBe(true);
  });

  it('refuses a bad request with the field named', () => {
    const bad = (request: unknown): EngineInputError => {
      try {
        sweepDesign(block, request as Parameters<typeof sweepDesign>[1]);
      } catch (e) {
        if (e instanceof EngineInputError) return e;
        throw e;
      }
      throw new Error('expected an EngineInputError');
    };
    expect(bad({ axes: [{ primitive: 'block', parameter: 'size.1', from: 0.06, to: 0.1, steps: 1 }], figures: ['mass'] }).path).toBe(
      'axes[0].steps',
    );
    expect(bad({ axes: [{ primitive: 'block', parameter: 'radius', from: 0.06, to: 0.1, steps: 3 }], figures: ['mass'] }).path).toBe(
      'axes[0].parameter',
    );
    expect(bad({ axes: [{ primitive: 'lid', parameter: 'size.1', from: 0.06, to: 0.1, steps: 3 }], figures: ['mass'] }).path).toBe(
      'axes[0].primitive',
    );
    expect(
      bad({ axes: [{ primitive: 'block', parameter: 'size.1', from: 0.06, to: 0.1, steps: 3 }], figures: ['mass', 'swingweight'] }).path,
    ).toBe('figures[1]');
    const tooMany = bad({
      axes: [
        { primitive: 'block', parameter: 'size.1', from: 0.06, to: 0.1, steps: 101 },
        { primitive: 'block', parameter: 'size.2', from: 0.02, to: 0.05, steps: 100 },
      ],
      figures: ['mass'],
    });
    expect(tooMany.path).toBe('axes');
    expect(tooMany.message).toMatch(/at most 10000 points/);
  });
});
