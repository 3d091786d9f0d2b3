import request from 'supertest';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

// An invented Kestrel Bay practice frame: a 30 × 20 × 700 mm board of wood (600 kg/m³) from the butt at z = 0, with a grip frame.
const W = 0.03,
  T = 0.02,
  RHO = 600;
const frame = (length = 0.7) => ({
  name: 'Kestrel Bay practice frame',
  primitives: [{ id: 'frame', shape: 'box', size: [W, T, length], position: [0, 0, length / 2], density: RHO }],
  spin: { axis: [0, 1, 0], rate: 10 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
});

let t: TestApp;
let token = '';
let workspaceId = '';
beforeAll(async () => {
  t = await startTestApp();
  const owner = await signUp(t.app);
  token = owner.accessToken;
  workspaceId = owner.workspace.id;
});
afterAll(async () => {
  await t.close();
});

describe('POST /solve', () => {
  it('needs a signed-in user', async () => {
    await request(t.app).post('/api/v1/solve').send({}).expect(401);
  });

  it('finds the board length for a mass and balance point: m = ρ·W·T·L (box volume, Machinery’s Handbook), balance at L/2', async () => {
    const res = await request(t.app)
      .post('/api/v1/solve')
      .set(bearer(token))
      .send({
        part: frame(),
        free: [{ primitive: 'frame', parameter: 'size.2', min: 0.5, max: 1 }],
        targets: [
          { figure: 'mass', value: 0.3 },
          { figure: 'balancePoint', max: 0.45 },
        ],
      })
      .expect(200);
    const length = 0.3 / (RHO * W * T);
    expect(res.body.status).toBe('met');
    expect(res.body.changes).toEqual([{ primitive: 'frame', parameter: 'size.2', from: 0.7, to: expect.closeTo(length, 3) }]);
    expect(res.body.part.primitives[0].size[2]).toBeCloseTo(length, 3);
    expect(res.body.report.mass).toBeCloseTo(0.3, 3);
    expect(res.body.achieved).toEqual([
      expect.objectContaining({ figure: 'mass', met: true }),
      expect.objectContaining({ figure: 'balancePoint', met: true }),
    ]);
  });

  it('answers closest with the bound held exactly when the bounds cannot reach the target', async () => {
    const res = await request(t.app)
      .post('/api/v1/solve')
      .set(bearer(token))
      .send({
        part: frame(),
        free: [{ primitive: 'frame', parameter: 'size.2', min: 0.5, max: 0.8 }],
        targets: [{ figure: 'mass', value: 1 }],
      })
      .expect(200);
    expect(res.body.status).toBe('closest');
    expect(res.body.changes[0].to).toBe(0.8);
    expect(res.body.reason).toMatch(/mass/);
  });

  it('refuses a bad request with 400 naming the field, and an unknown primitive by its path', async () => {
    const bad = await request(t.app)
      .post('/api/v1/solve')
      .set(bearer(token))
      .send({
        part: frame(),
        free: [{ primitive: 'frame', parameter: 'size.2', min: 1, max: 0.5 }],
        targets: [{ figure: 'mass', value: 1 }],
      })
      .expect(400);
    expect(bad.body.error.field).toBe('free[0].max');
    const unknown = await request(t.app)
      .post('/api/v1/solve')
      .set(bearer(token))
      .send({
        part: frame(),
        free: [{ primitive: 'handle', parameter: 'radius', min: 0.01, max: 0.02 }],
        targets: [{ figure: 'mass', value: 1 }],
      })
      .expect(400);
    expect(unknown.body.error.field).toBe('free[0].primitive');
    const badPart = await request(t.app)
      .post('/api/v1/solve')
      .set(bearer(token))
      .send({ part: { ...frame(), spin: { axis: [0, 0, 0], rate: 1 } }, free: [], targets: [] })
      .expect(400);
    expect(badPart.body.error.field).toMatch(/^part\.spin\.axis|^free|^targets/);
    for (const body of [null, [], 'text', { part: 1 }]) {
      const res = await request(t.app)
        .post('/api/v1/solve')
        .set(bearer(token))
        .send(JSON.stringify(body))
        .set('content-type', 'application/json');
      expect({ body, status: res.status }).toEqual({ body, status: 400 });
    }
  });

  it('resolves a stored material of the workspace, and only of one the caller belongs to', async () => {
    const material = await request(t.app)
      .post(`/api/v1/workspaces/${workspaceId}/materials`)
      .set(bearer(token))
      .send({ name: 'Kestrel test ash', family: 'wood', density: 680, densityTolerance: 0.05, source: 'Invented for this test' })
      .expect(201);
    const part = frame();
    const { density: _density, ...rest } = part.primitives[0];
    const body = {
      part: { ...part, primitives: [{ ...rest, materialId: material.body.id }] },
      free: [{ primitive: 'frame', parameter: 'size.2', min: 0.5, max: 1 }],
      targets: [{ figure: 'mass', value: 0.3 }],
    };
    const res = await request(t.app).post(`/api/v1/solve?workspace=${workspaceId}`).set(bearer(token)).send(body).expect(200);
    // m = ρ·W·T·L with the material's 680 kg/m³.
    expect(res.body.changes[0].to).toBeCloseTo(0.3 / (680 * W * T), 3);
    const other = await signUp(t.app);
    await request(t.app).post(`/api/v1/solve?workspace=${other.workspace.id}`).set(bearer(token)).send(body).expect(404);
  });
});

describe('POST /sweep', () => {
  it('answers one point per grid value in row-major order, each mass ρ·W·T·L', async () => {
    const res = await request(t.app)
      .post('/api/v1/sweep')
      .set(bearer(token))
      .send({
        part: frame(),
        axes: [
          { primitive: 'frame', parameter: 'size.2', from: 0.6, to: 0.8, steps: 3 },
          { primitive: 'frame', parameter: 'density', from: 500, to: 700, steps: 2 },
        ],
        figures: ['mass', 'steadyMargin'],
      })
      .expect(200);
    expect(res.body.points).toHaveLength(6);
    const expected = [0.6, 0.7, 0.8].flatMap((L) => [500, 700].map((rho) => [L, rho]));
    res.body.points.forEach((p: { values: number[]; figures: { mass: number }; verdict: string }, i: number) => {
      expect(p.values[0]).toBeCloseTo(expected[i][0], 12);
      expect(p.values[1]).toBeCloseTo(expected[i][1], 9);
      expect(p.figures.mass).toBeCloseTo(expected[i][1] * W * T * expected[i][0], 12);
      expect(p.verdict).toMatch(/^(steady|watch|flip-prone)$/);
    });
  });

  it('refuses more than 10 000 points naming the axes', async () => {
    const res = await request(t.app)
      .post('/api/v1/sweep')
      .set(bearer(token))
      .send({
        part: frame(),
        axes: [
          { primitive: 'frame', parameter: 'size.2', from: 0.6, to: 0.8, steps: 101 },
          { primitive: 'frame', parameter: 'density', from: 500, to: 700, steps: 100 },
        ],
        figures: ['mass'],
      })
      .expect(400);
    expect(res.body.error.field).toMatch(/^axes/);
  });
});
