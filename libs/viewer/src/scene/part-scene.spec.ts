import { analyzeValidatedPart } from '@tumblewise/engine';
import { Box3, BufferGeometry, Mesh, Vector3 } from 'three';
import { PRACTICE_RACKET, TILTED_CONE } from '../testing/demo-parts';
import { disposeObject } from './dispose-object';
import { MeshGeometryCache, meshGeometryFromData } from './mesh-geometry';
import { buildPartScene } from './part-scene';

describe('buildPartScene', () => {
  it('places each primitive by position and R = Rz·Ry·Rx, centred on the centre of mass', () => {
    const report = analyzeValidatedPart(TILTED_CONE);
    const { body } = buildPartScene(TILTED_CONE, report);
    body.updateMatrixWorld(true);
    const nose = body.getObjectByName('add:nose') as Mesh;
    const box = new Box3().setFromObject(nose);
    // rotationDeg [90, 0, 0] takes local +z to part −y (right-hand rule), so the cone runs from its
    // base at the position toward −y by its length; the picture is shifted by −(centre of mass).
    const c = report.centerOfMass;
    const p = [0.05 - c[0], 0.02 - c[1], -0.01 - c[2]];
    expect(box.max.y).toBeCloseTo(p[1], 6);
    expect(box.min.y).toBeCloseTo(p[1] - 0.1, 6);
    expect(box.min.x).toBeCloseTo(p[0] - 0.02, 4);
    expect(box.max.z).toBeCloseTo(p[2] + 0.02, 4);
  });

  it('ghosts removals, marks point masses and draws the principal and spin axes', () => {
    const report = analyzeValidatedPart(PRACTICE_RACKET);
    const scene = buildPartScene(PRACTICE_RACKET, report);
    const bore = scene.body.getObjectByName('remove:bore') as Mesh;
    const grip = scene.body.getObjectByName('add:grip') as Mesh;
    const boreMaterial = bore.material as { transparent: boolean; opacity: number };
    expect(boreMaterial.transparent).toBe(true);
    expect(boreMaterial.opacity).toBeLessThan(0.5);
    expect((grip.material as { transparent: boolean }).transparent).toBe(false);
    expect(scene.body.getObjectByName('point:tape')!.children).toHaveLength(1);
    // The rods are built along +y and turned onto their axes.
    report.principal.axes.forEach((axis, i) => {
      const rod = scene.body.getObjectByName(`axis:${['major', 'intermediate', 'minor'][i]}`)!;
      const d = new Vector3(0, 1, 0).applyQuaternion(rod.quaternion);
      expect(d.distanceTo(new Vector3(...axis))).toBeLessThan(1e-9);
    });
    const spin = new Vector3(0, 1, 0).applyQuaternion(scene.body.getObjectByName('axis:spin')!.quaternion);
    expect(spin.distanceTo(new Vector3(1, 0, 0))).toBeLessThan(1e-9);
    // The racket is 0.53 m long; about its centre of mass it reaches a little over half of that.
    expect(scene.reach).toBeGreaterThan(0.25);
    expect(scene.reach).toBeLessThan(0.45);
    expect(scene.notDrawn).toEqual([]);
  });

  it('lists uploaded meshes it cannot draw', () => {
    const doc = {
      ...TILTED_CONE,
      primitives: [
        ...TILTED_CONE.primitives,
        { id: 'scan', shape: 'mesh', meshId: 'm-1', scale: 0.001, position: [0, 0, 0], rotationDeg: [0, 0, 0], density: 900, mode: 'add' },
      ],
    };
    const report = analyzeValidatedPart(TILTED_CONE);
    expect(buildPartScene(doc as never, report).notDrawn).toEqual(['scan']);
  });

  it('frees every geometry when disposed', () => {
    const spy = jest.spyOn(BufferGeometry.prototype, 'dispose');
    const scene = buildPartScene(PRACTICE_RACKET, analyzeValidatedPart(PRACTICE_RACKET));
    let geometries = 0;
    scene.body.traverse((o) => {
      if ('geometry' in o && o.geometry) geometries++;
    });
    disposeObject(scene.body);
    expect(spy.mock.calls.length).toBeGreaterThanOrEqual(geometries);
    spy.mockRestore();
  });

  describe('uploaded meshes', () => {
    // A corner tetrahedron with legs of 40 mm (file units mm, scale 0.001). Its centroid is the mean
    // of its corners, a/4 along each axis (CRC Standard Mathematical Tables, centroid of a tetrahedron).
    const a = 40;
    const corners = [
      [0, 0, 0],
      [a, 0, 0],
      [0, a, 0],
      [0, 0, a],
    ];
    const triangles = [
      [0, 2, 1],
      [0, 1, 3],
      [0, 3, 2],
      [1, 2, 3],
    ];
    const positions = new Float32Array(triangles.flatMap((t) => t.flatMap((k) => corners[k])));
    const uploaded = {
      id: 'scan',
      shape: 'mesh',
      meshId: 'm-1',
      scale: 0.001,
      position: [0, 0, 0],
      rotationDeg: [0, 0, 0],
      density: 900,
      mode: 'add',
    };
    const doc = {
      name: 'Scan',
      primitives: [uploaded],
      spin: { axis: [0, 0, 1], rate: 5, misalignmentDeg: 1 },
      dissipative: false,
    } as never;
    // The report of the same solid given inline, as the server computes it for the upload.
    const report = analyzeValidatedPart({
      ...(doc as object),
      primitives: [{ ...uploaded, meshId: undefined, vertices: corners, triangles }],
    } as never);

    it('draws a mesh the lookup has, times its scale, centred on the centre of mass', () => {
      report.centerOfMass.forEach((c) => expect(c).toBeCloseTo(0.04 / 4, 9));
      const geometry = meshGeometryFromData(positions, 0.001);
      const lookup = jest.fn(() => ({ state: 'ready' as const, geometry }));
      const scene = buildPartScene(doc, report, lookup);
      expect(lookup).toHaveBeenCalledWith('m-1', 0.001);
      expect(scene.uploadedMeshes).toEqual({ drawn: ['scan'], pending: [], failed: [] });
      expect(scene.notDrawn).toEqual([]);
      scene.body.updateMatrixWorld(true);
      const box = new Box3().setFromObject(scene.body.getObjectByName('add:scan')!);
      box.min.toArray().forEach((v) => expect(v).toBeCloseTo(-0.01, 6));
      box.max.toArray().forEach((v) => expect(v).toBeCloseTo(0.03, 6));
      // Reach: the farthest corner of the bounding box from the centre of mass, (0.03, 0.03, 0.03) m.
      expect(scene.reach).toBeCloseTo(Math.hypot(0.03, 0.03, 0.03), 6);
    });

    it('lists a mesh still loading or failed, and draws it once the cache has it', async () => {
      let release: (b: Float32Array) => void = () => undefined;
      const changed = jest.fn();
      const cache = new MeshGeometryCache(() => new Promise<Float32Array>((r) => (release = r)), changed);
      const lookup = (id: string, scale: number) => cache.lookup(id, scale);
      expect(buildPartScene(doc, report, lookup).uploadedMeshes).toEqual({ drawn: [], pending: ['scan'], failed: [] });
      release(positions);
      await new Promise((r) => setTimeout(r, 0));
      expect(changed).toHaveBeenCalled();
      expect(buildPartScene(doc, report, lookup).uploadedMeshes.drawn).toEqual(['scan']);
      const failing = buildPartScene(doc, report, () => ({ state: 'failed', message: 'Mesh was not found.' }));
      expect(failing.uploadedMeshes.failed).toEqual([{ id: 'scan', message: 'Mesh was not found.' }]);
      expect(failing.notDrawn).toEqual(['scan']);
      expect(failing.body.getObjectByName('add:scan')).toBeUndefined();
    });
  });
});
