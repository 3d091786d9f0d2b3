/** Roles of the principal axes, largest moment first. */
export const AXIS_ROLES = ['major', 'intermediate', 'minor'] as const;
export type AxisRoleName = (typeof AXIS_ROLES)[number];

/** Colours of the viewer's overlays (ours; chosen to stay apart for the common colour-vision deficiencies and against white). */
export const VIEWER_COLOURS = {
  major: '#c0392b',
  intermediate: '#7b3fc4',
  minor: '#11809a',
  spinAxis: '#263238',
  momentum: '#b8860b',
  solid: '#8d9fb3',
  removal: '#e8590c',
  pointMass: '#37474f',
  background: '#f7f8fa',
} as const;

/** On-screen names of the overlays. */
export const AXIS_LABELS: Record<AxisRoleName, string> = {
  major: 'Major axis (largest moment, I1)',
  intermediate: 'Intermediate axis (I2)',
  minor: 'Minor axis (smallest moment, I3)',
};
