import { cubeTriangles } from '../test-support/stl-fixtures';
import { polygonArea, polygonContains } from 'd3-polygon';
import { convexHull, MAX_OUTLINE_CORNERS, MAX_PIECEWISE_TRIANGLES, partDrawing, partOutlines } from './part-outline';

describe('part outlines for the PDF drawing', () => {
  it('the hull of a square and its inner points is the square', () => {
    const hull = convexHull([
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 1],
      [0.5, 0.5],
      [0.2, 0.8],
    ]);
    expect([...hull].sort()).toEqual([
      [0, 0],
      [0, 1],
      [1, 0],
      [1, 1],
    ]);
    // In order around it: the shoelace sum of a simple polygon is ±2 × its area (here 1).
    const twiceArea = hull.reduce((sum, [x, y], i) => {
      const [u, v] = hull[(i + 1) % hull.length];
      return sum + x * v - u * y;
    }, 0);
    expect(Math.abs(twiceArea)).toBeCloseTo(2, 12);
  });

  it('projects a cylinder along z, rotated 90° about x, into a rectangle of its length along y', () => {
    // R = Rz·Ry·Rx with rx = 90°: local z goes to part −y (right-hand rule about x).
    const doc = { primitives: [{ id: 'c', shape: 'cylinder', radius: 0.01, length: 0.2, position: [0, 0, 0.5], rotationDeg: [90, 0, 0] }] };
    const [outline] = partOutlines(doc, [1, 0, 0], [0, 1, 0]);
    const xs = outline.points.map((p) => p[0]),
      ys = outline.points.map((p) => p[1]);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(0.02, 12);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(0.2, 12);
  });

  it('marks removals and skips unknown shapes', () => {
    const doc = {
      primitives: [
        { id: 'a', shape: 'box', size: [1, 2, 3], position: [0, 0, 0] },
        { id: 'b', shape: 'sphere', radius: 0.1, mode: 'remove' },
        { id: 'z', shape: 'blob' },
      ],
    };
    const outlines = partOutlines(doc, [1, 0, 0], [0, 0, 1]);
    expect(outlines.map((o) => [o.id, o.mode])).toEqual([
      ['a', 'add'],
      ['b', 'remove'],
    ]);
    const box = outlines[0];
    expect(Math.max(...box.points.map((p) => p[1]))).toBeCloseTo(1.5, 12);
  });

  // A box [0,1]×[0,2]×[0,3] in file units, as the triangle corners an uploaded STL gives.
  const boxCorners = Float32Array.from(
    cubeTriangles()
      .flat(2)
      .map((c, i) => c * [1, 2, 3][i % 3]),
  );

  it('draws an uploaded mesh from its corners, scaled, rotated and moved like any primitive', () => {
    // rx = 90° takes local y to part +z and local z to part −y (right-hand rule about x).
    const doc = { primitives: [{ id: 'm', shape: 'mesh', meshId: 'a', scale: 0.04, rotationDeg: [90, 0, 0], position: [0.5, 0, 0] }] };
    const [outline] = partOutlines(doc, [1, 0, 0], [0, 1, 0], (id) => (id === 'a' ? boxCorners : undefined));
    const xs = outline.points.map((p) => p[0]),
      ys = outline.points.map((p) => p[1]);
    expect([Math.min(...xs), Math.max(...xs)]).toEqual([expect.closeTo(0.5, 9), expect.closeTo(0.54, 9)]);
    expect([Math.min(...ys), Math.max(...ys)]).toEqual([expect.closeTo(-0.12, 9), expect.closeTo(0, 9)]);
  });

  it('leaves out, and counts, an uploaded mesh whose corners are not at hand', () => {
    const doc = {
      primitives: [
        { id: 'm', shape: 'mesh', meshId: 'gone' },
        { id: 'b', shape: 'box', size: [1, 1, 1] },
      ],
    };
    const drawing = partDrawing(doc, () => undefined);
    expect(drawing.outlines.map((o) => o.id)).toEqual(['b']);
    expect(drawing.meshesLeftOut).toBe(1);
    const twice = partDrawing(
      {
        primitives: [
          { id: 'a', shape: 'mesh', meshId: 'gone' },
          { id: 'b', shape: 'mesh', meshId: 'gone' },
        ],
      },
      () => undefined,
    );
    expect(twice.meshesLeftOut).toBe(1); // one mesh, however many primitives use it
    expect(partDrawing(doc, () => boxCorners).meshesLeftOut).toBe(0);
  });

  it('samples a mesh of many corners evenly and keeps its extent', () => {
    // A fan of 100 000 triangles around a circle of radius 0.1: 300 000 corners.
    const n = 100_000,
      corners = new Float32Array(9 * n);
    for (let i = 0; i < n; i++) {
      const a = (2 * Math.PI * i) / n,
        b = (2 * Math.PI * (i + 1)) / n;
      corners.set([0, 0, 0, 0.1 * Math.cos(a), 0.1 * Math.sin(a), 0, 0.1 * Math.cos(b), 0.1 * Math.sin(b), 0], 9 * i);
    }
    const [outline] = partOutlines({ primitives: [{ id: 'fan', shape: 'mesh', meshId: 'f' }] }, [1, 0, 0], [0, 1, 0], () => corners);
    expect(outline.points.length).toBeGreaterThan(1000);
    expect(outline.points.length).toBeLessThanOrEqual(MAX_OUTLINE_CORNERS);
    const xs = outline.points.map((p) => p[0]);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(0.2, 6);
    expect(n).toBeGreaterThan(MAX_PIECEWISE_TRIANGLES);
    expect(outline.pieces).toBeUndefined(); // too many triangles to draw one by one: its hull
  });

  // Containment by d3-polygon's polygonContains (ray casting), independent of how pieces are made.
  const inside = (pieces: [number, number][][], point: [number, number]) => pieces.some((p) => polygonContains(p, point));

  it('draws a torus seen along its axis as a ring: the centre is not filled, the tube is', () => {
    // Torus of centre-circle radius R = 0.1 and tube radius a = 0.01 about local z: seen along z it
    // covers the annulus R − a ≤ r ≤ R + a (geometry).
    const [ring] = partOutlines(
      { primitives: [{ id: 'hoop', shape: 'torus', majorRadius: 0.1, minorRadius: 0.01 }] },
      [1, 0, 0],
      [0, 1, 0],
    );
    expect(ring.pieces!.length).toBe(36);
    expect(inside(ring.pieces!, [0, 0])).toBe(false);
    expect(inside(ring.pieces!, [0.05, 0])).toBe(false);
    expect(inside(ring.pieces!, [0.1, 0])).toBe(true);
    expect(inside(ring.pieces!, [0, -0.105])).toBe(true);
    expect(inside(ring.pieces!, [0.115, 0])).toBe(false);
  });

  it('draws a small uploaded mesh triangle by triangle, every piece counter-clockwise', () => {
    const [box] = partOutlines({ primitives: [{ id: 'm', shape: 'mesh', meshId: 'a' }] }, [1, 0, 0], [0, 1, 0], () => boxCorners);
    expect(box.pieces).toHaveLength(12);
    // d3's polygonArea is positive for counter-clockwise polygons in its y-down convention, so
    // counter-clockwise in our y-up drawing plane is negative there; edge-on triangles have zero area.
    for (const piece of box.pieces!) expect(polygonArea(piece)).toBeLessThanOrEqual(1e-15);
    expect(inside(box.pieces!, [0.5, 1])).toBe(true);
  });

  it('looks along the grip face normal with the grip axis up, or along part x with z up', () => {
    expect(partDrawing({ primitives: [], grip: { axis: [0, 1, 0], faceNormal: [0, 0, 1] } })).toMatchObject({
      up: [0, 1, 0],
      right: [1, 0, 0],
    });
    expect(partDrawing({ primitives: [] })).toMatchObject({ up: [0, 0, 1], right: [0, 1, 0] });
  });

  it('draws fields that refer to named parameters at their resolved values', () => {
    const box = (size: unknown[]) => ({ id: 'bar', shape: 'box', size, density: 1000 });
    const spin = { axis: [0, 0, 1], rate: 10 };
    const byParameter = partDrawing({ parameters: { len: 0.4 }, primitives: [box([0.02, 0.02, { param: 'len', offset: 0.1 }])], spin });
    const plain = partDrawing({ primitives: [box([0.02, 0.02, 0.5])], spin });
    expect(byParameter.outlines).toEqual(plain.outlines);
    // Seen along x with z up, the bar is 0.5 m tall.
    const ys = plain.outlines[0].points.map((q) => q[1]);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(0.5, 12);
  });
});
