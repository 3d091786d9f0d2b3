import { EVENT_LOOP_ANALYSIS_PRIMITIVES, isSmallAnalysis } from './compute-pool';

const box = { shape: 'box', size: [0.1, 0.1, 0.1], density: 1000 };
const part = (primitives: unknown[]) => ({ primitives, spin: { axis: [0, 0, 1], rateRpm: 600 } });

describe('which tasks run on the event loop', () => {
  it('takes a small analysis of primitives without meshes', () => {
    expect(isSmallAnalysis({ kind: 'analyze', part: part([box, box, box]) })).toBe(true);
    expect(isSmallAnalysis({ kind: 'analyze', part: part(Array(EVENT_LOOP_ANALYSIS_PRIMITIVES).fill(box)) })).toBe(true);
  });

  it('sends larger parts, meshes, simulations and unreadable documents to a worker', () => {
    expect(isSmallAnalysis({ kind: 'analyze', part: part(Array(EVENT_LOOP_ANALYSIS_PRIMITIVES + 1).fill(box)) })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: part([box, { shape: 'mesh', vertices: [], triangles: [], density: 1000 }]) })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: part([box]), references: { meshes: { m1: new Uint8Array(84) } } })).toBe(false);
    expect(isSmallAnalysis({ kind: 'simulate', input: { part: part([box]) } })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: null })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: { primitives: 'many' } })).toBe(false);
  });
});
