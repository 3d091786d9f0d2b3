import { analyzeValidatedPart } from '@tumblewise/engine';
import { Box3, BufferGeometry, Mesh, Vector3 } from 'three';
import { PRACTICE_RACKET, TILTED_CONE } from '../testing/demo-parts';
import { disposeObject } from './dispose-object';
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
    const doc = { ...TILTED_CONE, primitives: [...TILTED_CONE.primitives, { id: 'scan', shape: 'mesh', meshId: 'm-1', scale: 0.001, position: [0, 0, 0], rotationDeg: [0, 0, 0], density: 900, mode: 'add' }] };
    const report = analyzeValidatedPart(TILTED_CONE);
    expect(buildPartScene(doc as never, report).notDrawn).toEqual(['scan']);
  });

  it('frees every geometry when disposed', () => {
    const spy = jest.spyOn(BufferGeometry.prototype, 'dispose');
    const scene = buildPartScene(PRACTICE_RACKET, analyzeValidatedPart(PRACTICE_RACKET));
    let geometries = 0;
    scene.body.traverse((o) => { if ((o as Mesh).geometry) geometries++; });
    disposeObject(scene.body);
    expect(spy.mock.calls.length).toBeGreaterThanOrEqual(geometries);
    spy.mockRestore();
  });
});
