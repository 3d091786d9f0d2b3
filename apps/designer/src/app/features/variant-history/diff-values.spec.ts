import { showFieldValue } from './diff-values';

// Conversions by definition: 1 m = 1000 mm, 1 kg = 1000 g (SI Brochure), 1 rev = 2π rad.
describe('showFieldValue', () => {
  it('writes lengths in mm, masses in g, rates in rev/s', () => {
    expect(showFieldValue('size[0]', 0.02)).toBe('20 mm');
    expect(showFieldValue('grip.point[2]', 0.1)).toBe('100 mm');
    expect(showFieldValue('mass', 0.003)).toBe('3 g');
    expect(showFieldValue('spin.rate', 10 * Math.PI)).toBe('5 rev/s');
    expect(showFieldValue('density', 650)).toBe('650 kg/m³');
    expect(showFieldValue('rotationDeg[0]', 90)).toBe('90°');
  });

  it('writes directions as plain numbers and absent values as a dash', () => {
    expect(showFieldValue('spin.axis[0]', 1)).toBe('1');
    expect(showFieldValue('innerRadius', undefined)).toBe('—');
    expect(showFieldValue('mode', 'remove')).toBe('remove');
  });
});
