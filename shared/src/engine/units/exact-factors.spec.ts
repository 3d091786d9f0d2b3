import { unit } from 'mathjs';
import { CENTIMETRE, CUBIC_CENTIMETRE, GRAM, INCH, POUND } from './exact-factors';

// Reference: mathjs's unit system (a general-purpose library); the definitions are NIST SP 811 (2008), Appendix B.8.
describe('exact unit factors', () => {
  it.each([
    ['inch', 'm', INCH],
    ['lb', 'kg', POUND],
    ['g', 'kg', GRAM],
    ['cm', 'm', CENTIMETRE],
    ['cc', 'm^3', CUBIC_CENTIMETRE],
  ])('1 %s is what mathjs makes of it in %s', (from, to, factor) => {
    expect(factor).toBeCloseTo(unit(1, from).toNumber(to), 15);
    expect(Math.abs(factor / unit(1, from).toNumber(to) - 1)).toBeLessThan(1e-12);
  });

  it('converts a compound rule limit as mathjs does (5900 g·cm² and 8.3 g/cm)', () => {
    expect(5900 * GRAM * CENTIMETRE ** 2).toBeCloseTo(unit(5900, 'g cm^2').toNumber('kg m^2'), 12);
    expect((8.3 * GRAM) / CENTIMETRE).toBeCloseTo(unit(8.3, 'g/cm').toNumber('kg/m'), 12);
  });
});
