import { EngineInputError } from '../part/engine-input-error';
import { solveDesignRequest, sweepDesignRequest } from './design-requests';

// An invented Kestrel Bay test board: 30 × 20 × 700 mm of wood with a grip frame at its butt.
const board = {
  name: 'Kestrel Bay test board',
  primitives: [{ id: 'board', shape: 'box', size: [0.03, 0.02, 0.7], position: [0, 0, 0.35], density: 600 }],
  spin: { axis: [0, 1, 0], rate: 10 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

const issuesOf = (run: () => unknown) => {
  try {
    run();
  } catch (err) {
    if (err instanceof EngineInputError) return err.issues.map((i) => i.path);
    throw err;
  }
  throw new Error('expected an EngineInputError');
};

describe('design requests as sent (the bodies of POST /solve and /sweep)', () => {
  it('names a bad field of the part by its path under part', () => {
    const bad = { ...board, primitives: [{ ...board.primitives[0], size: [0.03, -0.02, 0.7] }] };
    expect(issuesOf(() => solveDesignRequest({ part: bad, free: [], targets: [] }))).toEqual(
      expect.arrayContaining(['part.primitives[0].size[1]', 'free', 'targets']),
    );
    expect(issuesOf(() => sweepDesignRequest({ part: board, axes: [], figures: ['mass'], extra: 1 }))).toEqual(
      expect.arrayContaining(['axes']),
    );
  });

  it('solves a board length for a mass: m = ρ·a·b·L (box volume, Machinery’s Handbook)', () => {
    const target = 0.3; // kg
    const result = solveDesignRequest({
      part: board,
      free: [{ primitive: 'board', parameter: 'size.2', min: 0.5, max: 1 }],
      targets: [{ figure: 'mass', value: target }],
    });
    expect(result.status).toBe('met');
    const length = target / (600 * 0.03 * 0.02);
    expect(result.changes[0].to).toBeCloseTo(length, 3);
  });

  it('sweeps the board length in order, each mass ρ·a·b·L', () => {
    const result = sweepDesignRequest({
      part: board,
      axes: [{ primitive: 'board', parameter: 'size.2', from: 0.5, to: 0.9, steps: 5 }],
      figures: ['mass'],
    });
    expect(result.points.map((p) => p.values[0])).toEqual([0.5, 0.6, 0.7, 0.8, 0.9].map((x) => expect.closeTo(x, 12)));
    for (const p of result.points) expect(p.figures.mass).toBeCloseTo(600 * 0.03 * 0.02 * p.values[0], 12);
  });
});
