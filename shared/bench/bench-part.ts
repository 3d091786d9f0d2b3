/**
 * Invented parts for the benchmarks: n boxes, cylinders and spheres, rotated and placed at random
 * from a seeded generator, so every run measures the same documents. Not a real product's geometry.
 */
export function partGenerator(seed = 20240601): (n: number) => Record<string, unknown> {
  const rnd = () => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  return (n) => {
    const primitives = Array.from({ length: n }, (_, k) => {
      const common = {
        id: `p${k}`,
        position: [rnd() - 0.5, rnd() - 0.5, 2 * rnd() - 1],
        rotationDeg: [360 * rnd() - 180, 180 * rnd() - 90, 360 * rnd() - 180],
        density: 300 + 3000 * rnd(),
      };
      if (k % 3 === 0) return { ...common, shape: 'box', size: [0.01 + 0.1 * rnd(), 0.01 + 0.1 * rnd(), 0.01 + 0.1 * rnd()] };
      if (k % 3 === 1) return { ...common, shape: 'cylinder', radius: 0.005 + 0.05 * rnd(), length: 0.01 + 0.2 * rnd() };
      return { ...common, shape: 'sphere', radius: 0.005 + 0.05 * rnd() };
    });
    return {
      name: `bench ${n}`,
      primitives,
      spin: { axis: [0, 0, 1], rate: 20 },
      grip: { point: [0, 0, -1], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
    };
  };
}

/** Id of the primitive the editor benchmark types into. */
export const BALLAST_ID = 'ballast';

/**
 * The 50-primitive part of the web benchmarks: 49 random primitives plus a heavy plate (first in
 * the list) whose thickness the keystroke benchmark edits; 1 mm of it moves the total mass by
 * about 1 %, so every edit shows in the report's four significant digits.
 */
export function editorBenchPart(): Record<string, unknown> {
  const part = partGenerator(4242)(49) as { primitives: unknown[] } & Record<string, unknown>;
  const plate = { id: BALLAST_ID, shape: 'box', size: [0.3, 0.3, 0.04], position: [0, 0, 0], rotationDeg: [0, 0, 0], density: 7800 };
  return { ...part, name: 'Bench plate with 49 fittings', primitives: [plate, ...part.primitives] };
}
