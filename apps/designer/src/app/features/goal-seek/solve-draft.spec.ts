import { solveDraft } from './solve-draft';

const rod = { id: 'rod', shape: 'capsule', radius: 0.009, length: 0.5, position: [0, 0, 0.3], density: 1200 };

describe('the draft a goal seek starts from', () => {
  it('is missing when the part has none', () => {
    expect(solveDraft(null)).toEqual({ kind: 'none' });
    expect(solveDraft(undefined)).toEqual({ kind: 'none' });
    expect(solveDraft([1, 2])).toEqual({ kind: 'none' });
  });

  it('is empty without primitives', () => {
    expect(solveDraft({ name: 'x', primitives: [], spin: { axis: [0, 0, 1], rate: 1 } })).toEqual({ kind: 'empty' });
    expect(solveDraft({ name: 'x' })).toEqual({ kind: 'empty' });
  });

  it('names the first problems of an invalid draft by their paths', () => {
    const d = solveDraft({ primitives: [{ ...rod, radius: -1 }], spin: { axis: [0, 0, 1], rate: 1 } });
    expect(d.kind).toBe('invalid');
    expect(d.kind === 'invalid' && d.problems[0]).toBe('primitives[0].radius must be greater than zero');
  });

  it('keeps a valid draft as stored beside its validated form and its fields', () => {
    const raw = { primitives: [rod], spin: { axis: [1, 0, 0], rate: 12 } };
    const d = solveDraft(raw);
    expect(d.kind).toBe('ready');
    if (d.kind !== 'ready') return;
    expect(d.raw).toBe(raw);
    expect(d.doc.primitives[0].rotationDeg).toEqual([0, 0, 0]);
    expect(d.primitives.map((p) => p.id)).toEqual(['rod']);
    expect(d.primitives[0].fields.map((f) => f.label)).toContain('Straight length');
  });
});
