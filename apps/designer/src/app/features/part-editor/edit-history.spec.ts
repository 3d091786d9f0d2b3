import { EditHistory } from './edit-history';

describe('EditHistory', () => {
  it('undoes and redoes steps in order', () => {
    const h = new EditHistory('a');
    h.commit('b');
    h.commit('c');
    expect(h.undo()).toBe('b');
    expect(h.undo()).toBe('a');
    expect(h.undo()).toBeNull();
    expect(h.canUndo()).toBe(false);
    expect(h.redo()).toBe('b');
    expect(h.present()).toBe('b');
    expect(h.canRedo()).toBe(true);
  });

  it('drops the redo steps after a new edit', () => {
    const h = new EditHistory(1);
    h.commit(2);
    h.undo();
    h.commit(3);
    expect(h.canRedo()).toBe(false);
    expect(h.undo()).toBe(1);
  });

  it('coalesces typing into one field into one step, and starts a new one after a blur', () => {
    const h = new EditHistory('');
    h.commit('1', 'radius');
    h.commit('13', 'radius');
    h.commit('13.5', 'radius');
    expect(h.undo()).toBe('');
    h.redo();
    h.breakCoalescing();
    h.commit('14', 'radius');
    expect(h.undo()).toBe('13.5');
  });

  it('does not coalesce edits of different fields', () => {
    const h = new EditHistory('start');
    h.commit('r', 'radius');
    h.commit('rl', 'length');
    expect(h.undo()).toBe('r');
  });

  it('keeps at most the given number of steps', () => {
    const h = new EditHistory(0, 3);
    for (let i = 1; i <= 5; i++) h.commit(i);
    expect([h.undo(), h.undo(), h.undo(), h.undo()]).toEqual([4, 3, 2, null]);
  });
});
