// Engine benchmarks (part of npm run bench). Prints a table and writes .data/bench/engine.json (git-ignored).
// Benchmarks only — no test depends on timings. Each figure is measured in this one run.
import RAPIER from '@dimforge/rapier3d-compat';
import { eigs } from 'mathjs';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import {
  analyzePart,
  analyzeValidatedPart,
  integrateTriangleSoup,
  jacobiEigen,
  meshMassProperties,
  parseStl,
  partMassProperties,
  runScatterStudy,
  splittingStep,
  splittingStep4,
  validatePartDocument,
} from '../src/engine/public-api';
import type { PartDocument } from '../src/schemas/part-document';
import { binaryStl, toSoup, torusMesh } from '../src/engine/testing/tessellate';
import { quatFromMat3 } from '../src/engine/linear/quaternion';
import { rotationFromDegrees } from '../src/engine/linear/rotation-from-degrees';
// The upload check's self-intersection search is server code (it uses three.js); measured here beside the other STL figures.
import { firstSelfIntersection } from '../../server/src/meshes/self-intersection';
import { partGenerator } from './bench-part';
import { designBench } from './design-bench';
import { BenchTable } from './bench-table';

/** Median time (µs) of `fn` over `runs` runs after `warm` warm-up runs. */
function medianMicros(fn: () => void, runs: number, warm = Math.min(50, runs)): number {
  for (let i = 0; i < warm; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const a = process.hrtime.bigint();
    fn();
    t.push(Number(process.hrtime.bigint() - a) / 1e3);
  }
  t.sort((x, y) => x - y);
  return t[Math.floor(t.length / 2)];
}

function rapierMassProperties(world: RAPIER.World, doc: PartDocument): void {
  const rb = world.createRigidBody(RAPIER.RigidBodyDesc.dynamic());
  for (const p of doc.primitives) {
    let d: RAPIER.ColliderDesc;
    if (p.shape === 'box') d = RAPIER.ColliderDesc.cuboid(p.size[0] / 2, p.size[1] / 2, p.size[2] / 2);
    else if (p.shape === 'cylinder') d = RAPIER.ColliderDesc.cylinder(p.length / 2, p.radius);
    else if (p.shape === 'sphere') d = RAPIER.ColliderDesc.ball(p.radius);
    else continue;
    const q = quatFromMat3(
      new Float64Array(4),
      rotationFromDegrees(new Float64Array(9), p.rotationDeg[0], p.rotationDeg[1], p.rotationDeg[2]),
    );
    world.createCollider(
      d
        .setDensity(p.density!)
        .setTranslation(p.position[0], p.position[1], p.position[2])
        .setRotation({ x: q[0], y: q[1], z: q[2], w: q[3] }),
      rb,
    );
  }
  rb.recomputeMassPropertiesFromColliders();
  rb.principalInertia();
  world.removeRigidBody(rb);
}

/** Runs the engine benchmarks; returns the path of the JSON written. */
export async function runEngineBench(): Promise<string> {
  const table = new BenchTable();
  const record = table.record.bind(table);
  const randomPart = partGenerator();
  await RAPIER.init();
  const world = new RAPIER.World({ x: 0, y: 0, z: 0 });

  // 1. Parts of 10, 200 and 2000 primitives.
  for (const n of [10, 200, 2000]) {
    const json = randomPart(n);
    const v = validatePartDocument(json);
    if (!v.ok) throw new Error('bench part invalid');
    const doc = v.value;
    const runs = n === 2000 ? 200 : 1000;
    const mp = medianMicros(() => partMassProperties(doc), runs);
    const full = medianMicros(() => analyzeValidatedPart(doc), runs);
    const withSchema = medianMicros(() => analyzePart(json), Math.min(runs, 300));
    const rap = medianMicros(() => rapierMassProperties(world, doc), Math.min(runs, 200), 20);
    record(`${n} primitives: mass properties (composition)`, mp, 'µs', 'median');
    record(`${n} primitives: full spin report, validated document`, full, 'µs', 'median');
    record(`${n} primitives: analyzePart incl. zod validation`, withSchema, 'µs', 'median');
    record(`${n} primitives: same mass properties through rapier3d-compat`, rap, 'µs', `median; ours ${(rap / mp).toFixed(1)}× faster`);
  }

  // 2. 3×3 symmetric eigen-solve.
  const A = new Float64Array([4, 1, 0.5, 1, 3, 0.2, 0.5, 0.2, 1]);
  const vals = new Float64Array(3),
    vecs = new Float64Array(9);
  const rows3 = [
    [4, 1, 0.5],
    [1, 3, 0.2],
    [0.5, 0.2, 1],
  ];
  const batch = 1000;
  const jac =
    medianMicros(() => {
      for (let i = 0; i < batch; i++) jacobiEigen(A, vals, vecs);
    }, 200) / batch;
  const mlm =
    medianMicros(() => {
      for (let i = 0; i < 100; i++) new EigenvalueDecomposition(new Matrix(rows3), { assumeSymmetric: true });
    }, 100) / 100;
  const mjs =
    medianMicros(
      () => {
        for (let i = 0; i < 20; i++) eigs(rows3, { precision: 1e-15 });
      },
      50,
      5,
    ) / 20;
  record('eigen-solve 3×3: cyclic Jacobi (ours)', jac, 'µs');
  record('eigen-solve 3×3: ml-matrix EigenvalueDecomposition', mlm, 'µs', `${(mlm / jac).toFixed(1)}× ours`);
  record('eigen-solve 3×3: mathjs eigs', mjs, 'µs', `${(mjs / jac).toFixed(1)}× ours`);

  // 3. A 1,000,000-triangle binary STL.
  const torus = torusMesh(0.11, 0.02, 1000, 500);
  const soup = toSoup(torus);
  const bytes = binaryStl(soup, 'bench torus');
  const triangles = soup.length / 9;
  const target = new Float32Array(soup.length);
  const words = new Uint32Array(bytes.buffer, 0, bytes.length >>> 2);
  let sink = 0;
  const plain =
    medianMicros(
      () => {
        let s = 0;
        for (let i = 0; i < words.length; i++) s = (s + words[i]) | 0;
        sink ^= s;
      },
      15,
      3,
    ) / 1e3;
  const parseOnly =
    medianMicros(
      () => {
        parseStl(bytes, { target });
      },
      15,
      3,
    ) / 1e3;
  const parseIntegrate =
    medianMicros(
      () => {
        const r = parseStl(bytes, { target });
        if (!r.ok) throw new Error('bench STL refused');
        integrateTriangleSoup(undefined, r.mesh.corners, r.mesh.triangleCount, 0.001, r.mesh.mean);
      },
      15,
      3,
    ) / 1e3;
  const parsed = parseStl(bytes, { target });
  if (!parsed.ok) throw new Error('bench STL refused');
  const validate =
    medianMicros(
      () => {
        meshMassProperties(parsed.mesh);
      },
      5,
      1,
    ) / 1e3;
  const crossing: number[] = [];
  for (let run = 0; run < 3; run++) {
    const t0 = process.hrtime.bigint();
    if (await firstSelfIntersection(torus.vertices, torus.triangles)) throw new Error('bench torus crosses itself');
    crossing.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  crossing.sort((x, y) => x - y);
  const a0 = process.hrtime.bigint();
  const rb = world.createRigidBody(RAPIER.RigidBodyDesc.dynamic());
  world.createCollider(RAPIER.ColliderDesc.trimesh(Float32Array.from(torus.vertices), Uint32Array.from(torus.triangles)).setDensity(1), rb);
  rb.recomputeMassPropertiesFromColliders();
  const rapierMesh = Number(process.hrtime.bigint() - a0) / 1e6;
  world.removeRigidBody(rb);
  record(
    `STL ${triangles} triangles (${(bytes.length / 1e6).toFixed(0)} MB): one plain pass over the bytes`,
    plain,
    'ms',
    'the memory limit',
  );
  record('STL: parse only (into a reused buffer)', parseOnly, 'ms');
  record(
    'STL: parse + integration',
    parseIntegrate,
    'ms',
    `${(parseIntegrate / plain).toFixed(2)}× the plain pass; ${(((triangles / parseIntegrate) * 1e3) / 1e6).toFixed(1)} M triangles/s`,
  );
  record('STL: weld + topology check + integration (upload path)', validate, 'ms');
  record('STL: search for a surface crossing itself (upload path)', crossing[1], 'ms', 'median of 3; three-mesh-bvh');
  record('STL: rapier3d-compat trimesh mass properties', rapierMesh, 'ms', 'one run');

  // 4. Simulation steps.
  const I = [6.5, 5, 2.5];
  const state = { L: new Float64Array([0.1, 5, 0.05]), q: new Float64Array([0, 0, 0, 1]) };
  const steps = 100_000;
  const s2 = medianMicros(
    () => {
      for (let i = 0; i < steps; i++) splittingStep(state, I, 1e-3);
    },
    9,
    2,
  );
  const s4 = medianMicros(
    () => {
      for (let i = 0; i < steps; i++) splittingStep4(state, I, 1e-3);
    },
    9,
    2,
  );
  record('Lie–Poisson splitting step (2nd order)', ((steps / s2) * 1e6) / 1e6, 'M/s', `${((s2 * 1e3) / steps).toFixed(0)} ns a step`);
  record(
    'Lie–Poisson splitting step (4th-order composition)',
    ((steps / s4) * 1e6) / 1e6,
    'M/s',
    `${((s4 * 1e3) / steps).toFixed(0)} ns a step`,
  );

  // 5. Scatter study: 10,000 samples × 50 primitives.
  const part50 = randomPart(50) as { primitives: { tolerance?: unknown }[] };
  part50.primitives.forEach((p) => (p.tolerance = { density: 0.05, size: 0.0002 }));
  const t0 = process.hrtime.bigint();
  const study = runScatterStudy({ part: part50, samples: 10_000, seed: 1 });
  const scatterMs = Number(process.hrtime.bigint() - t0) / 1e6;
  record('scatter study 10,000 samples × 50 primitives', scatterMs, 'ms', `one run; ${study.sensitivities.length} sensitivities`);

  // 6. Goal seek and design sweep.
  designBench(table);

  return table.write('engine', { sink });
}
