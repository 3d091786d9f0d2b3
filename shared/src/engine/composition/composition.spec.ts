import fc from 'fast-check';
import { multiply, mat3, identity } from '../linear/mat3';
import { rotationFromDegrees } from '../linear/rotation-from-degrees';
import { principalAxes } from '../principal/principal-axes';
import { boxSolid } from '../primitives/box';
import { cylinderSolid } from '../primitives/cylinder';
import { createSolid } from '../primitives/solid';
import { momentAboutLine } from '../trade/moment-about-line';
import { expectAbsClose, expectArrayClose, expectRelClose } from '../testing/expect-close';
import { createBody, type Body } from './body';
import { composeBodies } from './compose-bodies';
import { placeSolid } from './place-solid';

const I3 = identity(mat3());
const len = fc.double({ min: 0.01, max: 0.5, noNaN: true });
const deg = fc.double({ min: -180, max: 180, noNaN: true });
const coord = fc.double({ min: -0.5, max: 0.5, noNaN: true });
const pieceArb = fc.record({
  kind: fc.constantFrom('box', 'cylinder'),
  a: len,
  b: len,
  c: len,
  rx: deg,
  ry: deg,
  rz: deg,
  x: coord,
  y: coord,
  z: coord,
  rho: fc.double({ min: 100, max: 8000, noNaN: true }),
});
type Piece = typeof pieceArb extends fc.Arbitrary<infer T> ? T : never;

function place(p: Piece, outer = I3, shift = [0, 0, 0]): Body {
  const s = p.kind === 'box' ? boxSolid(createSolid(), p.a, p.b, p.c) : cylinderSolid(createSolid(), p.a, p.b);
  const r = multiply(mat3(), outer, rotationFromDegrees(mat3(), p.rx, p.ry, p.rz));
  const pos = [p.x, p.y, p.z];
  const moved = [0, 1, 2].map((i) => outer[3 * i] * pos[0] + outer[3 * i + 1] * pos[1] + outer[3 * i + 2] * pos[2] + shift[i]);
  return placeSolid(undefined, s, p.rho, r, moved);
}

describe('composition by the parallel-axis theorem (Abdulghany, Am. J. Phys. 85, 791 (2017))', () => {
  it('property: principal moments are invariant under rotation and translation of the whole part', () => {
    fc.assert(
      fc.property(
        fc.array(pieceArb, { minLength: 1, maxLength: 6 }),
        deg,
        deg,
        deg,
        coord,
        coord,
        coord,
        (pieces, gx, gy, gz, tx, ty, tz) => {
          const a = principalAxes(
            undefined,
            composeBodies(
              undefined,
              pieces.map((p) => place(p)),
            ).inertia,
          );
          const R = rotationFromDegrees(mat3(), gx, gy, gz);
          const b = principalAxes(
            undefined,
            composeBodies(
              undefined,
              pieces.map((p) => place(p, R, [tx * 1e3, ty, tz])),
            ).inertia,
          );
          expectArrayClose(b.moments, a.moments, 1e-10, a.moments[0]);
        },
      ),
      { numRuns: 150 },
    );
  });

  it('property: a box split in two along any edge gives the same tensor and centre as the whole box', () => {
    fc.assert(
      fc.property(
        len,
        len,
        len,
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.constantFrom(0, 1, 2),
        deg,
        deg,
        deg,
        (a, b, c, f, axis, rx, ry, rz) => {
          const R = rotationFromDegrees(mat3(), rx, ry, rz);
          const dims = [a, b, c];
          const whole = placeSolid(undefined, boxSolid(createSolid(), a, b, c), 700, R, [0.1, 0.2, 0.3]);
          const parts = [f, 1 - f].map((share, k) => {
            const d = [...dims];
            d[axis] = dims[axis] * share;
            const off = [0, 0, 0];
            off[axis] = k === 0 ? -dims[axis] / 2 + d[axis] / 2 : dims[axis] / 2 - d[axis] / 2;
            const pos = [0, 1, 2].map((i) => [0.1, 0.2, 0.3][i] + R[3 * i] * off[0] + R[3 * i + 1] * off[1] + R[3 * i + 2] * off[2]);
            return placeSolid(undefined, boxSolid(createSolid(), d[0], d[1], d[2]), 700, R, pos);
          });
          const sum = composeBodies(undefined, parts);
          expectRelClose(sum.mass, whole.mass, 1e-13);
          expectArrayClose(sum.center, whole.center, 1e-13, 1);
          expectArrayClose(sum.inertia, whole.inertia, 1e-11, Math.max(whole.inertia[0], whole.inertia[4], whole.inertia[8]));
        },
      ),
      { numRuns: 150 },
    );
  });

  it('property: a cylinder split in two along its axis gives the whole cylinder', () => {
    fc.assert(
      fc.property(len, len, fc.double({ min: 0.05, max: 0.95, noNaN: true }), (r, h, f) => {
        const whole = placeSolid(undefined, cylinderSolid(createSolid(), r, h), 1, I3, [0, 0, 0]);
        const lower = placeSolid(undefined, cylinderSolid(createSolid(), r, f * h), 1, I3, [0, 0, -h / 2 + (f * h) / 2]);
        const upper = placeSolid(undefined, cylinderSolid(createSolid(), r, (1 - f) * h), 1, I3, [0, 0, h / 2 - ((1 - f) * h) / 2]);
        const sum = composeBodies(undefined, [lower, upper]);
        expectArrayClose(sum.inertia, whole.inertia, 1e-12, whole.inertia[0]);
      }),
      { numRuns: 100 },
    );
  });

  it('property: triangle inequality of principal moments and positive definiteness for any added solids', () => {
    fc.assert(
      fc.property(fc.array(pieceArb, { minLength: 1, maxLength: 8 }), (pieces) => {
        const p = principalAxes(
          undefined,
          composeBodies(
            undefined,
            pieces.map((x) => place(x)),
          ).inertia,
        );
        const [i1, i2, i3] = p.moments;
        expect(i3).toBeGreaterThan(0);
        expect(i2 + i3).toBeGreaterThanOrEqual(i1 * (1 - 1e-12));
      }),
      { numRuns: 150 },
    );
  });

  it('property: parallel-axis consistency — the moment about a line at distance d from the centre is I_c + m d²', () => {
    fc.assert(
      fc.property(fc.array(pieceArb, { minLength: 1, maxLength: 5 }), coord, coord, (pieces, dx, dy) => {
        const body = composeBodies(
          undefined,
          pieces.map((x) => place(x)),
        );
        const c = body.center;
        const through = momentAboutLine(body, c, [0, 0, 1]);
        const shifted = momentAboutLine(body, [c[0] + dx, c[1] + dy, c[2] + 5], [0, 0, 1]);
        expectRelClose(through, body.inertia[8], 1e-13);
        expectRelClose(shifted, through + body.mass * (dx * dx + dy * dy), 1e-12);
      }),
      { numRuns: 100 },
    );
  });

  it('placeSolid and composeBodies honour out: default, explicit, and aliased with an input', () => {
    const s = boxSolid(createSolid(), 0.1, 0.2, 0.3);
    const out = createBody();
    expect(placeSolid(out, s, 2, I3, [1, 0, 0])).toBe(out);
    const fresh = placeSolid(undefined, s, 2, I3, [1, 0, 0]);
    expect(fresh).not.toBe(out);
    expect(fresh.mass).toBe(out.mass);
    const other = placeSolid(undefined, s, 2, I3, [-1, 0, 0]);
    const expected = composeBodies(undefined, [out, other]);
    const aliased = composeBodies(out, [out, other]);
    expect(aliased).toBe(out);
    expect(Array.from(aliased.inertia)).toEqual(Array.from(expected.inertia));
    expectAbsClose(aliased.center[0], 0, 1e-15);
  });
});
