import { Euler, MathUtils, Matrix4, Vector3 } from 'three';
import { placementMatrix, placementRotation, type Triple } from './placement';

// Reference: three.js's own elementary rotations (Matrix4.makeRotationX/Y/Z) and Euler conversion,
// a general-purpose library independent of our written-out product. The part document's rule
// (PRODUCT.md): rotate about fixed x, then fixed y, then fixed z, R = Rz·Ry·Rx.
const ANGLES: Triple[] = [
  [0, 0, 0],
  [90, 0, 0],
  [0, 90, 0],
  [0, 0, 90],
  [30, 45, 60],
  [-20, 110, 5],
  [170, -35, -140],
  [12.5, 0.25, 359],
];
const rad = (d: number) => d * MathUtils.DEG2RAD;

function expectMatrixClose(actual: Matrix4, expected: Matrix4, tolerance = 1e-12): void {
  actual.elements.forEach((v, i) => expect(Math.abs(v - expected.elements[i])).toBeLessThanOrEqual(tolerance));
}

function expectVectorClose(actual: Vector3, expected: [number, number, number], tolerance = 1e-12): void {
  expect(Math.abs(actual.x - expected[0])).toBeLessThanOrEqual(tolerance);
  expect(Math.abs(actual.y - expected[1])).toBeLessThanOrEqual(tolerance);
  expect(Math.abs(actual.z - expected[2])).toBeLessThanOrEqual(tolerance);
}

describe('placementRotation', () => {
  it.each(ANGLES)('equals three.js Rz·Ry·Rx for [%s, %s, %s]', (rx, ry, rz) => {
    const expected = new Matrix4()
      .makeRotationZ(rad(rz))
      .multiply(new Matrix4().makeRotationY(rad(ry)))
      .multiply(new Matrix4().makeRotationX(rad(rx)));
    expectMatrixClose(placementRotation(new Matrix4(), [rx, ry, rz]), expected);
  });

  it.each(ANGLES)('equals three.js Euler order ZYX (not the default XYZ) for [%s, %s, %s]', (rx, ry, rz) => {
    const expected = new Matrix4().makeRotationFromEuler(new Euler(rad(rx), rad(ry), rad(rz), 'ZYX'));
    expectMatrixClose(placementRotation(new Matrix4(), [rx, ry, rz]), expected);
  });

  it('differs from three.js Euler XYZ (Rx·Ry·Rz) when the rotations do not commute', () => {
    const ours = placementRotation(new Matrix4(), [30, 45, 60]);
    const xyz = new Matrix4().makeRotationFromEuler(new Euler(rad(30), rad(45), rad(60), 'XYZ'));
    const gap = Math.max(...ours.elements.map((v, i) => Math.abs(v - xyz.elements[i])));
    expect(gap).toBeGreaterThan(0.1);
  });

  it('rotates about the fixed axes in turn: x first, then y, then z (three.js applyAxisAngle)', () => {
    const v = new Vector3(0.3, -0.7, 0.2);
    const [rx, ry, rz] = [40, -25, 75];
    const stepByStep = v
      .clone()
      .applyAxisAngle(new Vector3(1, 0, 0), rad(rx))
      .applyAxisAngle(new Vector3(0, 1, 0), rad(ry))
      .applyAxisAngle(new Vector3(0, 0, 1), rad(rz));
    const ours = v.clone().applyMatrix4(placementRotation(new Matrix4(), [rx, ry, rz]));
    expectVectorClose(ours, [stepByStep.x, stepByStep.y, stepByStep.z]);
  });

  // Right-hand rule (common practice): +90° about x takes y to z and z to −y; about y takes z to x; about z takes x to y.
  it.each([
    [
      [90, 0, 0],
      [0, 0, 1],
      [0, -1, 0],
    ],
    [
      [90, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ],
    [
      [0, 90, 0],
      [0, 0, 1],
      [1, 0, 0],
    ],
    [
      [0, 0, 90],
      [1, 0, 0],
      [0, 1, 0],
    ],
  ] as [Triple, [number, number, number], [number, number, number]][])('rotationDeg %j takes local %j to %j', (angles, local, expected) => {
    expectVectorClose(new Vector3(...local).applyMatrix4(placementRotation(new Matrix4(), angles)), expected, 1e-15);
  });

  it('is a proper rotation (orthonormal, determinant +1) and writes into out', () => {
    const out = new Matrix4();
    expect(placementRotation(out, [170, -35, -140])).toBe(out);
    expect(out.determinant()).toBeCloseTo(1, 12);
    const t = out.clone().transpose().multiply(out);
    expectMatrixClose(t, new Matrix4(), 1e-12);
  });
});

describe('placementMatrix', () => {
  it('rotates the local frame first, then moves its origin to position', () => {
    const m = placementMatrix(new Matrix4(), [0.01, -0.02, 0.5], [0, 0, 90]);
    expectVectorClose(new Vector3(1, 0, 0).applyMatrix4(m), [0.01, 1 - 0.02, 0.5], 1e-12);
    expectVectorClose(new Vector3(0, 0, 0).applyMatrix4(m), [0.01, -0.02, 0.5], 1e-15);
  });

  it('defaults to no rotation and the origin', () => {
    expectMatrixClose(placementMatrix(new Matrix4()), new Matrix4(), 0);
  });

  it('agrees with three.js Object3D-style composition from Euler ZYX', () => {
    const angles: Triple = [-20, 110, 5];
    const position = new Vector3(0.1, 0.2, -0.3);
    const expected = new Matrix4()
      .makeRotationFromEuler(new Euler(rad(angles[0]), rad(angles[1]), rad(angles[2]), 'ZYX'))
      .setPosition(position);
    expectMatrixClose(placementMatrix(new Matrix4(), [0.1, 0.2, -0.3], angles), expected, 1e-12);
  });
});
