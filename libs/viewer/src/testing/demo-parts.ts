import type { PartDocument } from '@tumblewise/shared';

/**
 * Invented parts for the viewer's tests. A practice racket whose intended spin is about its face
 * normal (x), with a bore, a taped point mass and a hoop; and a cross-shaped toy turned by every
 * placement angle. All figures are made up.
 */
export const PRACTICE_RACKET: PartDocument = {
  name: 'Practice racket',
  primitives: [
    {
      id: 'grip',
      shape: 'cylinder',
      radius: 0.0135,
      length: 0.19,
      position: [0, 0, 0.095],
      rotationDeg: [0, 0, 0],
      density: 650,
      mode: 'add',
    },
    {
      id: 'bore',
      shape: 'cylinder',
      radius: 0.008,
      length: 0.17,
      position: [0, 0, 0.095],
      rotationDeg: [0, 0, 0],
      density: 650,
      mode: 'remove',
    },
    { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], rotationDeg: [0, 0, 0], density: 1500, mode: 'add' },
    {
      id: 'hoop',
      shape: 'torus',
      majorRadius: 0.11,
      minorRadius: 0.008,
      position: [0, 0, 0.42],
      rotationDeg: [90, 0, 0],
      density: 1500,
      mode: 'add',
    },
    { id: 'tape', shape: 'point', mass: 0.003, position: [0.11, 0, 0.42], rotationDeg: [0, 0, 0], mode: 'add' },
  ],
  spin: { axis: [1, 0, 0], rate: 31.4, misalignmentDeg: 1 },
  dissipative: false,
} as PartDocument;

/** A cone with a frustum tip, placed and turned, for the placement checks. */
export const TILTED_CONE: PartDocument = {
  name: 'Tilted cone',
  primitives: [
    {
      id: 'nose',
      shape: 'cone',
      radius: 0.02,
      length: 0.1,
      position: [0.05, 0.02, -0.01],
      rotationDeg: [90, 0, 0],
      density: 1200,
      mode: 'add',
    },
    { id: 'tail', shape: 'sphere', radius: 0.01, position: [0.05, 0.02, -0.01], rotationDeg: [0, 0, 0], density: 1200, mode: 'add' },
  ],
  spin: { axis: [0, 1, 0], rate: 10, misalignmentDeg: 1 },
  dissipative: false,
} as PartDocument;
