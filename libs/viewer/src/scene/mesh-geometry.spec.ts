import { BufferGeometry } from 'three';
import { CACHED_GEOMETRY, disposeObject } from './dispose-object';
import { meshArraysFromData, type MeshArrays } from './mesh-arrays';
import { MeshGeometryCache, meshGeometryFromData, signedVolumeOf } from './mesh-geometry';

// A corner tetrahedron with legs a along x, y and z: its volume is (base a²/2)·(height a)/3 = a³/6
// (CRC Standard Mathematical Tables, volume of a pyramid); its bounding box is [0, a]³.
type Tri = [number, number, number][];
const tetra = (a: number): Tri[] => {
  const o: [number, number, number] = [0, 0, 0];
  const x: [number, number, number] = [a, 0, 0];
  const y: [number, number, number] = [0, a, 0];
  const z: [number, number, number] = [0, 0, a];
  // Counter-clockwise seen from outside (outward normals).
  return [
    [o, y, x],
    [o, x, z],
    [o, z, y],
    [x, y, z],
  ];
};

/** A binary STL (80-byte header, count, 50 bytes a triangle: normal, three corners, attribute). */
function binaryStl(tris: Tri[]): ArrayBuffer {
  const buf = new ArrayBuffer(84 + 50 * tris.length);
  const view = new DataView(buf);
  view.setUint32(80, tris.length, true);
  tris.forEach((t, i) => t.forEach((p, k) => p.forEach((c, j) => view.setFloat32(84 + 50 * i + 12 + 12 * k + 4 * j, c, true))));
  return buf;
}

function asciiStl(tris: Tri[]): ArrayBuffer {
  const facets = tris.map(
    (t) => `facet normal 0 0 0\n outer loop\n${t.map((p) => `  vertex ${p.join(' ')}`).join('\n')}\n endloop\nendfacet`,
  );
  return new TextEncoder().encode(`solid tetra\n${facets.join('\n')}\nendsolid tetra\n`).buffer as ArrayBuffer;
}

const positionsOf = (g: BufferGeometry) => g.getAttribute('position').array as Float32Array;

describe('meshGeometryFromData', () => {
  const a = 30; // mm in the file
  it('builds a binary STL tetrahedron in metres: 4 triangles, box [0, a]³, volume a³/6', () => {
    const g = meshGeometryFromData(binaryStl(tetra(a)), 0.001);
    expect(g.getAttribute('position').count).toBe(12);
    expect(g.getAttribute('normal').count).toBe(12);
    expect(g.boundingBox!.min.toArray()).toEqual([0, 0, 0]);
    g.boundingBox!.max.toArray().forEach((c) => expect(c).toBeCloseTo(0.03, 7));
    // float32 corners: good to ~1e-7 relative.
    expect(signedVolumeOf(positionsOf(g))).toBeCloseTo(0.03 ** 3 / 6, 11);
    expect(g.boundingSphere!.radius).toBeGreaterThan(0);
  });

  it('reads the same solid from an ASCII STL and from corner positions', () => {
    const ascii = meshGeometryFromData(asciiStl(tetra(a)), 0.001);
    const raw = meshGeometryFromData(new Float32Array(tetra(a).flat(2)), 0.001);
    expect(Array.from(positionsOf(ascii))).toEqual(Array.from(positionsOf(raw)));
    expect(signedVolumeOf(positionsOf(ascii))).toBeCloseTo(0.03 ** 3 / 6, 11);
  });

  it('turns an inside-out file outward (positive volume) without moving it', () => {
    const inverted = tetra(a).map(([p, q, r]) => [p, r, q] as Tri);
    expect(signedVolumeOf(new Float32Array(inverted.flat(2)))).toBeCloseTo(-(a ** 3) / 6, 6);
    const g = meshGeometryFromData(binaryStl(inverted), 1);
    expect(signedVolumeOf(positionsOf(g))).toBeCloseTo(a ** 3 / 6, 6);
    expect(g.boundingBox!.max.toArray()).toEqual([a, a, a]);
  });

  it('does not change the source data it is given', () => {
    const raw = new Float32Array(tetra(1).flat(2));
    meshGeometryFromData(raw, 2);
    expect(raw[3]).toBe(0);
    expect(raw[4]).toBe(1);
  });

  it('says what is wrong with data that holds no triangles or a bad scale', () => {
    expect(() => meshGeometryFromData(new ArrayBuffer(0), 1)).toThrow('the file is empty');
    expect(() => meshGeometryFromData(new TextEncoder().encode('solid nothing\nendsolid nothing\n').buffer as ArrayBuffer, 1)).toThrow(
      /could not be read as STL|no complete triangles/,
    );
    expect(() => meshGeometryFromData(new Float32Array(7), 1)).toThrow('no complete triangles');
    expect(() => meshGeometryFromData(binaryStl(tetra(1)), 0)).toThrow('scale');
    expect(() => meshGeometryFromData(new Float32Array([Number.NaN, 0, 0, 1, 0, 0, 0, 1, 0]), 1)).toThrow('finite');
  });
});

describe('MeshGeometryCache', () => {
  const flush = () => new Promise((resolve) => setTimeout(resolve, 0));

  it('fetches a mesh once, answers pending until it arrives, then builds it once per scale', async () => {
    const source = jest.fn(async () => binaryStl(tetra(10)));
    const changed = jest.fn();
    const cache = new MeshGeometryCache(source, changed);
    expect(cache.lookup('m1', 0.001)).toEqual({ state: 'pending' });
    expect(cache.lookup('m1', 1)).toEqual({ state: 'pending' });
    await flush();
    expect(changed).toHaveBeenCalledTimes(1);
    const mm = cache.lookup('m1', 0.001);
    const unit = cache.lookup('m1', 1);
    expect(source).toHaveBeenCalledTimes(1);
    if (mm.state !== 'ready' || unit.state !== 'ready') throw new Error('expected ready geometries');
    expect(mm.geometry.boundingBox!.max.x).toBeCloseTo(0.01, 7);
    expect(unit.geometry.boundingBox!.max.x).toBe(10);
    // The same object comes back for the same scale: drawings share it.
    expect(cache.lookup('m1', 0.001)).toBe(mm);
    expect(mm.geometry.userData[CACHED_GEOMETRY]).toBe(true);
  });

  it('answers failed with the reason when the fetch fails or the bytes are not a mesh, and never throws', async () => {
    const cache = new MeshGeometryCache(
      async (id) => {
        if (id === 'gone') throw new Error('Mesh was not found.');
        return new ArrayBuffer(0);
      },
      () => undefined,
    );
    cache.lookup('gone', 1);
    cache.lookup('empty', 1);
    await flush();
    expect(cache.lookup('gone', 1)).toEqual({ state: 'failed', message: 'Mesh was not found.' });
    expect(cache.lookup('empty', 1)).toEqual({ state: 'failed', message: 'the file is empty' });
    const throwing = new MeshGeometryCache(
      () => {
        throw new Error('no session');
      },
      () => undefined,
    );
    expect(throwing.lookup('x', 1)).toEqual({ state: 'pending' });
    await flush();
    expect(throwing.lookup('x', 1)).toEqual({ state: 'failed', message: 'no session' });
  });

  it('answers pending while a build runs off the page, then ready, and draws again when it is', async () => {
    let finish: () => void = () => undefined;
    const build = jest.fn(
      (data: ArrayBuffer | Float32Array, scale: number) =>
        new Promise<MeshArrays>((resolve) => (finish = () => resolve(meshArraysFromData(data, scale)))),
    );
    const changed = jest.fn();
    const cache = new MeshGeometryCache(async () => binaryStl(tetra(10)), changed, build);
    cache.lookup('m1', 0.001);
    await flush();
    expect(changed).toHaveBeenCalledTimes(1); // the file arrived
    expect(cache.lookup('m1', 0.001)).toEqual({ state: 'pending' });
    expect(cache.lookup('m1', 0.001)).toEqual({ state: 'pending' });
    expect(build).toHaveBeenCalledTimes(1);
    finish();
    await flush();
    expect(changed).toHaveBeenCalledTimes(2); // the arrays arrived
    const found = cache.lookup('m1', 0.001);
    if (found.state !== 'ready') throw new Error('expected ready');
    expect(found.geometry.boundingBox!.max.x).toBeCloseTo(0.01, 7);
    expect(found.geometry.getAttribute('normal').count).toBe(12);
  });

  it('answers failed with the reason of a build that fails off the page, and drops builds after dispose', async () => {
    const failing = new MeshGeometryCache(
      async () => new ArrayBuffer(8),
      () => undefined,
      () => Promise.reject(new Error('the mesh holds no complete triangles')),
    );
    failing.lookup('m', 1);
    await flush();
    failing.lookup('m', 1);
    await flush();
    expect(failing.lookup('m', 1)).toEqual({ state: 'failed', message: 'the mesh holds no complete triangles' });
    let finish: () => void = () => undefined;
    const changed = jest.fn();
    const gone = new MeshGeometryCache(
      async () => binaryStl(tetra(1)),
      changed,
      (d, s) => new Promise<MeshArrays>((r) => (finish = () => r(meshArraysFromData(d, s)))),
    );
    gone.lookup('m', 1);
    await flush();
    gone.lookup('m', 1);
    gone.dispose();
    finish();
    await flush();
    expect(changed).toHaveBeenCalledTimes(1);
  });

  it('answers failed at once without a source', () => {
    expect(new MeshGeometryCache(null, () => undefined).lookup('m1', 1)).toMatchObject({ state: 'failed' });
  });

  it('frees its geometries when disposed and drops answers still on their way', async () => {
    let release: (b: ArrayBuffer) => void = () => undefined;
    const changed = jest.fn();
    const cache = new MeshGeometryCache(
      async (id) => (id === 'slow' ? new Promise<ArrayBuffer>((r) => (release = r)) : binaryStl(tetra(1))),
      changed,
    );
    cache.lookup('fast', 1);
    cache.lookup('slow', 1);
    await flush();
    const fast = cache.lookup('fast', 1);
    if (fast.state !== 'ready') throw new Error('expected ready');
    const disposed = jest.spyOn(fast.geometry, 'dispose');
    cache.dispose();
    expect(disposed).toHaveBeenCalledTimes(1);
    release(binaryStl(tetra(1)));
    await flush();
    expect(changed).toHaveBeenCalledTimes(1);
  });

  it('is left alone by disposeObject, which frees the scene’s own geometries', async () => {
    const { Group, Mesh, MeshBasicMaterial, BoxGeometry } = await import('three');
    const cache = new MeshGeometryCache(
      async () => binaryStl(tetra(1)),
      () => undefined,
    );
    cache.lookup('m', 1);
    await flush();
    const found = cache.lookup('m', 1);
    if (found.state !== 'ready') throw new Error('expected ready');
    const root = new Group();
    const box = new BoxGeometry(1, 1, 1);
    root.add(new Mesh(found.geometry, new MeshBasicMaterial()), new Mesh(box, new MeshBasicMaterial()));
    const cached = jest.spyOn(found.geometry, 'dispose');
    const own = jest.spyOn(box, 'dispose');
    disposeObject(root);
    expect(cached).not.toHaveBeenCalled();
    expect(own).toHaveBeenCalledTimes(1);
  });
});
