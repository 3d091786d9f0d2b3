/*
 * Public surface of the viewer: the 3-D part view with the tumble preview, the charts provider the
 * screens share, and the pure scene and playback helpers (for tests and for other views).
 */
export * from './part-viewer/part-viewer';
export * from './charts/provide-charts';
export * from './charts/chart-style';
export * from './scene/viewer-palette';
export * from './scene/placement';
export * from './scene/primitive-geometry';
export * from './scene/mesh-geometry-source';
export * from './scene/mesh-geometry';
export type { UploadedMeshStatus } from './scene/part-scene';
export * from './tumble/attitude-track';
export * from './tumble/tumble-request';
export * from './tumble/tumble-summary';
export * from './tumble/omega-chart';
