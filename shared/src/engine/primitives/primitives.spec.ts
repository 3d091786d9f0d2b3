import { boxSolid, hollowBoxSolid } from './box';
import { capsuleSolid } from './capsule';
import { cylinderSolid, tubeSolid } from './cylinder';
import { ellipsoidSolid } from './ellipsoid';
import { frustumSolid } from './frustum';
import { createSolid, type Solid } from './solid';
import { sphereSolid, sphericalShellSolid } from './sphere';
import { torusSolid } from './torus';
import { composeBodies } from '../composition/compose-bodies';
import { placeSolid } from '../composition/place-solid';
import { identity, mat3 } from '../linear/mat3';
import { expectArrayClose, expectRelClose } from '../testing/expect-close';

const I3 = identity(mat3());
const diag = (s: Solid) => [s.inertia[0], s.inertia[4], s.inertia[8]];
const EPS = 1e-13;

describe('primitive closed forms (unit density, so mass = volume)', () => {
  it("box a×b×c: Ixx = m(b²+c²)/12 — Machinery's Handbook 31st ed., rectangular prism", () => {
    const [a, b, c] = [0.3, 0.05, 0.02];
    const s = boxSolid(createSolid(), a, b, c);
    const m = a * b * c;
    expectRelClose(s.volume, m, EPS);
    expectArrayClose(diag(s), [(m * (b * b + c * c)) / 12, (m * (a * a + c * c)) / 12, (m * (a * a + b * b)) / 12], 1e-15, m * a * a);
    expect(Array.from(s.centroid)).toEqual([0, 0, 0]);
  });

  it('hollow box equals the outer box minus the inner box composed as a removal (superposition)', () => {
    const [a, b, c, t] = [0.2, 0.1, 0.06, 0.004];
    const hollow = hollowBoxSolid(createSolid(), a, b, c, t);
    const outer = placeSolid(undefined, boxSolid(createSolid(), a, b, c), 1, I3, [0, 0, 0]);
    const inner = placeSolid(undefined, boxSolid(createSolid(), a - 2 * t, b - 2 * t, c - 2 * t), -1, I3, [0, 0, 0]);
    const sum = composeBodies(undefined, [outer, inner]);
    expectRelClose(hollow.volume, sum.mass, EPS);
    expectArrayClose(hollow.inertia, sum.inertia, 1e-14, sum.inertia[0]);
  });

  it("solid cylinder: Izz = m r²/2, Ixx = m(3r² + h²)/12 — Machinery's Handbook, solid cylinder", () => {
    const [r, h] = [0.0135, 0.19];
    const s = cylinderSolid(createSolid(), r, h);
    const m = Math.PI * r * r * h;
    expectRelClose(s.volume, m, EPS);
    expectRelClose(s.inertia[8], (m * r * r) / 2, EPS);
    expectRelClose(s.inertia[0], (m * (3 * r * r + h * h)) / 12, EPS);
    expectRelClose(s.inertia[4], s.inertia[0], EPS);
  });

  it("tube r1 < r2: Izz = m(r1² + r2²)/2, Ixx = m(3(r1² + r2²) + h²)/12 — Machinery's Handbook, hollow cylinder", () => {
    const [r2, r1, h] = [0.0135, 0.008, 0.17];
    const s = tubeSolid(createSolid(), r2, r1, h);
    const m = Math.PI * (r2 * r2 - r1 * r1) * h;
    expectRelClose(s.volume, m, EPS);
    expectRelClose(s.inertia[8], (m * (r1 * r1 + r2 * r2)) / 2, 1e-12);
    expectRelClose(s.inertia[0], (m * (3 * (r1 * r1 + r2 * r2) + h * h)) / 12, 1e-12);
  });

  it('sphere: 2/5 m r²; shell: (2/5) m (r2⁵ − r1⁵)/(r2³ − r1³) — standard table', () => {
    const s = sphereSolid(createSolid(), 0.11);
    const m = (4 / 3) * Math.PI * 0.11 ** 3;
    expectRelClose(s.inertia[0], 0.4 * m * 0.11 * 0.11, EPS);
    const [r2, r1] = [0.108, 0.1];
    const sh = sphericalShellSolid(createSolid(), r2, r1);
    const ms = (4 / 3) * Math.PI * (r2 ** 3 - r1 ** 3);
    expectRelClose(sh.volume, ms, 1e-12);
    expectArrayClose(
      diag(sh),
      [1, 1, 1].map(() => (0.4 * ms * (r2 ** 5 - r1 ** 5)) / (r2 ** 3 - r1 ** 3)),
      1e-12,
      sh.inertia[0],
    );
  });

  it("ellipsoid: V = 4/3 πabc, Ixx = m(b² + c²)/5 — Machinery's Handbook, ellipsoid", () => {
    const [a, b, c] = [0.1, 0.06, 0.03];
    const s = ellipsoidSolid(createSolid(), a, b, c);
    const m = (4 / 3) * Math.PI * a * b * c;
    expectRelClose(s.volume, m, EPS);
    expectArrayClose(diag(s), [(m * (b * b + c * c)) / 5, (m * (a * a + c * c)) / 5, (m * (a * a + b * b)) / 5], 1e-14, s.inertia[2 * 4]);
  });

  it("torus: V = 2π²Ra², Izz = m(R² + 3a²/4), Ixx = m(R²/2 + 5a²/8) — Machinery's Handbook, torus", () => {
    const [R, a] = [0.11, 0.008];
    const s = torusSolid(createSolid(), R, a);
    const m = 2 * Math.PI * Math.PI * R * a * a;
    expectRelClose(s.volume, m, EPS);
    expectRelClose(s.inertia[8], m * (R * R + (3 * a * a) / 4), EPS);
    expectRelClose(s.inertia[0], m * ((R * R) / 2 + (5 * a * a) / 8), EPS);
  });

  it('cone (topRadius 0): centroid h/4 above the base, Izz = 3/10 m r², Ixx = m(3r²/20 + 3h²/80) — standard table (apex form) shifted by the parallel-axis theorem', () => {
    const [r, h] = [0.04, 0.3];
    const s = frustumSolid(createSolid(), r, 0, h);
    const m = (Math.PI * r * r * h) / 3;
    expectRelClose(s.volume, m, EPS);
    expectRelClose(s.centroid[2], h / 4, EPS);
    expectRelClose(s.inertia[8], 0.3 * m * r * r, EPS);
    expectRelClose(s.inertia[0], m * ((3 * r * r) / 20 + (3 * h * h) / 80), 1e-12);
  });

  it('frustum: V = πh(R² + Rr + r²)/3 and centroid h(R² + 2Rr + 3r²)/(4(R² + Rr + r²)) (standard); tensor equals the big cone minus the cut-off apex cone', () => {
    const [R, r, h] = [0.05, 0.02, 0.12];
    const s = frustumSolid(createSolid(), R, r, h);
    expectRelClose(s.volume, (Math.PI * h * (R * R + R * r + r * r)) / 3, EPS);
    expectRelClose(s.centroid[2], (h * (R * R + 2 * R * r + 3 * r * r)) / (4 * (R * R + R * r + r * r)), 1e-13);
    // Superposition: full cone of height H = hR/(R − r) minus the apex cone of height H − h on top.
    const H = (h * R) / (R - r);
    const big = placeSolid(undefined, frustumSolid(createSolid(), R, 0, H), 1, I3, [0, 0, 0]);
    const tip = placeSolid(undefined, frustumSolid(createSolid(), r, 0, H - h), -1, I3, [0, 0, h]);
    const sum = composeBodies(undefined, [big, tip]);
    expectRelClose(sum.center[2], s.centroid[2], 1e-11);
    expectArrayClose(s.inertia, sum.inertia, 1e-10, s.inertia[0]);
  });

  it('hemisphere constants of the capsule (centroid 3r/8, transverse 83/320 m r²) agree with a direct quadrature of disc slices', () => {
    // Composite Simpson rule over z ∈ [0, r] of discs ρ² = r² − z²; independent of the closed form.
    const r = 1,
      n = 2000;
    let V = 0,
      Mz = 0,
      Szz = 0,
      Q = 0;
    for (let i = 0; i <= n; i++) {
      const z = (r * i) / n,
        w = (i === 0 || i === n ? 1 : i % 2 ? 4 : 2) * (r / n / 3);
      const a = Math.PI * (r * r - z * z);
      V += w * a;
      Mz += w * a * z;
      Szz += w * a * z * z;
      Q += w * a * (r * r - z * z);
    }
    const zc = Mz / V;
    expectRelClose(zc, (3 * r) / 8, 1e-12);
    expectRelClose(Q / 4 + Szz - V * zc * zc, (83 / 320) * V * r * r, 1e-12);
    expectRelClose(Q / 2, 0.4 * V * r * r, 1e-12);
  });

  it('capsule with zero straight length is the sphere', () => {
    const c = capsuleSolid(createSolid(), 0.03, 0);
    const s = sphereSolid(createSolid(), 0.03);
    expectRelClose(c.volume, s.volume, EPS);
    expectArrayClose(c.inertia, s.inertia, 1e-14, s.inertia[0]);
  });

  it('shape functions write into and return the given out', () => {
    const out = createSolid();
    expect(boxSolid(out, 1, 2, 3)).toBe(out);
    expect(hollowBoxSolid(out, 1, 2, 3, 0.1)).toBe(out);
    expect(tubeSolid(out, 2, 1, 1)).toBe(out);
    expect(frustumSolid(out, 2, 1, 1)).toBe(out);
  });
});
