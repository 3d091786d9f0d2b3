import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { EngineInputError } from '../part/engine-input-error';
import { expectAbsClose, expectRelClose } from '../testing/expect-close';
import { analyzePart, firstNonFinite } from './analyze-part';

const racket = JSON.parse(readFileSync(join(__dirname, '../examples/junior-racket.json'), 'utf8'));

function thrown(f: () => unknown): EngineInputError {
  try {
    f();
  } catch (e) {
    if (e instanceof EngineInputError) return e;
    throw e;
  }
  throw new Error('expected an EngineInputError');
}

describe('analyzePart', () => {
  it('gives every report field of issue item 9, in SI, with no NaN or Infinity', () => {
    const r = analyzePart(racket);
    expect(Object.keys(r)).toEqual(
      expect.arrayContaining(['mass', 'volume', 'centerOfMass', 'inertia', 'principal', 'spin', 'trade', 'checks', 'notes']),
    );
    expect(Object.keys(r.spin).sort()).toEqual(
      [
        'coneHalfAngleDeg',
        'eFoldingTime',
        'explanation',
        'flightTime',
        'flightTimeSource',
        'flipTime',
        'growthRate',
        'margins',
        'misalignmentDeg',
        'motionAxis',
        'nearestAxis',
        'verdict',
        'wobbleFrequency',
        'wobblePeriod',
      ].sort(),
    );
    expect(Object.keys(r.trade)).toEqual(expect.arrayContaining(['balancePoint', 'swingweight', 'recoilWeight', 'twistweight']));
    expect(firstNonFinite(JSON.parse(JSON.stringify(r)), '')).toBeNull();
    expect(r.principal.moments[0]).toBeGreaterThanOrEqual(r.principal.moments[1]);
    expect(r.notes.join(' ')).toMatch(/estimates/);
    expect(r.checks.every((c) => c.indicative)).toBe(true);
  });

  it('the demo racket thrown about its width axis is flip-prone (that axis is the intermediate one)', () => {
    expect(analyzePart(racket).spin.verdict).toBe('flip-prone');
  });

  it("rotationDeg follows R = Rz·Ry·Rx about fixed axes: [90, 0, 90] lays a cylinder's axis along x", () => {
    const r = analyzePart({
      primitives: [{ id: 'c', shape: 'cylinder', radius: 0.02, length: 0.3, rotationDeg: [90, 0, 90], density: 1000 }],
      spin: { axis: [1, 0, 0], rate: 5 },
    });
    const m = Math.PI * 0.02 ** 2 * 0.3 * 1000;
    expectRelClose(r.inertia[0][0], (m * 0.02 ** 2) / 2, 1e-12); // axial moment (Machinery's Handbook cylinder)
    expectRelClose(r.inertia[1][1], (m * (3 * 0.02 ** 2 + 0.09)) / 12, 1e-12);
    expect(r.spin.nearestAxis).toBe('minor');
    expect(r.spin.verdict).toBe('steady');
  });

  it('a mass given for a primitive sets its density; a removal subtracts at its density', () => {
    const r = analyzePart({
      primitives: [
        { id: 'tube', shape: 'cylinder', radius: 0.02, length: 0.3, mass: 0.5 },
        { id: 'bore', shape: 'cylinder', radius: 0.01, length: 0.3, density: 0.5 / (Math.PI * 0.02 ** 2 * 0.3), mode: 'remove' },
      ],
      spin: { axis: [0, 0, 1], rate: 5 },
    });
    expectRelClose(r.mass, 0.5 * 0.75, 1e-14);
    expectRelClose(r.inertia[2][2], (0.375 * (0.02 ** 2 + 0.01 ** 2)) / 2, 1e-12); // tube, Machinery's Handbook
  });

  it('resolves materialId through the caller, and refuses an unknown one as unanalysable with its path', () => {
    const doc = { primitives: [{ id: 's', shape: 'sphere', radius: 0.05, materialId: 'ash' }], spin: { axis: [0, 0, 1], rate: 1 } };
    const r = analyzePart(doc, { resolveMaterial: (id) => (id === 'ash' ? { density: 670 } : undefined) });
    expectRelClose(r.mass, (4 / 3) * Math.PI * 0.05 ** 3 * 670, 1e-14);
    const e = thrown(() => analyzePart(doc));
    expect(e.kind).toBe('unanalysable');
    expect(e.path).toBe('primitives[0].materialId');
  });

  it('refuses a removal larger than what it cuts (mass ≤ 0) naming the removal, and a bad document as invalid', () => {
    const e = thrown(() =>
      analyzePart({
        primitives: [
          { id: 'a', shape: 'sphere', radius: 0.05, density: 100 },
          { id: 'b', shape: 'sphere', radius: 0.06, density: 100, mode: 'remove' },
        ],
        spin: { axis: [0, 0, 1], rate: 1 },
      }),
    );
    expect(e.kind).toBe('unanalysable');
    expect(e.path).toBe('primitives[1]');
    const bad = thrown(() => analyzePart({ primitives: [{ id: 'a', shape: 'cube' }], spin: { axis: [0, 0, 1], rate: 1 } }));
    expect(bad.kind).toBe('invalid');
    expect(bad.path).toBe('primitives[0].shape');
  });

  it('refuses a part with no rotational inertia (one point mass)', () => {
    const e = thrown(() => analyzePart({ primitives: [{ id: 'p', shape: 'point', mass: 0.1 }], spin: { axis: [0, 0, 1], rate: 1 } }));
    expect(e.kind).toBe('unanalysable');
  });

  it('without a grip the trade figures are null and a note says why', () => {
    const r = analyzePart({
      primitives: [{ id: 'b', shape: 'box', size: [0.3, 0.2, 0.1], density: 500 }],
      spin: { axis: [0, 0, 1], rate: 3 },
    });
    expect(r.trade.swingweight).toBeNull();
    expect(r.notes.join(' ')).toMatch(/No grip frame/);
    // A 3:2:1 box about its shortest edge (z) spins about the major axis (Machinery's Handbook box moments).
    expect(r.spin.nearestAxis).toBe('major');
  });
});

describe('category checks (each indicative, naming its rule)', () => {
  const spin = { axis: [0, 0, 1], rate: 10 };
  it('golf wood head: moment about vertical through the CG and volume against 5900 + 100 g·cm² and 460 + 10 cc (USGA/R&A)', () => {
    // An ellipsoid head 120 × 110 × 60 mm of 150 kg/m³ effective density: V ≈ 415 cc.
    const r = analyzePart({
      category: 'golf-wood',
      primitives: [{ id: 'h', shape: 'ellipsoid', semiAxes: [0.06, 0.055, 0.03], density: 480 }],
      spin,
    });
    const moment = r.checks.find((c) => c.id === 'golf-wood.moment')!;
    const m = r.mass;
    expectRelClose(moment.value!, (m * (0.06 ** 2 + 0.055 ** 2)) / 5, 1e-12);
    expectRelClose(moment.limit.max!, 6000e-7, 1e-12); // 6000 g·cm² = 6e-4 kg·m²
    expect(moment.status).toBe(moment.value! <= 6e-4 ? 'pass' : 'fail');
    const vol = r.checks.find((c) => c.id === 'golf-wood.volume')!;
    expectRelClose(vol.limit.max!, 470e-6, 1e-12);
    expect(vol.status).toBe('pass');
    expect(moment.rule).toMatch(/USGA/);
  });

  it('flying disc: diameter, mass and mass per diameter (PDGA); spin about the major axis passes', () => {
    const r = analyzePart({
      category: 'flying-disc',
      primitives: [{ id: 'd', shape: 'cylinder', radius: 0.105, length: 0.012, mass: 0.17 }],
      spin,
    });
    const get = (id: string) => r.checks.find((c) => c.id === id)!;
    expectAbsClose(get('flying-disc.diameter').value!, 0.21, 1e-12);
    expect(get('flying-disc.mass').status).toBe('pass');
    expectRelClose(get('flying-disc.mass-per-diameter').value!, 0.17 / 0.21, 1e-12);
    expect(get('flying-disc.mass-per-diameter').status).toBe('pass'); // 0.81 kg/m ≤ 0.83 kg/m
    expect(get('flying-disc.spin-axis').status).toBe('pass');
  });

  it("javelin (World Athletics, men's): mass, length and centre of gravity from the tip", () => {
    const r = analyzePart({
      category: 'javelin',
      primitives: [
        { id: 'shaft', shape: 'cylinder', radius: 0.0125, length: 2.65, position: [0, 0, 1.325], mass: 0.7 },
        { id: 'head', shape: 'cone', radius: 0.0125, length: 0.25, position: [0, 0, 2.65], mass: 0.1 },
      ],
      spin,
      grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
    });
    const get = (id: string) => r.checks.find((c) => c.id === id)!;
    expect(get('javelin.mass').status).toBe('pass');
    expectAbsClose(get('javelin.length').value!, 2.9, 1e-12);
    expect(get('javelin.length').status).toBe('fail');
    expectRelClose(get('javelin.centre-of-gravity').value!, 2.9 - r.centerOfMass[2], 1e-12);
  });

  it('bowling ball: radius of gyration and differential (USBC), a uniform sphere has zero differential', () => {
    const r = analyzePart({ category: 'bowling-ball', primitives: [{ id: 'b', shape: 'sphere', radius: 0.109, mass: 6.8 }], spin });
    const rg = r.checks.find((c) => c.id === 'bowling-ball.rg-min')!;
    expectRelClose(rg.value!, Math.sqrt(0.4) * 0.109, 1e-12);
    expectRelClose(rg.limit.min!, 2.46 * 0.0254, 1e-12);
    expectAbsClose(r.checks.find((c) => c.id === 'bowling-ball.differential')!.value!, 0, 1e-15);
    expect(r.spin.verdict).toBe('steady');
  });

  it('bat: moment about the 6-inch pivot and centre of percussion (ASTM F2398); without a grip they are not evaluated', () => {
    const doc = {
      category: 'bat',
      primitives: [
        {
          id: 'barrel',
          shape: 'cone',
          radius: 0.033,
          topRadius: 0.015,
          length: 0.84,
          rotationDeg: [180, 0, 0],
          position: [0, 0, 0.84],
          density: 650,
        },
      ],
      spin,
    };
    const without = analyzePart(doc);
    expect(without.checks.find((c) => c.id === 'bat.pivot-moment')!.status).toBe('not-evaluated');
    const r = analyzePart({ ...doc, grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] } });
    const pm = r.checks.find((c) => c.id === 'bat.pivot-moment')!;
    expect(pm.status).toBe('info');
    expectRelClose(pm.value!, r.trade.pivot!.moment, 1e-15);
    expectRelClose(r.trade.pivot!.distance, 0.1524, 1e-15);
    expectRelClose(r.trade.pivot!.centreOfPercussion!, 0.1524 + r.trade.pivot!.moment / (r.mass * (r.trade.balancePoint! - 0.1524)), 1e-14);
  });
});

describe('mesh primitives in a part', () => {
  const box = {
    vertices: [
      [0, 0, 0],
      [0.1, 0, 0],
      [0, 0.2, 0],
      [0.1, 0.2, 0],
      [0, 0, 0.3],
      [0.1, 0, 0.3],
      [0, 0.2, 0.3],
      [0.1, 0.2, 0.3],
    ],
    triangles: [
      [0, 4, 6],
      [0, 6, 2],
      [1, 3, 7],
      [1, 7, 5],
      [0, 1, 5],
      [0, 5, 4],
      [2, 6, 7],
      [2, 7, 3],
      [0, 2, 3],
      [0, 3, 1],
      [4, 5, 7],
      [4, 7, 6],
    ],
  };
  it('an inline mesh box (in mm at scale 0.001 or in m) equals the box primitive', () => {
    const prim = analyzePart({
      primitives: [{ id: 'b', shape: 'box', size: [0.1, 0.2, 0.3], position: [0.05, 0.1, 0.15], density: 800 }],
      spin: { axis: [0, 0, 1], rate: 1 },
    });
    const mm = { vertices: box.vertices.map((v) => v.map((x) => x * 1000)), triangles: box.triangles };
    const mesh = analyzePart({
      primitives: [{ id: 'm', shape: 'mesh', ...mm, scale: 0.001, density: 800 }],
      spin: { axis: [0, 0, 1], rate: 1 },
    });
    expectRelClose(mesh.mass, prim.mass, 1e-13);
    for (let i = 0; i < 3; i++)
      for (let j = 0; j < 3; j++) expectAbsClose(mesh.inertia[i][j], prim.inertia[i][j], 1e-13 * prim.inertia[2][2]);
    expect(mesh.trade.length).toBeNull(); // no grip frame, no length along it
  });
  it('a meshId resolves through the caller; an open mesh is refused naming the field', () => {
    const corners = Float32Array.from(box.triangles.flatMap((t) => t.flatMap((i) => box.vertices[i])));
    const doc = { primitives: [{ id: 'm', shape: 'mesh', meshId: 'upload-1', density: 800 }], spin: { axis: [0, 0, 1], rate: 1 } };
    const r = analyzePart(doc, { resolveMesh: (id) => (id === 'upload-1' ? { corners, triangleCount: 12 } : undefined) });
    expectRelClose(r.mass, 0.006 * 800, 1e-6);
    const open = thrown(() => analyzePart(doc, { resolveMesh: () => ({ corners: corners.subarray(0, 99), triangleCount: 11 }) }));
    expect(open.kind).toBe('unanalysable');
    expect(open.path).toBe('primitives[0].meshId');
    expect(open.message).toMatch(/not closed/);
  });
});
