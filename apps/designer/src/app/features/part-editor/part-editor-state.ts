import { computed, Injectable, signal } from '@angular/core';
import type { PrimitiveShape } from '@tumblewise/shared';
import { cloneJson, toDraftDocument, type DraftDocument, type DraftPrimitive } from './draft-document';
import { EditHistory } from './edit-history';
import { freshId, newPrimitive } from './new-primitive';
import { applySettings } from './part-settings-model';

/**
 * The part being edited: the working document with undo and redo, and which primitive is selected.
 * Every change makes a new document (never mutated in place). Changes that reshape the list or
 * replace the document (add, delete, reorder, undo, load) bump `revision`, telling the forms to
 * show the document afresh; typing into a field does not, so the cursor stays where it is.
 */
@Injectable()
export class PartEditorState {
  private readonly history = new EditHistory<DraftDocument>(toDraftDocument({}));
  private readonly revisionCounter = signal(0);
  private readonly selected = signal(-1);

  /** The working document (SI). */
  readonly document = this.history.present;
  /** Bumped whenever the document changes other than by typing in a form. */
  readonly revision = this.revisionCounter.asReadonly();
  /** Index of the selected primitive, or -1. */
  readonly selectedIndex = computed(() => {
    const i = this.selected();
    const n = this.document().primitives.length;
    return n === 0 ? -1 : Math.min(Math.max(i, 0), n - 1);
  });
  /** The selected primitive, or null. */
  readonly selectedPrimitive = computed<DraftPrimitive | null>(() => this.document().primitives[this.selectedIndex()] ?? null);
  readonly canUndo = this.history.canUndo;
  readonly canRedo = this.history.canRedo;

  /** Starts editing `document` with an empty history. */
  load(document: DraftDocument): void {
    this.history.reset(document);
    this.selected.set(0);
    this.bump();
  }

  /** Replaces the whole document as one undoable step (import, load a variant, take someone else's save). */
  replace(document: DraftDocument): void {
    this.history.commit(document);
    this.selected.set(0);
    this.bump();
  }

  /** Selects the primitive at `index`. */
  select(index: number): void {
    this.selected.set(index);
  }

  /** Adds a primitive of `shape` at the end and selects it. */
  addPrimitive(shape: PrimitiveShape): void {
    const doc = this.document();
    const primitive = newPrimitive(
      shape,
      doc.primitives.map((p) => p.id),
    );
    this.structural({ ...doc, primitives: [...doc.primitives, primitive] }, doc.primitives.length);
  }

  /** Copies the primitive at `index` (with a fresh id) right after it and selects the copy. */
  duplicatePrimitive(index: number): void {
    const doc = this.document();
    const source = doc.primitives[index];
    if (!source) return;
    const copy = {
      ...cloneJson(source),
      id: freshId(
        `${source.id}-copy`,
        doc.primitives.map((p) => p.id),
      ),
    };
    const primitives = [...doc.primitives];
    primitives.splice(index + 1, 0, copy);
    this.structural({ ...doc, primitives }, index + 1);
  }

  /** Deletes the primitive at `index`. */
  removePrimitive(index: number): void {
    const doc = this.document();
    if (!doc.primitives[index]) return;
    const primitives = doc.primitives.filter((_, i) => i !== index);
    this.structural({ ...doc, primitives }, Math.min(index, primitives.length - 1));
  }

  /** Moves the primitive at `index` by `offset` places (−1 up, +1 down); it stays selected. */
  movePrimitive(index: number, offset: number): void {
    const doc = this.document();
    const target = index + offset;
    if (!doc.primitives[index] || target < 0 || target >= doc.primitives.length) return;
    const primitives = [...doc.primitives];
    const [moved] = primitives.splice(index, 1);
    primitives.splice(target, 0, moved);
    this.structural({ ...doc, primitives }, target);
  }

  /** Switches the primitive at `index` between adding and removing material. */
  setMode(index: number, mode: 'add' | 'remove'): void {
    const doc = this.document();
    const p = doc.primitives[index];
    if (!p || p.mode === mode) return;
    this.structural({ ...doc, primitives: doc.primitives.map((q, i) => (i === index ? { ...q, mode } : q)) }, index);
  }

  /** Puts the form's version of the primitive at `index`; edits of one field coalesce into one undo step. */
  updatePrimitive(index: number, primitive: DraftPrimitive, field: string): void {
    const doc = this.document();
    if (!doc.primitives[index]) return;
    this.history.commit({ ...doc, primitives: doc.primitives.map((p, i) => (i === index ? primitive : p)) }, `primitive:${index}:${field}`);
  }

  /** Changes the part-wide settings (spin, grip, category, dissipative); edits of one field coalesce. */
  updateSettings(changes: Partial<DraftDocument>, field: string): void {
    this.history.commit(applySettings(this.document(), changes), `settings:${field}`);
  }

  /** Ends the current coalesced edit (the field lost focus). */
  endEdit(): void {
    this.history.breakCoalescing();
  }

  /** Undoes the last step. */
  undo(): void {
    if (this.history.undo()) this.bump();
  }

  /** Redoes the last undone step. */
  redo(): void {
    if (this.history.redo()) this.bump();
  }

  private structural(next: DraftDocument, select: number): void {
    this.history.commit(next);
    this.selected.set(select);
    this.bump();
  }

  private bump(): void {
    this.revisionCounter.update((n) => n + 1);
  }
}
