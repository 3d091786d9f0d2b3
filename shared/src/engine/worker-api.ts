// The engine's entry for the server's compute threads: the analyses, the simulation, the scatter
// study and the STL checks, without the display-unit conversions of `public-api.ts`. Nothing here
// loads mathjs, so a worker thread's heap holds only the engine and its schemas; zod's many small
// allocations run several times faster in such a small heap (measured; see DEVELOPERS.md,
// "Benchmarks"). `compute-tasks.spec.ts` checks that no mathjs module is loaded.
export { analyzePart, analyzeValidatedPart } from './report/analyze-part';
export type { SpinReport } from './report/spin-report';
export { validatePartDocument } from './part/validate-part-document';
export { EngineInputError, type InputIssue } from './part/engine-input-error';
export type { PartResolvers, ResolvedMaterial, ResolvedMesh } from './part/part-mass-properties';
export { simulate } from './motion/simulate';
export type { MeshProblem } from './mesh/mesh-problem';
export { parseStl } from './mesh/parse-stl';
export { meshMassProperties } from './mesh/mesh-mass-properties';
export { runScatterStudy } from './scatter/scatter-study';
export { rotationFromDegrees } from './linear/rotation-from-degrees';
export { goalSeek, type GoalSeekRequest, type GoalSeekResult } from './design/goal-seek';
export { sweepDesign, type DesignSweepRequest, type SweepResult, type SweepProgress } from './design/sweep';
export type { DesignOptions } from './design/design-figures';
export { solveDesignRequest, sweepDesignRequest } from './design/design-requests';
