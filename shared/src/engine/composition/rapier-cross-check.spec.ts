import RAPIER from '@dimforge/rapier3d-compat';
import { mat3, identity } from '../linear/mat3';
import { quatFromMat3 } from '../linear/quaternion';
import { rotationFromDegrees } from '../linear/rotation-from-degrees';
import { principalAxes } from '../principal/principal-axes';
import { boxSolid } from '../primitives/box';
import { capsuleSolid } from '../primitives/capsule';
import { cylinderSolid } from '../primitives/cylinder';
import { frustumSolid } from '../primitives/frustum';
import { createSolid, type Solid } from '../primitives/solid';
import { sphereSolid } from '../primitives/sphere';
import { expectArrayClose, expectRelClose } from '../testing/expect-close';
import type { Body } from './body';
import { composeBodies } from './compose-bodies';
import { placeSolid } from './place-solid';

// Cross-check against @dimforge/rapier3d-compat 0.21 (a general-purpose physics engine's mass
// properties). It computes in float32: ~1e-7 relative per primitive, 1e-5..1e-4 for compounds.
// Its round shapes take their axis along y; ours along z, so ours are rotated by −90° about x.

let world: RAPIER.World;
beforeAll(async () => {
  await RAPIER.init();
  world = new RAPIER.World({ x: 0, y: 0, z: 0 });
});

/** Rapier's mass, centre and principal moments of a body with the given collider descriptions. */
function rapierBody(descs: RAPIER.ColliderDesc[]): { mass: number; com: number[]; moments: number[] } {
  const rb = world.createRigidBody(RAPIER.RigidBodyDesc.dynamic());
  for (const d of descs) world.createCollider(d, rb);
  rb.recomputeMassPropertiesFromColliders();
  const com = rb.localCom();
  const pi = rb.principalInertia();
  const out = { mass: rb.mass(), com: [com.x, com.y, com.z], moments: [pi.x, pi.y, pi.z].sort((a, b) => b - a) };
  world.removeRigidBody(rb);
  return out;
}

const Y_TO_Z = rotationFromDegrees(mat3(), -90, 0, 0); // Rx(−90°) maps our local z onto rapier's y
const I3 = identity(mat3());

function ours(solid: Solid, density: number, rotation = I3, position = [0, 0, 0]): Body {
  return placeSolid(undefined, solid, density, rotation, position);
}

describe('primitives against rapier3d-compat (float32 tolerance)', () => {
  const rho = 1200;
  const cases: [string, Solid, RAPIER.ColliderDesc][] = [
    ['box 0.3×0.05×0.02', boxSolid(createSolid(), 0.3, 0.05, 0.02), RAPIER.ColliderDesc.cuboid(0.15, 0.025, 0.01)],
    ['sphere r 0.11', sphereSolid(createSolid(), 0.11), RAPIER.ColliderDesc.ball(0.11)],
    ['cylinder r 0.0135 h 0.19', cylinderSolid(createSolid(), 0.0135, 0.19), RAPIER.ColliderDesc.cylinder(0.095, 0.0135)],
    ['cone r 0.04 h 0.3', frustumSolid(createSolid(), 0.04, 0, 0.3), RAPIER.ColliderDesc.cone(0.15, 0.04)],
    ['capsule r 0.02 h 0.1', capsuleSolid(createSolid(), 0.02, 0.1), RAPIER.ColliderDesc.capsule(0.05, 0.02)],
  ];
  it.each(cases)('%s: mass and principal moments agree to 2e-6', (_name, solid, desc) => {
    const r = rapierBody([desc.setDensity(rho)]);
    const b = ours(solid, rho);
    expectRelClose(b.mass, r.mass, 2e-6, 'mass');
    const p = principalAxes(undefined, b.inertia);
    for (let i = 0; i < 3; i++) expectRelClose(p.moments[i], r.moments[i], 2e-6, `moment ${i}`);
  });

  it('a 200-primitive compound (seeded, rotated, offset) agrees in mass, centre and principal moments to 1e-4', () => {
    let seed = 12345;
    const rnd = () => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32;
    const descs: RAPIER.ColliderDesc[] = [];
    const bodies: Body[] = [];
    for (let k = 0; k < 200; k++) {
      const rot = rotationFromDegrees(mat3(), 360 * rnd() - 180, 180 * rnd() - 90, 360 * rnd() - 180);
      const pos = [rnd() - 0.5, rnd() - 0.5, 2 * rnd() - 1];
      const density = 300 + 3000 * rnd();
      const q = quatFromMat3(new Float64Array(4), rot);
      let desc: RAPIER.ColliderDesc;
      if (k % 2 === 0) {
        const [a, b, c] = [0.01 + 0.1 * rnd(), 0.01 + 0.1 * rnd(), 0.01 + 0.1 * rnd()];
        bodies.push(ours(boxSolid(createSolid(), a, b, c), density, rot, pos));
        desc = RAPIER.ColliderDesc.cuboid(a / 2, b / 2, c / 2);
      } else {
        const r = 0.005 + 0.05 * rnd();
        bodies.push(ours(sphereSolid(createSolid(), r), density, rot, pos));
        desc = RAPIER.ColliderDesc.ball(r);
      }
      descs.push(desc.setDensity(density).setTranslation(pos[0], pos[1], pos[2]).setRotation({ x: q[0], y: q[1], z: q[2], w: q[3] }));
    }
    const r = rapierBody(descs);
    const b = composeBodies(undefined, bodies);
    expectRelClose(b.mass, r.mass, 1e-5, 'mass');
    expectArrayClose(b.center, r.com, 1e-5, 1, 'centre');
    const p = principalAxes(undefined, b.inertia);
    expectArrayClose(p.moments, r.moments, 1e-4, p.moments[0], 'principal moments');
  });

  it("our round shapes, rotated so their axis lies along y, match rapier's y-axis shapes including the cone centre", () => {
    // Rapier centres its cone at half height; ours has the base at the origin, centroid h/4 above.
    const h = 0.3,
      r = 0.04;
    const b = ours(frustumSolid(createSolid(), r, 0, h), rho, Y_TO_Z, [0, -h / 2, 0]);
    const rr = rapierBody([RAPIER.ColliderDesc.cone(h / 2, r).setDensity(rho)]);
    expectArrayClose(b.center, rr.com, 1e-6, h, 'cone centre');
  });
});
