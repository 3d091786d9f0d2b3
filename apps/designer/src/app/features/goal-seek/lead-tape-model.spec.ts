import { goalSeek } from '@tumblewise/engine';
import { partDocumentSchema, type PartDocument, type SolveRequest } from '@tumblewise/shared';
import {
  gripAxisAlong,
  leadTapeId,
  leadTapeProblems,
  leadTapeRequest,
  leadTapeUnavailable,
  tapePlacement,
  type LeadTapeSettings,
} from './lead-tape-model';

// An invented practice board: 30 × 20 × 700 mm of 600 kg/m³, its butt at grip.point, its long axis along the grip axis.
const W = 0.03,
  T = 0.02,
  L = 0.7,
  RHO = 600;
function board(butt: number, sign: 1 | -1): Record<string, unknown> {
  return {
    name: 'Harbour practice board',
    primitives: [{ id: 'board', shape: 'box', size: [W, T, L], position: [0, 0, butt + (sign * L) / 2], density: RHO }],
    spin: { axis: [0, 1, 0], rate: 10 },
    grip: { point: [0, 0, butt], axis: [0, 0, sign], faceNormal: [0, 1, 0] },
  };
}
const SETTINGS: LeadTapeSettings = { maxGrams: 30, fromMm: 600, toMm: 700, swingweight: 287, balanceMm: 360 };

function built(raw: Record<string, unknown>, settings = SETTINGS): { request: SolveRequest; tapeId: string } {
  const result = leadTapeRequest(raw, partDocumentSchema.parse(raw), settings);
  if (!result.ok) throw new Error(result.message);
  return result;
}

describe('lead-tape preset: the request', () => {
  it('adds a point mass on the grip axis in the middle of the zone, with free mass (0.1 g to N) and free place within the zone', () => {
    const raw = board(0, 1);
    const { request, tapeId } = built(raw);
    expect(tapeId).toBe('lead-tape');
    const primitives = request.part.primitives;
    expect(primitives).toHaveLength(2);
    expect(primitives[0]).toEqual((raw['primitives'] as unknown[])[0]);
    // SI: 1 g = 1e-3 kg, 1 mm = 1e-3 m (NIST SP 811, Appendix B.8).
    expect(primitives[1]).toEqual({
      id: 'lead-tape',
      shape: 'point',
      mass: (0.0001 + 0.03) / 2,
      position: [0, 0, expect.closeTo(0.65, 12)],
    });
    expect(request.free).toEqual([
      { primitive: 'lead-tape', parameter: 'mass', min: 0.0001, max: 0.03 },
      { primitive: 'lead-tape', parameter: 'position.2', min: 0.6, max: 0.7 },
    ]);
    expect(request.targets).toEqual([
      { figure: 'swingweight', value: 0.0287 },
      { figure: 'balancePoint', value: 0.36 },
    ]);
    // The rest of the draft goes as stored.
    expect(request.part.grip).toEqual(raw['grip']);
    expect(request.part.spin).toEqual(raw['spin']);
  });

  it('measures the zone from the butt against the direction of the grip axis', () => {
    // Butt at z = 700 mm, long axis toward −z: 600–700 mm from the butt is z = 0 to 100 mm.
    const { request } = built(board(0.7, -1));
    expect(request.free[1]).toEqual({
      primitive: 'lead-tape',
      parameter: 'position.2',
      min: expect.closeTo(0, 12),
      max: expect.closeTo(0.1, 12),
    });
    expect(request.part.primitives[1]).toMatchObject({ position: [0, 0, expect.closeTo(0.05, 12)] });
    // A grip along −x: the x component is free, the others stay on the axis.
    const alongX = { ...board(0, 1), grip: { point: [0.5, 0.01, 0.02], axis: [-1, 0, 0], faceNormal: [0, 1, 0] } };
    const x = built(alongX);
    expect(x.request.free[1]).toMatchObject({ parameter: 'position.0', min: expect.closeTo(-0.2, 12), max: expect.closeTo(-0.1, 12) });
    expect(x.request.part.primitives[1]).toMatchObject({ position: [expect.closeTo(-0.15, 12), 0.01, 0.02] });
  });

  it('takes a free id when the draft already has lead tape', () => {
    const raw = board(0, 1);
    raw['primitives'] = [...(raw['primitives'] as object[]), { id: 'lead-tape', shape: 'point', mass: 0.002, position: [0, 0, 0.65] }];
    const doc = partDocumentSchema.parse(raw);
    expect(leadTapeId(doc)).toBe('lead-tape-2');
    expect(built(raw).request.free.map((f) => f.primitive)).toEqual(['lead-tape-2', 'lead-tape-2']);
  });

  it('is unavailable without a grip frame, or with a grip axis along no part axis', () => {
    const noGrip = partDocumentSchema.parse({ ...board(0, 1), grip: undefined });
    expect(leadTapeUnavailable(noGrip)).toMatch(/no grip frame/);
    const s = Math.SQRT1_2;
    const tilted = partDocumentSchema.parse({ ...board(0, 1), grip: { point: [0, 0, 0], axis: [s, 0, s], faceNormal: [0, 1, 0] } });
    expect(gripAxisAlong(tilted.grip)).toBeNull();
    expect(leadTapeUnavailable(tilted)).toMatch(/axis-aligned grip/);
    const result = leadTapeRequest({}, tilted, SETTINGS);
    expect(result).toEqual({ ok: false, message: expect.stringMatching(/axis-aligned grip/) });
  });

  it('refuses incomplete or contradictory fields', () => {
    expect(leadTapeProblems(SETTINGS)).toEqual({});
    expect(leadTapeProblems({ ...SETTINGS, maxGrams: null })).toEqual({ maxGrams: 'is required' });
    expect(leadTapeProblems({ ...SETTINGS, maxGrams: 0.1 })).toEqual({ maxGrams: 'must be more than 0.1 g' });
    expect(leadTapeProblems({ ...SETTINGS, fromMm: 700, toMm: 650 })).toEqual({ toMm: 'must be beyond the start of the zone' });
    expect(leadTapeProblems({ ...SETTINGS, fromMm: -5 })).toEqual({ fromMm: 'must not be negative' });
    expect(leadTapeProblems({ ...SETTINGS, swingweight: 0 })).toEqual({ swingweight: 'must be greater than zero' });
  });
});

describe('lead-tape preset: solved by the engine, checked with the hand formulas', () => {
  // Board alone: M = ρ·W·T·L, balance at L/2; swingweight about the axis 100 mm from the butt (common practice) across the
  // board: SW0 = M(T² + L²)/12 + M(L/2 − 0.1)² (Machinery's Handbook rectangular prism, I = m(b² + c²)/12, plus the
  // parallel-axis term). Tape m at d from the butt adds m(d − 0.1)² (a point mass, parallel-axis theorem) and moves the
  // balance to (M·L/2 + m·d)/(M + m). The two targets hold along a narrow band of (m, d), so the check is that the
  // solver's tape meets both hand equations within the solver's 0.1 % and stays inside the zone and the mass allowed.
  const M = RHO * W * T * L,
    SW0 = (M * (T * T + L * L)) / 12 + M * (L / 2 - 0.1) ** 2;
  const S = 0.0287,
    B = 0.36;

  it.each([
    ['butt at z = 0, axis +z', 0, 1 as const],
    ['butt at z = 700 mm, axis −z', 0.7, -1 as const],
  ])('puts tape where the swingweight and balance equations hold (%s)', (_name, butt, sign) => {
    const { request, tapeId } = built(board(butt, sign));
    const answer = goalSeek(partDocumentSchema.parse(request.part), { free: request.free, targets: request.targets });
    expect(answer.status).toBe('met');
    const { mass: m, distance: d } = tapePlacement(answer.part as PartDocument, tapeId)!;
    expect(d).toBeGreaterThanOrEqual(0.6 - 1e-12);
    expect(d).toBeLessThanOrEqual(0.7 + 1e-12);
    expect(m).toBeGreaterThanOrEqual(0.0001);
    expect(m).toBeLessThanOrEqual(0.03);
    expect(Math.abs((SW0 + m * (d - 0.1) ** 2) / S - 1)).toBeLessThan(1e-3);
    expect(Math.abs((M * (L / 2) + m * d) / (M + m) / B - 1)).toBeLessThan(1e-3);
  });

  it('reports the tape by its mass and distance from the butt along the grip axis', () => {
    const { request, tapeId } = built(board(0.7, -1));
    const part = partDocumentSchema.parse(request.part);
    // Placed at z = 50 mm on an axis pointing −z from z = 700 mm: 650 mm from the butt.
    expect(tapePlacement(part, tapeId)).toEqual({ mass: expect.closeTo(0.01505, 12), distance: expect.closeTo(0.65, 12) });
    expect(tapePlacement(part, 'no-such-tape')).toBeNull();
  });
});
