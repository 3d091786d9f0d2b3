import { buildComparison, comparisonCsv } from './comparison';

const report = (mass: number, verdict: string, i: [number, number, number]) => ({
  mass,
  principal: { moments: i },
  spin: { verdict, nearestAxis: 'minor', margins: { major: (i[0] - i[1]) / i[1], minor: (i[1] - i[2]) / i[1] } },
});

describe('buildComparison', () => {
  const a = { id: 'a', label: 'v1', report: report(0.3, 'steady', [3, 2, 1]) };
  const b = { id: 'b', label: 'v2', report: report(0.33, 'flip-prone', [3, 2.9, 1]) };

  it('gives deltas against the chosen baseline', () => {
    const c = buildComparison([a, b], 'b');
    const mass = c.rows.find((r) => r.key === 'mass')!;
    expect(c.baselineIndex).toBe(1);
    expect(mass.values).toEqual([0.3, 0.33]);
    expect(mass.deltas[0]).toBeCloseTo(-0.03, 15);
    expect(mass.deltas[1]).toBe(0);
    expect(mass.relativeDeltas[0]).toBeCloseTo(-0.03 / 0.33, 15);
    const verdict = c.rows.find((r) => r.key === 'verdict')!;
    expect(verdict.values).toEqual(['steady', 'flip-prone']);
    expect(verdict.deltas).toEqual([null, null]);
  });

  it('turns missing or non-finite figures into null instead of NaN', () => {
    const c = buildComparison([a, { id: 'x', label: 'broken', report: { mass: Number.NaN } }]);
    const mass = c.rows.find((r) => r.key === 'mass')!;
    expect(mass.values).toEqual([0.3, null]);
    expect(mass.deltas).toEqual([0, null]);
  });

  it('shows a stored report without the motion axis, cone, period or flight time as missing figures, beside one with them', () => {
    const newer = {
      id: 'n',
      label: 'v3',
      report: {
        ...report(0.3, 'watch', [3, 2, 1]),
        spin: { verdict: 'watch', motionAxis: 'major', coneHalfAngleDeg: 58.7, wobblePeriod: 17.1, flightTime: 1 },
      },
    };
    const c = buildComparison([a, newer]);
    const row = (key: string) => c.rows.find((r) => r.key === key)!.values;
    expect(row('motionAxis')).toEqual([null, 'major']);
    expect(row('cone')).toEqual([null, 58.7]);
    expect(row('wobblePeriod')).toEqual([null, 17.1]);
    expect(row('flightTime')).toEqual([null, 1]);
  });

  it('refuses fewer than two or more than six variants, and a foreign baseline', () => {
    expect(() => buildComparison([a])).toThrow(RangeError);
    expect(() => buildComparison([a, b, a, b, a, b, a])).toThrow(RangeError);
    expect(() => buildComparison([a, b], 'zzz')).toThrow(RangeError);
  });
});

describe('comparisonCsv', () => {
  it('writes one line per figure with value and delta columns, quoting and neutralising formulas', () => {
    const csv = comparisonCsv(
      buildComparison([
        { id: 'a', label: 'v1, "light"', report: report(0.3, 'steady', [3, 2, 1]) },
        { id: 'b', label: '=HYPERLINK("x")', report: report(0.33, 'steady', [3, 2, 1]) },
      ]),
    );
    const lines = csv.trimEnd().split('\r\n');
    expect(lines[0]).toBe('figure,unit,"v1, ""light""","v1, ""light"" (baseline) delta","\'=HYPERLINK(""x"")","\'=HYPERLINK(""x"") delta"');
    expect(lines.find((l) => l.startsWith('Mass,'))).toMatch(/^Mass,kg,0\.3,0,0\.33,0\.03/);
    expect(lines).toHaveLength(1 + 20);
  });
});
