import { TestBed } from '@angular/core/testing';
import type { DraftDocument } from './draft-document';
import { PartEditorState } from './part-editor-state';

const EMPTY: DraftDocument = { name: 'Baton', primitives: [], spin: { axis: [0, 0, 1], rate: 20, misalignmentDeg: 1 } };

describe('PartEditorState', () => {
  let state: PartEditorState;
  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [PartEditorState] });
    state = TestBed.inject(PartEditorState);
    state.load(EMPTY);
  });

  const ids = () => state.document().primitives.map((p) => p.id);

  it('adds primitives from the palette with fresh ids and selects the new one', () => {
    state.addPrimitive('cylinder');
    state.addPrimitive('cylinder');
    state.addPrimitive('sphere');
    expect(ids()).toEqual(['cylinder-1', 'cylinder-2', 'sphere-1']);
    expect(state.selectedIndex()).toBe(2);
    expect(state.document().primitives[2]).toMatchObject({ shape: 'sphere', radius: 0.03, density: 700, mode: 'add' });
  });

  it('duplicates, reorders and deletes, each one undoable step', () => {
    state.addPrimitive('box');
    state.addPrimitive('torus');
    state.duplicatePrimitive(0);
    expect(ids()).toEqual(['box-1', 'box-1-copy-1', 'torus-1']);
    state.movePrimitive(2, -2);
    expect(ids()).toEqual(['torus-1', 'box-1', 'box-1-copy-1']);
    expect(state.selectedIndex()).toBe(0);
    state.removePrimitive(1);
    expect(ids()).toEqual(['torus-1', 'box-1-copy-1']);
    state.undo();
    expect(ids()).toEqual(['torus-1', 'box-1', 'box-1-copy-1']);
    state.undo();
    expect(ids()).toEqual(['box-1', 'box-1-copy-1', 'torus-1']);
    state.redo();
    state.redo();
    expect(ids()).toEqual(['torus-1', 'box-1-copy-1']);
  });

  it('ignores moves past either end', () => {
    state.addPrimitive('box');
    state.addPrimitive('cone');
    const before = state.document();
    state.movePrimitive(0, -1);
    state.movePrimitive(1, 1);
    expect(state.document()).toBe(before);
  });

  it('switches a primitive to removing material', () => {
    state.addPrimitive('cylinder');
    state.setMode(0, 'remove');
    expect(state.document().primitives[0]['mode']).toBe('remove');
    state.undo();
    expect(state.document().primitives[0]['mode']).toBe('add');
  });

  it('bumps the revision on structural changes and undo, not while typing', () => {
    state.addPrimitive('cylinder');
    const afterAdd = state.revision();
    const p = state.document().primitives[0];
    state.updatePrimitive(0, { ...p, radius: 0.02 }, 'radius');
    state.updatePrimitive(0, { ...p, radius: 0.021 }, 'radius');
    expect(state.revision()).toBe(afterAdd);
    state.undo();
    expect(state.revision()).toBe(afterAdd + 1);
    // Both keystrokes into the radius were one step.
    expect(state.document().primitives[0]['radius']).toBe(0.015);
  });

  it('replaces the document as one undoable step (import, load a variant)', () => {
    state.addPrimitive('capsule');
    const mine = state.document();
    state.replace({ ...EMPTY, name: 'Imported', primitives: [{ id: 'head', shape: 'sphere', radius: 0.04, density: 1100 }] });
    expect(state.document().name).toBe('Imported');
    state.undo();
    expect(state.document()).toBe(mine);
  });

  it('starts a loaded part with an empty history', () => {
    state.addPrimitive('box');
    state.load(EMPTY);
    expect(state.canUndo()).toBe(false);
    expect(state.selectedPrimitive()).toBeNull();
  });
});
