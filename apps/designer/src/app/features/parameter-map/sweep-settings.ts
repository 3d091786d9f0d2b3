import { MAX_SWEEP_POINTS, type DesignFigure, type SweepRequest } from '@tumblewise/shared';
import { displayToSi, roundSignificant, siToDisplay } from '../part-editor/display-value';
import type { DraftDocument } from '../part-editor/draft-document';
import type { ParameterChoice } from './parameter-choices';

/** Steps a new axis starts with: a fine line for one parameter, a 31 × 31 grid for two. */
export const DEFAULT_STEPS = { line: 41, grid: 31 } as const;
/** How far either side of the current value a new axis reaches (±30 %). */
export const DEFAULT_SPAN = 0.3;
/** Significant digits of a default end (display units): 9.45 mm rather than 9.4499999 mm. */
const END_DIGITS = 4;
/** Significant digits kept in SI after conversion (clears mm→m binary noise, as the editor does). */
const SI_DIGITS = 12;

/** One axis as the form holds it: a choice and its ends in the choice's display unit. */
export interface AxisSettings {
  choice: ParameterChoice;
  /** Display units. */
  from: number;
  /** Display units. */
  to: number;
  steps: number;
}

/**
 * The default ends of an axis, in the choice's display unit: ±30 % around the current value. A
 * value of 0 has no such span: a position then reaches ±`scale` (the primitive's size), an inner
 * or top radius runs from 0 to 90 % of `scale`.
 */
export function defaultEnds(choice: ParameterChoice, scale: number): { from: number; to: number } {
  const shown = (si: number) => roundSignificant(siToDisplay(si, choice.units) ?? 0, END_DIGITS);
  const v = choice.current;
  if (v !== 0) {
    const [a, b] = [v * (1 - DEFAULT_SPAN), v * (1 + DEFAULT_SPAN)];
    return { from: shown(Math.min(a, b)), to: shown(Math.max(a, b)) };
  }
  if (choice.parameter.startsWith('position.')) return { from: shown(-scale), to: shown(scale) };
  return { from: 0, to: shown(0.9 * scale) };
}

/** A length that sizes a primitive (SI): its first positive dimension, else 10 mm (a point mass). */
export function primitiveScale(doc: DraftDocument, primitiveId: string): number {
  const p = doc.primitives.find((x) => x.id === primitiveId);
  for (const key of ['radius', 'majorRadius', 'length', 'size', 'semiAxes']) {
    const raw = p?.[key];
    const value = Array.isArray(raw) ? Math.max(...raw.filter((x): x is number => typeof x === 'number')) : raw;
    if (typeof value === 'number' && Number.isFinite(value) && value > 0) return value;
  }
  return 0.01;
}

/** The number of grid points of these step counts (their product). */
export function totalPoints(steps: readonly number[]): number {
  return steps.reduce((n, s) => n * s, 1);
}

/** Why a grid of these step counts is too large to send, in a sentence; null when it fits. */
export function pointLimitMessage(steps: readonly number[]): string | null {
  const total = totalPoints(steps);
  if (total <= MAX_SWEEP_POINTS) return null;
  const grouped = (n: number) => n.toLocaleString('en-GB').replace(/,/g, ' ');
  const product = steps.length > 1 ? `${steps.join(' × ')} = ${grouped(total)}` : grouped(total);
  return `${product} grid points is more than one map may hold (${grouped(MAX_SWEEP_POINTS)}). Use fewer steps.`;
}

/**
 * The sweep request for the draft: each axis's ends converted from display units to SI, its step
 * count as given, and the figures to record. Assumes the settings passed the form's checks.
 */
export function sweepRequest(doc: DraftDocument, axes: readonly AxisSettings[], figures: readonly DesignFigure[]): SweepRequest {
  const si = (value: number, a: AxisSettings) => roundSignificant(displayToSi(value, a.choice.units) ?? Number.NaN, SI_DIGITS);
  return {
    part: doc as unknown as SweepRequest['part'],
    axes: axes.map((a) => ({
      primitive: a.choice.primitive,
      parameter: a.choice.parameter,
      from: si(a.from, a),
      to: si(a.to, a),
      steps: a.steps,
    })),
    figures: [...figures],
  };
}
