import fc from 'fast-check';
import { expectAbsClose, expectRelClose } from '../testing/expect-close';
import { agm, completeEllipticK } from './complete-elliptic-k';
import { carlsonRF, incompleteEllipticF } from './incomplete-elliptic-f';
import { jacobiSnCnDn } from './jacobi-elliptic';

describe('complete elliptic integral K(m) by the AGM (DLMF 19.8.5)', () => {
  it('matches DLMF / mpmath values', () => {
    expectRelClose(completeEllipticK(0.5), 1.8540746773013719, 2e-16); // mpmath ellipk(0.5)
    expectRelClose(completeEllipticK(0.9), 2.5780921133481733, 2e-16); // mpmath ellipk(0.9)
    expectRelClose(completeEllipticK(0.99), 3.6956373629898747, 4e-16); // mpmath ellipk(0.99)
    expectRelClose(completeEllipticK(0), Math.PI / 2, 1e-16);
  });

  it('AGM terminates at m = 0.5 (a naive stop test can loop there) and is symmetric', () => {
    expect(agm(1, Math.SQRT1_2)).toBe(agm(Math.SQRT1_2, 1));
    expect(Number.isFinite(agm(1, Math.SQRT1_2))).toBe(true);
  });

  it('uses the complementary parameter near m = 1: K ≈ ln(4/k′) (DLMF 19.12.1)', () => {
    const mc = 1e-20;
    expectRelClose(completeEllipticK(1 - mc, mc), Math.log(4 / Math.sqrt(mc)), 1e-15);
    expect(completeEllipticK(1, 0)).toBe(Infinity);
  });
});

describe('Jacobi elliptic functions by the descending AGM (DLMF 22.20(ii))', () => {
  const out = new Float64Array(3);
  it('sn, cn, dn(1.5 | 0.5) match DLMF / mpmath', () => {
    jacobiSnCnDn(out, 1.5, 0.5);
    expectAbsClose(out[0], 0.9681760156756912, 1e-15); // mpmath ellipfun('sn', 1.5, 0.5)
    expectAbsClose(out[1], 0.2502702592605516, 1e-15);
    expectAbsClose(out[2], 0.7289153595138271, 1e-15);
  });

  it('dn(0.2 | 0.19) = 0.9962526643 (DLMF 22.20(iii) worked example)', () => {
    expectAbsClose(jacobiSnCnDn(out, 0.2, 0.19)[2], 0.9962526643, 1e-10);
  });

  it('limits: m = 0 gives sin, cos, 1; m = 1 gives tanh, sech, sech (DLMF 22.5(ii))', () => {
    jacobiSnCnDn(out, 0.7, 0);
    expect(Array.from(out)).toEqual([Math.sin(0.7), Math.cos(0.7), 1]);
    jacobiSnCnDn(out, 0.7, 1, 0);
    expectAbsClose(out[0], Math.tanh(0.7), 1e-16);
    expectAbsClose(out[2], 1 / Math.cosh(0.7), 1e-16);
  });

  it('property: sn² + cn² = 1, dn² + m sn² = 1, and the period 4K (DLMF 22.6.1, 22.4)', () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: 0, max: 0.999999, noNaN: true }), (u, m) => {
        const [sn, cn, dn] = jacobiSnCnDn(new Float64Array(3), u, m);
        expectAbsClose(sn * sn + cn * cn, 1, 1e-14);
        expectAbsClose(dn * dn + m * sn * sn, 1, 1e-13);
        const shifted = jacobiSnCnDn(new Float64Array(3), u + 4 * completeEllipticK(m), m);
        expectAbsClose(shifted[0], sn, 1e-9);
      }),
      { numRuns: 300 },
    );
  });
});

describe('incomplete F(φ | m) by Carlson R_F (DLMF 19.25.5)', () => {
  it('R_F(0, 1, 2) = 1.3110287771461 (Carlson 1995, Numer. Algorithms 10, test value)', () => {
    expectAbsClose(carlsonRF(0, 1, 2), 1.3110287771461, 1e-13);
  });

  it('F(π/2 | m) = K(m) and sn(F(φ | m) | m) = sin φ across (−π, π]', () => {
    expectRelClose(incompleteEllipticF(Math.PI / 2, 0.7), completeEllipticK(0.7), 1e-15);
    fc.assert(
      fc.property(fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), fc.double({ min: 0, max: 0.99, noNaN: true }), (phi, m) => {
        const u = incompleteEllipticF(phi, m);
        const [sn, cn] = jacobiSnCnDn(new Float64Array(3), u, m);
        expectAbsClose(sn, Math.sin(phi), 1e-13);
        expectAbsClose(cn, Math.cos(phi), 1e-13);
      }),
      { numRuns: 300 },
    );
  });
});
