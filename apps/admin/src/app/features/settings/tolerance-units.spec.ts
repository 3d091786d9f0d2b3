import { metresToMillimetres, millimetresToMetres, percentToRelative, relativeToPercent } from './tolerance-units';

// Reference: SI prefixes (1 mm = 10⁻³ m, BIPM SI Brochure, 9th ed., table 7) and 1 % = 0.01.
describe('tolerance units', () => {
  it('converts percent to a fraction and back without float noise', () => {
    expect(percentToRelative(5)).toBe(0.05);
    expect(relativeToPercent(0.07)).toBe(7);
    expect(relativeToPercent(percentToRelative(12.5))).toBe(12.5);
  });

  it('converts millimetres to metres and back', () => {
    expect(millimetresToMetres(0.2)).toBe(0.0002);
    expect(metresToMillimetres(0.0003)).toBe(0.3);
    expect(metresToMillimetres(millimetresToMetres(10))).toBe(10);
  });
});
