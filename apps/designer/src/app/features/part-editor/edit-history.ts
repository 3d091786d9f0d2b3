import { computed, signal, type Signal, type WritableSignal } from '@angular/core';

/** Most steps kept for undo. */
export const HISTORY_LIMIT = 200;

/**
 * Undo and redo over immutable snapshots. Consecutive commits with the same `coalesceKey` (typing
 * into one field) replace the newest step instead of adding one, so one undo takes back the whole
 * edit of that field; `breakCoalescing()` (on blur) or any other key starts a new step.
 */
export class EditHistory<T> {
  private readonly past = signal<readonly T[]>([]);
  private readonly future = signal<readonly T[]>([]);
  private readonly presentValue: WritableSignal<T>;
  private lastKey: string | null = null;

  /** The current snapshot. */
  readonly present: Signal<T>;
  /** Whether there is a step to undo. */
  readonly canUndo = computed(() => this.past().length > 0);
  /** Whether there is an undone step to redo. */
  readonly canRedo = computed(() => this.future().length > 0);

  constructor(
    initial: T,
    private readonly limit = HISTORY_LIMIT,
  ) {
    this.presentValue = signal(initial);
    this.present = this.presentValue.asReadonly();
  }

  /** Makes `next` the present; the old present becomes undoable unless this continues the same coalesced edit. */
  commit(next: T, coalesceKey: string | null = null): void {
    if (Object.is(next, this.presentValue())) return;
    const continuing = coalesceKey !== null && coalesceKey === this.lastKey && this.past().length > 0;
    if (!continuing) this.past.update((steps) => [...steps, this.presentValue()].slice(-this.limit));
    this.presentValue.set(next);
    this.future.set([]);
    this.lastKey = coalesceKey;
  }

  /** Ends the current coalesced edit: the next commit is a step of its own. */
  breakCoalescing(): void {
    this.lastKey = null;
  }

  /** Steps back; returns the new present, or null when there is nothing to undo. */
  undo(): T | null {
    const steps = this.past();
    if (steps.length === 0) return null;
    const previous = steps[steps.length - 1];
    this.past.set(steps.slice(0, -1));
    this.future.update((f) => [this.presentValue(), ...f]);
    this.presentValue.set(previous);
    this.lastKey = null;
    return previous;
  }

  /** Steps forward again; returns the new present, or null when there is nothing to redo. */
  redo(): T | null {
    const ahead = this.future();
    if (ahead.length === 0) return null;
    const next = ahead[0];
    this.future.set(ahead.slice(1));
    this.past.update((steps) => [...steps, this.presentValue()]);
    this.presentValue.set(next);
    this.lastKey = null;
    return next;
  }

  /** Starts over from `value` with no history (a freshly loaded part). */
  reset(value: T): void {
    this.past.set([]);
    this.future.set([]);
    this.presentValue.set(value);
    this.lastKey = null;
  }
}
