import { analyzePart } from '../report/analyze-part';
import { expectAbsClose, expectRelClose } from '../testing/expect-close';
import { runScatterStudy } from './scatter-study';
import { SeededRandom } from './seeded-random';
import { summarize } from './summarize';

const racket = {
  primitives: [
    {
      id: 'handle',
      shape: 'cylinder',
      radius: 0.014,
      length: 0.2,
      position: [0, 0, 0.1],
      density: 650,
      tolerance: { density: 0.05, size: 0.0002 },
    },
    {
      id: 'hoop',
      shape: 'torus',
      majorRadius: 0.11,
      minorRadius: 0.008,
      position: [0, 0, 0.42],
      rotationDeg: [90, 0, 0],
      density: 1500,
      tolerance: { density: 0.03, size: 0.0002 },
    },
    { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
  ],
  spin: { axis: [0, 1, 0], rate: 20 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

describe('seeded random numbers', () => {
  it('are reproducible, and the normal draws have mean ≈ 0 and standard deviation ≈ 1', () => {
    const a = new SeededRandom(7),
      b = new SeededRandom(7);
    for (let i = 0; i < 5; i++) expect(a.nextUint32()).toBe(b.nextUint32());
    const r = new SeededRandom(42);
    const x = Float64Array.from({ length: 40000 }, () => r.normal());
    const s = summarize(x);
    expectAbsClose(s.mean, 0, 0.02); // 4σ of the mean's sampling error 1/√n = 0.005
    expectAbsClose(s.std, 1, 0.015);
    expectAbsClose(s.p50, 0, 0.02);
    expectAbsClose(s.p95, 1.6449, 0.03); // standard normal 95th percentile
  });
});

describe('runScatterStudy', () => {
  it('is reproducible for a seed and differs for another', () => {
    const a = runScatterStudy({ part: racket, samples: 500, seed: 1 });
    const b = runScatterStudy({ part: racket, samples: 500, seed: 1 });
    const c = runScatterStudy({ part: racket, samples: 500, seed: 2 });
    expect(b).toEqual(a);
    expect(c.distributions.mass.mean).not.toBe(a.distributions.mass.mean);
  });

  it('one uniform solid with density scatter only: the margins do not move, the mass spread is σ·m', () => {
    const part = { primitives: [{ id: 'b', shape: 'box', size: [0.3, 0.2, 0.1], density: 500 }], spin: { axis: [0, 0, 1], rate: 5 } };
    const r = runScatterStudy({ part, samples: 4000, seed: 9, tolerances: { default: { density: 0.04 } } });
    const m = 0.3 * 0.2 * 0.1 * 500;
    expectRelClose(r.distributions.mass.mean, m, 0.005);
    expectRelClose(r.distributions.mass.std, 0.04 * m, 0.05); // std estimate error ≈ 1/√(2n) ≈ 1.1 %
    expect(r.distributions.marginMajor.std).toBeLessThan(1e-13);
    expect(r.verdictChangedShare).toBe(0);
  });

  it('zero tolerances give a single point; a marginal design changes verdict in part of the samples', () => {
    const none = runScatterStudy({
      part: racket,
      samples: 50,
      seed: 3,
      tolerances: { default: { density: 0, size: 0 }, primitives: { handle: { density: 0, size: 0 }, hoop: { density: 0, size: 0 } } },
    });
    expect(none.distributions.marginMajor.std).toBe(0);
    // A 200 × 196 × 50 mm plate spun about y: y is the intermediate axis only while the 200 mm edge is the longer one
    // (box moments, Machinery's Handbook); a 3 mm size scatter swaps the two edges in roughly P(N(0, 4.2 mm) > 4 mm) ≈ 17 % of draws.
    const marginal = {
      primitives: [{ id: 'plate', shape: 'box', size: [0.2, 0.196, 0.05], density: 800, tolerance: { density: 0, size: 0.003 } }],
      spin: { axis: [0, 1, 0], rate: 5 },
    };
    const r = runScatterStudy({ part: marginal, samples: 4000, seed: 4 });
    expect(r.nominal.verdict).toBe('flip-prone');
    expect(r.axisRoleChangedShare).toBeGreaterThan(0.14);
    expect(r.axisRoleChangedShare).toBeLessThan(0.21);
    expect(r.verdictChangedShare).toBeCloseTo(r.axisRoleChangedShare, 12);
    expect(r.verdictShares.steady + r.verdictShares.watch + r.verdictShares['flip-prone']).toBeCloseTo(1, 12);
  });

  it('sensitivities agree with finite differences of analyzePart on edited documents, and are ranked', () => {
    const r = runScatterStudy({ part: racket, samples: 20, seed: 5 });
    const s = r.sensitivities.find((x) => x.primitiveId === 'hoop' && x.parameter === 'majorRadius')!;
    const edit = (d: number) => {
      const doc = structuredClone(racket);
      (doc.primitives[1] as { majorRadius: number }).majorRadius += d;
      return analyzePart(doc).spin.margins;
    };
    const h = 1e-5;
    const [up, down] = [edit(h), edit(-h)];
    expectRelClose(s.perUnit.major, (up.major - down.major) / (2 * h), 1e-4);
    expectRelClose(s.perUnit.minor, (up.minor - down.minor) / (2 * h), 1e-4);
    const key = (x: typeof s) => Math.max(Math.abs(x.perPercent.major), Math.abs(x.perPercent.minor));
    for (let i = 1; i < r.sensitivities.length; i++) expect(key(r.sensitivities[i - 1])).toBeGreaterThanOrEqual(key(r.sensitivities[i]));
    expect(r.distributions.swingweight).toBeDefined();
  });

  it('reports progress and refuses bad input naming the field', () => {
    const seen: number[] = [];
    runScatterStudy({ part: racket, samples: 200, seed: 1 }, (done) => seen.push(done));
    expect(seen[seen.length - 1]).toBe(200);
    expect(() => runScatterStudy({ part: racket, samples: 5, seed: 1 })).toThrow(/samples/);
    expect(() => runScatterStudy({ part: { ...racket, spin: { axis: [0, 2, 0], rate: 1 } }, samples: 50, seed: 1 })).toThrow(
      /part\.spin\.axis/,
    );
  });
});
