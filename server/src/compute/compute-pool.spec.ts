import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { analyzePart } from '@tumblewise/engine';
import racket from '../../../shared/src/engine/examples/junior-racket.json';
import { ComputePool, EVENT_LOOP_ANALYSIS_PRIMITIVES, isSmallAnalysis } from './compute-pool';

const box = { shape: 'box', size: [0.1, 0.1, 0.1], density: 1000 };
const part = (primitives: unknown[]) => ({ primitives, spin: { axis: [0, 0, 1], rateRpm: 600 } });

describe('which tasks run on the event loop', () => {
  it('takes a small analysis of primitives without meshes', () => {
    expect(isSmallAnalysis({ kind: 'analyze', part: part([box, box, box]) })).toBe(true);
    expect(isSmallAnalysis({ kind: 'analyze', part: part(Array(EVENT_LOOP_ANALYSIS_PRIMITIVES).fill(box)) })).toBe(true);
  });

  it('sends larger parts, meshes, simulations and unreadable documents to a worker', () => {
    expect(isSmallAnalysis({ kind: 'analyze', part: part(Array(EVENT_LOOP_ANALYSIS_PRIMITIVES + 1).fill(box)) })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: part([box, { shape: 'mesh', vertices: [], triangles: [], density: 1000 }]) })).toBe(
      false,
    );
    expect(isSmallAnalysis({ kind: 'analyze', part: part([box]), references: { meshes: { m1: new Uint8Array(84) } } })).toBe(false);
    expect(isSmallAnalysis({ kind: 'simulate', input: { part: part([box]) } })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: null })).toBe(false);
    expect(isSmallAnalysis({ kind: 'analyze', part: { primitives: 'many' } })).toBe(false);
  });
});

describe('the compute pool', () => {
  const pool = new ComputePool(1);
  afterAll(() => pool.close());
  const racketJson = JSON.stringify(racket);

  it('analyses a document given as JSON text to the engine’s own report, as JSON text', async () => {
    const text = await pool.analyzeJson(racketJson, undefined);
    expect(JSON.parse(text)).toEqual(JSON.parse(JSON.stringify(analyzePart(racket))));
  });

  it('asks for the stored materials and meshes a document names, once, and analyses with them', async () => {
    const lead = '00000000-0000-4000-8000-00000000000a';
    const doc = {
      primitives: [
        { id: 'ball', shape: 'sphere', radius: 0.05, materialId: lead },
        { id: 'cap', shape: 'sphere', radius: 0.01, position: [0, 0, 0.06], materialId: lead },
      ],
      spin: { axis: [0, 0, 1], rate: 5 },
    };
    const load = jest.fn(async () => ({ materials: { [lead]: { density: 11340 } } }));
    const report = JSON.parse(await pool.analyzeJson(JSON.stringify(doc), load));
    expect(load).toHaveBeenCalledTimes(1);
    expect(load).toHaveBeenCalledWith({ materialIds: [lead], meshIds: [] });
    // Sphere volume 4/3·π·r³ (standard table).
    expect(report.mass).toBeCloseTo(11340 * (4 / 3) * Math.PI * (0.05 ** 3 + 0.01 ** 3), 9);
    const noLookup = jest.fn();
    await pool.analyzeJson(racketJson, noLookup);
    expect(noLookup).not.toHaveBeenCalled();
  });

  it('refuses text that is not JSON, and a document with a bad field, naming it', async () => {
    await expect(pool.analyzeJson('{"primitives": [', undefined)).rejects.toMatchObject({ status: 400, code: 'invalid_json' });
    const bad = structuredClone(racket) as { primitives: { radius?: number }[] };
    const first = bad.primitives.findIndex((p) => p.radius !== undefined);
    bad.primitives[first].radius = -1;
    await expect(pool.analyzeJson(JSON.stringify(bad), undefined)).rejects.toMatchObject({
      status: 400,
      field: `primitives[${first}].radius`,
    });
  });

  it('keeps the analyses queued behind a cancelled simulation: cancelling ends only that thread', async () => {
    const controller = new AbortController();
    const long = pool.run(
      {
        kind: 'simulate',
        input: { moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 400, misalignmentDeg: 1, seconds: 600, sampleRate: 1 },
      },
      controller.signal,
    );
    const analyses = Array.from({ length: 12 }, () => pool.analyzeJson(racketJson, undefined));
    await new Promise((r) => setTimeout(r, 50));
    controller.abort();
    await expect(long).rejects.toMatchObject({ status: 499 });
    const reports = (await Promise.all(analyses)).map((text) => JSON.parse(text));
    expect(reports).toHaveLength(12);
    expect(new Set(reports.map((r) => r.mass)).size).toBe(1);
  });
});

describe('a pool of one thread', () => {
  const pool = new ComputePool(1);
  afterAll(() => pool.close());

  it('still runs a short simulation while a long one holds a thread (MIN_INTERRUPTIBLE_THREADS)', async () => {
    const controller = new AbortController();
    const long = pool.run(
      {
        kind: 'simulate',
        input: { moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 1500, misalignmentDeg: 1, seconds: 600, sampleRate: 1 },
      },
      controller.signal,
    );
    let longSettled = false;
    long.then(
      () => (longSettled = true),
      () => (longSettled = true),
    );
    const short = await pool.run<object>({
      kind: 'simulate',
      input: { moments: [6.5, 5, 2.5], axis: 'major', rate: 10, misalignmentDeg: 1, seconds: 1, sampleRate: 50 },
    });
    expect(short).toBeTruthy();
    expect(longSettled).toBe(false); // answered while the long one was still running
    controller.abort();
    await expect(long).rejects.toMatchObject({ status: 499 });
  });
});

describe('the compute threads’ code', () => {
  it('loads no mathjs (a small heap keeps the schema checks fast)', () => {
    const script =
      "require('tsx/cjs/api').register(); require('./server/src/compute/compute-tasks.ts');" +
      " console.log(JSON.stringify(Object.keys(require.cache).filter((k) => k.includes('node_modules'))));";
    const loaded = JSON.parse(
      execFileSync(process.execPath, ['-e', script], { cwd: path.resolve(__dirname, '../../..'), encoding: 'utf8' }),
    ) as string[];
    expect(loaded.some((k) => k.includes('/zod/'))).toBe(true); // the check sees what the engine loads
    expect(loaded.filter((k) => k.includes('/mathjs/'))).toEqual([]);
  });
});
