// The engine's STL reader alone (no schemas, no mathjs), for the browser's mesh-drawing worker:
// what the 3-D view draws is read by the same code as what the server analyses.
export { parseStl, type ParsedMesh, type StlLimits, type StlResult } from './mesh/parse-stl';
export type { MeshProblem, MeshProblemCode } from './mesh/mesh-problem';
