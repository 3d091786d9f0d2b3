import { identity, mat3 } from '../linear/mat3';
import { placeSolid } from '../composition/place-solid';
import { composeBodies } from '../composition/compose-bodies';
import { createBody } from '../composition/body';
import { cylinderSolid } from '../primitives/cylinder';
import { createSolid } from '../primitives/solid';
import { expectRelClose } from '../testing/expect-close';
import { compoundPendulumMoment, STANDARD_GRAVITY, trifilarMoment } from './measured-moments';
import { tradeFigures, SWINGWEIGHT_DISTANCE } from './trade-figures';

const grip = { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] };
const L = 0.68,
  r = 0.0125,
  rho = 700;
const rod = placeSolid(undefined, cylinderSolid(createSolid(), r, L), rho, identity(mat3()), [0, 0, L / 2]);
const m = rod.mass;

describe('trade figures of a uniform round rod from its butt', () => {
  const t = tradeFigures(rod, grip, 0);
  it('balance point L/2 (common practice: centre-of-mass distance from the butt)', () => {
    expectRelClose(t.balancePoint, L / 2, 1e-15);
  });
  it("swingweight about the axis 10 cm from the butt = m(3r² + L²)/12 + m(L/2 − 0.1)² (Machinery's Handbook cylinder + parallel axis)", () => {
    expectRelClose(t.swingweight, (m * (3 * r * r + L * L)) / 12 + m * (L / 2 - SWINGWEIGHT_DISTANCE) ** 2, 1e-14);
  });
  it('recoil weight = swingweight − m(BP − 10 cm)² (common practice)', () => {
    expectRelClose(t.recoilWeight, t.swingweight - m * (t.balancePoint - 0.1) ** 2, 1e-13);
  });
  it('twistweight about the long axis = m r²/2', () => {
    expectRelClose(t.twistweight, (m * r * r) / 2, 1e-14);
  });
  it('centre of percussion of a rod pivoted at its end: I_pivot/(m·d) → 2L/3 for a thin rod (ASTM F2398 definition; classical result)', () => {
    expectRelClose(t.pivot.centreOfPercussion!, (2 * L) / 3 + (r * r) / (2 * L), 1e-13);
  });
  it('a point mass added at distance d from the swingweight axis adds m·d² (rule of thumb, common practice)', () => {
    const tape = createBody();
    tape.mass = 0.005;
    tape.center = [0.05, 0, 0.6];
    const sum = composeBodies(undefined, [rod, tape]);
    // The swing axis is long axis × face normal = −x: distance² from the line through (0, 0, 0.1) along x is y² + (z − 0.1)².
    expectRelClose(tradeFigures(sum, grip).swingweight, t.swingweight + 0.005 * 0.5 ** 2, 1e-13);
  });
});

describe('measured moments', () => {
  it('compound pendulum: a rod pivoted at its end swings with T = 2π√(2L/(3g)), giving I = mL²/3 (Halliday, Resnick & Walker §15-6)', () => {
    const T = 2 * Math.PI * Math.sqrt((2 * 0.9) / (3 * STANDARD_GRAVITY));
    expectRelClose(compoundPendulumMoment(1.2, 0.45, T), (1.2 * 0.9 * 0.9) / 3, 1e-14);
  });
  it('trifilar pendulum: inverts the small-oscillation period T = 2π√(I·L/(M·g·R²)) of a loaded platform (du Bois et al. 2009)', () => {
    const R = 0.15,
      Lw = 1.2,
      Mp = 0.8,
      Ip = 0.5 * Mp * R * R; // a uniform disc platform
    const part = 0.3,
      Ipart = 2.4e-3;
    const T = 2 * Math.PI * Math.sqrt(((Ip + Ipart) * Lw) / ((Mp + part) * STANDARD_GRAVITY * R * R));
    expectRelClose(trifilarMoment(R, Lw, T, Mp, part, Ip), Ipart, 1e-12);
  });
});
