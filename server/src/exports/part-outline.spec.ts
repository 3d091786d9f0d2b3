import { convexHull, partOutlines } from './part-outline';

describe('part outlines for the PDF drawing', () => {
  it('the hull of a square and its inner points is the square (counter-clockwise)', () => {
    const hull = convexHull([[0, 0], [1, 0], [1, 1], [0, 1], [0.5, 0.5], [0.2, 0.8]]);
    expect(hull).toEqual([[0, 0], [1, 0], [1, 1], [0, 1]]);
  });

  it('projects a cylinder along z, rotated 90° about x, into a rectangle of its length along y', () => {
    // R = Rz·Ry·Rx with rx = 90°: local z goes to part −y (right-hand rule about x).
    const doc = { primitives: [{ id: 'c', shape: 'cylinder', radius: 0.01, length: 0.2, position: [0, 0, 0.5], rotationDeg: [90, 0, 0] }] };
    const [outline] = partOutlines(doc, [1, 0, 0], [0, 1, 0]);
    const xs = outline.points.map((p) => p[0]), ys = outline.points.map((p) => p[1]);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(0.02, 12);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(0.2, 12);
  });

  it('marks removals and skips unknown shapes', () => {
    const doc = { primitives: [{ id: 'a', shape: 'box', size: [1, 2, 3], position: [0, 0, 0] }, { id: 'b', shape: 'sphere', radius: 0.1, mode: 'remove' }, { id: 'z', shape: 'blob' }] };
    const outlines = partOutlines(doc, [1, 0, 0], [0, 0, 1]);
    expect(outlines.map((o) => [o.id, o.mode])).toEqual([['a', 'add'], ['b', 'remove']]);
    const box = outlines[0];
    expect(Math.max(...box.points.map((p) => p[1]))).toBeCloseTo(1.5, 12);
  });
});
