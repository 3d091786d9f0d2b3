import { partDocumentSchema, type SolveAnswer } from '@tumblewise/shared';
import { achievedRows, diffRows, proposalLabel, proposalNotes, signedPercent } from './solve-result-model';

// An invented juggling baton (SI in the document).
const draft = partDocumentSchema.parse({
  name: 'Harbour baton',
  primitives: [
    { id: 'rod', shape: 'capsule', radius: 0.009, length: 0.5, position: [0, 0, 0.3], density: 1200 },
    { id: 'knob', shape: 'sphere', radius: 0.03, position: [0, 0, 0.57], density: 300 },
  ],
  spin: { axis: [1, 0, 0], rate: 12.6 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
});
const answer: Pick<SolveAnswer, 'changes' | 'achieved'> = {
  changes: [
    { primitive: 'rod', parameter: 'density', from: 1200, to: 1350 },
    { primitive: 'knob', parameter: 'position.2', from: 0.57, to: 0.5583 },
    { primitive: 'rod', parameter: 'radius', from: 0.009, to: 0.009 * 0.9 },
    { primitive: 'lead-tape', parameter: 'mass', from: 0.01505, to: 0.0073 },
  ],
  achieved: [
    { figure: 'mass', value: 0.25, target: { value: 0.25 }, met: true },
    { figure: 'swingweight', value: 0.03, target: { min: 0.032 }, met: false },
    { figure: 'balancePoint', value: 0.29, target: { max: 0.3 }, met: true },
    { figure: 'centreOfPercussion', value: null, target: { min: 0.4, max: 0.5 }, met: false },
  ],
};

describe('the proposal against the draft', () => {
  it('lists each change with the editor’s label, both values in its units and the change in per cent', () => {
    expect(diffRows(answer, draft, ['lead-tape'])).toEqual([
      { primitive: 'rod', field: 'Density', from: '1200 kg/m³', to: '1350 kg/m³', change: '+12.5 %' },
      { primitive: 'knob', field: 'Position z', from: '570 mm', to: '558.3 mm', change: '−2.05 %' },
      { primitive: 'rod', field: 'Radius', from: '9 mm', to: '8.1 mm', change: '−10 %' },
      { primitive: 'lead-tape', field: 'Mass', from: 'new', to: '7.3 g', change: '—' },
    ]);
  });

  it('shows each target beside what the proposal achieves, met or not', () => {
    expect(achievedRows(answer)).toEqual([
      { figure: 'Mass', target: '= 250 g', achieved: '250 g', met: true },
      { figure: 'Swingweight', target: '≥ 320 kg·cm²', achieved: '300 kg·cm²', met: false },
      { figure: 'Balance point', target: '≤ 300 mm', achieved: '290 mm', met: true },
      { figure: 'Centre of percussion', target: '400 mm to 500 mm', achieved: '—', met: false },
    ]);
  });

  it('writes percentages with their sign', () => {
    expect(signedPercent(0.125)).toBe('+12.5 %');
    expect(signedPercent(-0.0205)).toBe('−2.05 %');
    expect(signedPercent(0)).toBe('0 %');
  });
});

describe('the proposal as a variant', () => {
  it('is labelled by its targets, at most 120 characters', () => {
    expect(proposalLabel([{ figure: 'swingweight', value: 0.032 }])).toBe('Goal seek: swingweight 320 kg·cm²');
    expect(
      proposalLabel(
        [
          { figure: 'swingweight', value: 0.032 },
          { figure: 'balancePoint', value: 0.31 },
        ],
        true,
      ),
    ).toBe('Lead tape: swingweight 320 kg·cm², balance point 310 mm');
    const many = proposalLabel(Array.from({ length: 12 }, () => ({ figure: 'centreOfPercussion' as const, min: 0.4123 })));
    expect(many.length).toBeLessThanOrEqual(120);
    expect(many.endsWith('…')).toBe(true);
  });

  it('notes the draft version, how far it got and what changed', () => {
    const rows = diffRows(answer, draft, ['lead-tape']).slice(0, 1);
    expect(proposalNotes(7, 'met', rows)).toBe(
      'Proposed by goal seek from draft version 7, every target met. Changes: rod density 1200 kg/m³ → 1350 kg/m³.',
    );
    expect(proposalNotes(7, 'closest', rows, 'mass is 3 % short')).toContain('closest within the bounds (mass is 3 % short)');
  });
});
