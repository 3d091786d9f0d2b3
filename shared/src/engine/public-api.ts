// The mechanics engine's public surface. Nothing else under engine/ is imported from outside, but for
// worker-api.ts (the same analyses without the display units, mathjs, for the server's compute
// threads) and stl-api.ts (the STL reader alone, for the browser's mesh-drawing worker).
export { analyzePart, analyzeValidatedPart, type AnalyzeOptions } from './report/analyze-part';
export type { SpinReport } from './report/spin-report';
export { STANDARD_NOTES } from './report/report-notes';
export { validatePartDocument, type PartValidation } from './part/validate-part-document';
export { EngineInputError, type InputIssue } from './part/engine-input-error';
export {
  partMassProperties,
  type PartMassProperties,
  type PartResolvers,
  type ResolvedMaterial,
  type ResolvedMesh,
} from './part/part-mass-properties';
export type { Body } from './composition/body';
export { principalAxes, EQUAL_MOMENTS_ANALYTIC, EQUAL_MOMENTS_MESH, type PrincipalAxes } from './principal/principal-axes';
export { jacobiEigen } from './principal/jacobi';
export { assessSpin, type SpinAssessment, type AxisRole, type MotionAxis, type FlightTimeSource } from './spin/assess-spin';
export { FLIGHT_TIME_DEFAULTS, FLIGHT_TIME_BASIS, type FlightTimeDefault } from './spin/flight-time-defaults';
export { DEFAULT_VERDICT_THRESHOLDS, type Verdict, type VerdictThresholds } from './spin/verdict-thresholds';
export { intermediateGrowthRate } from './spin/growth-rate';
export { wobbleFrequency } from './spin/wobble-frequency';
export { momentAboutLine } from './trade/moment-about-line';
export {
  tradeFigures,
  radiusOfGyration,
  SWINGWEIGHT_DISTANCE,
  BAT_PIVOT_DISTANCE,
  type TradeFigures,
  type GripFrame,
} from './trade/trade-figures';
export type { CategoryCheck } from './checks/category-check';
export { DISPLAY_UNITS, toDisplay, fromDisplay, convertUnits, type Quantity, type DisplayUnit } from './units/display-units';
export { completeEllipticK } from './motion/complete-elliptic-k';
export { jacobiSnCnDn } from './motion/jacobi-elliptic';
export { exactTorqueFree, type ExactTorqueFree } from './motion/exact-torque-free';
export type { MeshProblem, MeshProblemCode } from './mesh/mesh-problem';
export { simulate, simulateInputSchema, MAX_SIMULATION_SAMPLES, type SimulateInput, type SimulationResult } from './motion/simulate';
export { splittingStep, splittingStep4, type RigidState } from './motion/lie-poisson-splitting';
export { intermediateFlipTime, flipTimeNearSeparatrix } from './spin/flip-time';
export { parseStl, type ParsedMesh, type StlLimits, type StlResult } from './mesh/parse-stl';
export { meshMassProperties, type MeshAnalysis } from './mesh/mesh-mass-properties';
export { validateIndexedMesh, type MeshCheck } from './mesh/validate-mesh';
export { weldVertices } from './mesh/weld-vertices';
export { integrateTriangleSoup, integrateIndexedMesh } from './mesh/integrate-mesh';
export type { Solid } from './primitives/solid';
export { compoundPendulumMoment, trifilarMoment, STANDARD_GRAVITY } from './trade/measured-moments';
export {
  runScatterStudy,
  scatterInputSchema,
  MAX_SCATTER_SAMPLES,
  type ScatterInput,
  type ScatterResult,
  type ScatterProgress,
  type Sensitivity,
} from './scatter/scatter-study';
export type { Distribution } from './scatter/summarize';
export { SeededRandom } from './scatter/seeded-random';
export { DEFAULT_TOLERANCE } from './scatter/part-model';
export { classifySpin, type SpinClass } from './spin/classify-spin';
export { rotationFromDegrees } from './linear/rotation-from-degrees';
export { goalSeek, TARGET_TOLERANCE, type GoalSeekRequest, type GoalSeekResult } from './design/goal-seek';
export { sweepDesign, gridValues, type DesignSweepRequest, type SweepResult, type SweepProgress } from './design/sweep';
export { designFigures, steadyMargin, type DesignOptions } from './design/design-figures';
export {
  readDesignParameter,
  writeDesignParameter,
  designParametersOf,
  writeNamedParameter,
  usesOfParameter,
  type ParameterUse,
} from './design/design-parameters';
export { solveDesignRequest, sweepDesignRequest } from './design/design-requests';
