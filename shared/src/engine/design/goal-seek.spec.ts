import type { PartDocument, PartDocumentInput } from '../../schemas/part-document';
import { validatePartDocument } from '../part/validate-part-document';
import { analyzeValidatedPart } from '../report/analyze-part';
import { expectRelClose } from '../testing/expect-close';
import { designFigures } from './design-figures';
import { readDesignParameter, writeDesignParameter } from './design-parameters';
import { goalSeek } from './goal-seek';

function valid(doc: PartDocumentInput): PartDocument {
  const v = validatePartDocument(doc);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

// An invented practice frame: a 30 × 20 × 700 mm board from the butt (z = 0) to the tip, with a strip of lead tape on its axis.
const W = 0.03,
  T = 0.02,
  L = 0.7,
  RHO = 600;
const grip: PartDocumentInput['grip'] = { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] };
const frameOnly: PartDocumentInput['primitives'][number] = {
  id: 'frame',
  shape: 'box',
  size: [W, T, L],
  position: [0, 0, L / 2],
  density: RHO,
};
const tapedFrame = (m: number, z: number) =>
  valid({
    name: 'Kestrel Bay practice frame',
    primitives: [frameOnly, { id: 'tape', shape: 'point', mass: m, position: [0, 0, z] }],
    spin: { axis: [0, 1, 0], rate: 10 },
    grip,
  });

describe('goal seek: lead tape, closed form (MECHANICS §9)', () => {
  it('finds the tape mass m and its place z for a swingweight S and balance point B, as the hand solution does, to 0.1 %', () => {
    // Frame alone, by hand: M = ρ·W·T·L; BP = L/2; swingweight about the axis 0.1 m from the butt, along x (grip axis × face
    // normal = z × y = −x): SW0 = M(T² + L²)/12 + M(L/2 − 0.1)² (Machinery's Handbook rectangular prism, Ixx = m(b² + c²)/12,
    // plus the parallel-axis term).
    const M = RHO * W * T * L,
      BP = L / 2,
      SW0 = (M * (T * T + L * L)) / 12 + M * (L / 2 - 0.1) ** 2;
    const S = 0.0287,
      B = 0.36; // the targets (kg·m², m)
    // Tape on the axis at z: m(z − 0.1)² = S − SW0 (a point mass adds m·d², common practice) and (M·BP + m·z)/(M + m) = B,
    // i.e. m(z − B) = M(B − BP). Dividing: (z − 0.1)² = k(z − B) with k = (S − SW0)/(M(B − BP)), a quadratic in z:
    // z² − (0.2 + k)z + (0.01 + kB) = 0; then m = M(B − BP)/(z − B).
    const k = (S - SW0) / (M * (B - BP));
    const p = 0.2 + k,
      q = 0.01 + k * B,
      disc = Math.sqrt(p * p - 4 * q);
    const roots = [(p - disc) / 2, (p + disc) / 2].map((z) => ({ z, m: (M * (B - BP)) / (z - B) }));
    const zMin = 0.6,
      zMax = 0.7,
      mMin = 0.001,
      mMax = 0.03;
    const inBounds = roots.filter((r) => r.z >= zMin && r.z <= zMax && r.m >= mMin && r.m <= mMax);
    expect(inBounds).toHaveLength(1); // the other root (tape lower down, heavier) lies outside the z bounds
    const hand = inBounds[0];

    const r = goalSeek(tapedFrame(0.005, 0.62), {
      free: [
        { primitive: 'tape', parameter: 'mass', min: mMin, max: mMax },
        { primitive: 'tape', parameter: 'position.2', min: zMin, max: zMax },
      ],
      targets: [
        { figure: 'swingweight', value: S },
        { figure: 'balancePoint', value: B },
      ],
    });
    expect(r.status).toBe('met');
    expectRelClose(readDesignParameter(r.part, 'tape', 'mass'), hand.m, 1e-3, 'tape mass');
    expectRelClose(readDesignParameter(r.part, 'tape', 'position.2'), hand.z, 1e-3, 'tape position');
    // The report of the returned document carries the targets (engine's full analysis of the new part).
    expectRelClose(r.report.trade.swingweight!, S, 1e-3, 'report swingweight');
    expectRelClose(r.report.trade.balancePoint!, B, 1e-3, 'report balance point');
    expect(r.changes.map((c) => c.parameter)).toEqual(['mass', 'position.2']);
  });
});

describe('goal seek: recovery by construction (MECHANICS §9)', () => {
  // An invented club: a round handle, a throat and an ellipsoidal head along z.
  const club = valid({
    name: 'Kestrel Bay trainer club',
    primitives: [
      { id: 'handle', shape: 'cylinder', radius: 0.015, length: 0.3, position: [0, 0, 0.15], density: 700 },
      { id: 'throat', shape: 'box', size: [0.02, 0.02, 0.1], position: [0, 0, 0.35], density: 900 },
      { id: 'head', shape: 'ellipsoid', semiAxes: [0.05, 0.02, 0.06], position: [0, 0, 0.46], density: 1100 },
    ],
    spin: { axis: [1, 0, 0], rate: 10 },
    grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
  });

  it('recovers mass, balance point and swingweight, and the three parameters that made them, from another start', () => {
    const truth = { density: 1350, z: 0.48, radius: 0.018 };
    let made = writeDesignParameter(club, 'head', 'density', truth.density);
    made = writeDesignParameter(made, 'head', 'position.2', truth.z);
    made = writeDesignParameter(made, 'handle', 'radius', truth.radius);
    const report = analyzeValidatedPart(made); // the engine's full analysis gives the figures to recover
    const r = goalSeek(club, {
      free: [
        { primitive: 'head', parameter: 'density', min: 600, max: 2000 },
        { primitive: 'head', parameter: 'position.2', min: 0.42, max: 0.52 },
        { primitive: 'handle', parameter: 'radius', min: 0.01, max: 0.025 },
      ],
      targets: [
        { figure: 'mass', value: report.mass },
        { figure: 'balancePoint', value: report.trade.balancePoint! },
        { figure: 'swingweight', value: report.trade.swingweight! },
      ],
    });
    expect(r.status).toBe('met');
    for (const a of r.achieved) expect(a.met).toBe(true);
    expectRelClose(readDesignParameter(r.part, 'head', 'density'), truth.density, 1e-3, 'head density');
    expectRelClose(readDesignParameter(r.part, 'head', 'position.2'), truth.z, 1e-3, 'head position');
    expectRelClose(readDesignParameter(r.part, 'handle', 'radius'), truth.radius, 1e-3, 'handle radius');
  });

  it("recovers an ellipsoid's three semi-axes from its principal moments, checked with the handbook formula I = m(b² + c²)/5", () => {
    const rho = 1000;
    const egg = valid({
      primitives: [{ id: 'shell', shape: 'ellipsoid', semiAxes: [0.07, 0.12, 0.17], density: rho }],
      spin: { axis: [0, 0, 1], rate: 5 },
    });
    const [a, b, c] = [0.061, 0.127, 0.182]; // the semi-axes to recover (m)
    const m = (4 / 3) * Math.PI * a * b * c * rho; // ellipsoid volume 4πabc/3
    // Machinery's Handbook, ellipsoid: Ixx = m(b² + c²)/5, cyclic; sorted I1 ≥ I2 ≥ I3 as the report gives them.
    const moments = [(m * (b * b + c * c)) / 5, (m * (a * a + c * c)) / 5, (m * (a * a + b * b)) / 5].sort((x, y) => y - x);
    const r = goalSeek(egg, {
      free: [
        { primitive: 'shell', parameter: 'semiAxes.0', min: 0.05, max: 0.09 },
        { primitive: 'shell', parameter: 'semiAxes.1', min: 0.1, max: 0.14 },
        { primitive: 'shell', parameter: 'semiAxes.2', min: 0.15, max: 0.2 },
      ],
      targets: [
        { figure: 'I1', value: moments[0] },
        { figure: 'I2', value: moments[1] },
        { figure: 'I3', value: moments[2] },
      ],
    });
    expect(r.status).toBe('met');
    expectRelClose(readDesignParameter(r.part, 'shell', 'semiAxes.0'), a, 1e-3, 'a');
    expectRelClose(readDesignParameter(r.part, 'shell', 'semiAxes.1'), b, 1e-3, 'b');
    expectRelClose(readDesignParameter(r.part, 'shell', 'semiAxes.2'), c, 1e-3, 'c');
    expectRelClose(r.report.mass, m, 3e-3, 'mass');
  });

  it('recovers a steady margin: a disc spun about its axis (major) made thin enough that (I1 − I2)/I2 = 0.9', () => {
    // Solid cylinder (Machinery's Handbook): Izz = m r²/2, Ixx = m(3r² + h²)/12. With r = 0.1 m, (Izz − Ixx)/Ixx = 0.9
    // gives 6r²/(3r² + h²) = 1.9, so h² = 6r²/1.9 − 3r² (solved by hand).
    const r0 = 0.1,
      h = Math.sqrt((6 * r0 * r0) / 1.9 - 3 * r0 * r0);
    const disc = valid({
      primitives: [{ id: 'disc', shape: 'cylinder', radius: r0, length: 0.05, density: 1200 }],
      spin: { axis: [0, 0, 1], rate: 30 },
    });
    const r = goalSeek(disc, {
      free: [{ primitive: 'disc', parameter: 'length', min: 0.005, max: 0.1 }],
      targets: [{ figure: 'steadyMargin', value: 0.9 }],
    });
    expect(r.status).toBe('met');
    expectRelClose(readDesignParameter(r.part, 'disc', 'length'), h, 1e-3, 'thickness');
    expectRelClose(designFigures(r.part, ['steadyMargin']).steadyMargin!, 0.9, 1e-3, 'margin of the answer');
  });
});

describe('goal seek: bounds and inequality targets', () => {
  it('a swingweight beyond what the bounds allow gives closest, the tape mass at its max exactly, and a reason naming the target', () => {
    const z = 0.66,
      mMax = 0.01;
    const M = RHO * W * T * L,
      SW0 = (M * (T * T + L * L)) / 12 + M * (L / 2 - 0.1) ** 2; // Machinery's Handbook prism + parallel axis
    const r = goalSeek(tapedFrame(0.004, z), {
      free: [{ primitive: 'tape', parameter: 'mass', min: 0.001, max: mMax }],
      targets: [{ figure: 'swingweight', value: 0.05 }],
    });
    expect(r.status).toBe('closest');
    expect(readDesignParameter(r.part, 'tape', 'mass')).toBe(mMax);
    // Swingweight rises with the tape mass (m·d², common practice), so the compromise is the heaviest tape allowed.
    expectRelClose(r.achieved[0].value!, SW0 + mMax * (z - 0.1) ** 2, 1e-12, 'swingweight at the bound');
    expect(r.achieved[0].met).toBe(false);
    expect(r.reason).toMatch(/swingweight/);
    expect(r.reason).toMatch(/tape mass at its max/);
  });

  it('inequality targets that already hold are zero residuals: met, nothing changes', () => {
    const doc = tapedFrame(0.004, 0.66);
    const before = designFigures(doc, ['mass', 'balancePoint']);
    const r = goalSeek(doc, {
      free: [{ primitive: 'tape', parameter: 'position.2', min: 0.5, max: 0.7 }],
      targets: [
        { figure: 'mass', max: before.mass! * 1.5 },
        { figure: 'balancePoint', min: before.balancePoint! - 0.05 },
      ],
    });
    expect(r.status).toBe('met');
    expect(r.changes).toEqual([]);
    expect(r.part).toEqual(doc);
  });

  it('a violated minimum becomes active: the balance point is pushed up to its minimum and no further than the tolerance', () => {
    const doc = tapedFrame(0.02, 0.5);
    const bp0 = designFigures(doc, ['balancePoint']).balancePoint!;
    const wanted = bp0 + 0.01;
    const r = goalSeek(doc, {
      free: [{ primitive: 'tape', parameter: 'position.2', min: 0.2, max: 0.7 }],
      targets: [{ figure: 'balancePoint', min: wanted }],
    });
    expect(r.status).toBe('met');
    const bp = r.report.trade.balancePoint!;
    expect(bp).toBeGreaterThanOrEqual(wanted * (1 - 1e-3));
    expect(bp).toBeLessThan(wanted * (1 + 1e-3));
    // Balance point by hand: (M·L/2 + m·z)/(M + m) = wanted gives z (common practice: centre of mass from the butt).
    const M = RHO * W * T * L,
      m = 0.02;
    const zHand = (wanted * (M + m) - (M * L) / 2) / m;
    expectRelClose(readDesignParameter(r.part, 'tape', 'position.2'), zHand, 1e-2, 'tape position');
  });

  it('a bore that cannot fit inside the tube anywhere within the bounds is infeasible, and the part is left as it was', () => {
    const tube = valid({
      primitives: [{ id: 'shaft', shape: 'cylinder', radius: 0.02, innerRadius: 0.01, length: 0.8, density: 1500 }],
      spin: { axis: [0, 0, 1], rate: 5 },
    });
    const r = goalSeek(tube, {
      free: [
        { primitive: 'shaft', parameter: 'innerRadius', min: 0.025, max: 0.03 },
        { primitive: 'shaft', parameter: 'radius', min: 0.015, max: 0.024 },
      ],
      targets: [{ figure: 'mass', value: 0.5 }],
    });
    expect(r.status).toBe('infeasible');
    expect(r.reason).toMatch(/innerRadius must be less than radius/);
    expect(r.part).toBe(tube);
    expect(r.changes).toEqual([]);
  });

  it('the same bore is feasible once the radius may pass it: the answer keeps innerRadius < radius', () => {
    const tube = valid({
      primitives: [{ id: 'shaft', shape: 'cylinder', radius: 0.02, innerRadius: 0.01, length: 0.8, density: 1500 }],
      spin: { axis: [0, 0, 1], rate: 5 },
    });
    // Tube mass ρπ(r2² − r1²)h (Machinery's Handbook hollow cylinder): with r1 = 0.025 the target needs r2 = √(m/(ρπh) + r1²).
    const target = 1500 * Math.PI * (0.028 ** 2 - 0.025 ** 2) * 0.8;
    const r = goalSeek(tube, {
      free: [
        { primitive: 'shaft', parameter: 'innerRadius', min: 0.025, max: 0.03 },
        { primitive: 'shaft', parameter: 'radius', min: 0.015, max: 0.032 },
      ],
      targets: [{ figure: 'mass', value: target }],
    });
    expect(r.status).toBe('met');
    const inner = readDesignParameter(r.part, 'shaft', 'innerRadius'),
      outer = readDesignParameter(r.part, 'shaft', 'radius');
    expect(inner).toBeLessThan(outer);
    expectRelClose(1500 * Math.PI * (outer * outer - inner * inner) * 0.8, target, 1e-3, 'tube mass by the handbook formula');
  });
});
