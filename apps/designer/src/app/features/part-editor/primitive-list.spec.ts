import { TestBed } from '@angular/core/testing';
import type { DraftPrimitive } from './draft-document';
import { PrimitiveList, type MoveRequest } from './primitive-list';

const PRIMITIVES: DraftPrimitive[] = [
  { id: 'grip', shape: 'cylinder', mode: 'add' },
  { id: 'bore', shape: 'cylinder', mode: 'remove' },
  { id: 'tape', shape: 'point' },
];

describe('PrimitiveList', () => {
  async function render(readonly = false) {
    const fixture = TestBed.createComponent(PrimitiveList);
    fixture.componentRef.setInput('primitives', PRIMITIVES);
    fixture.componentRef.setInput('selectedIndex', 1);
    fixture.componentRef.setInput('readonly', readonly);
    fixture.componentRef.setInput('issues', { 'primitives[2].mass': 'must be greater than zero' });
    const moves: MoveRequest[] = [];
    const selections: number[] = [];
    fixture.componentInstance.moved.subscribe((m) => moves.push(m));
    fixture.componentInstance.selected.subscribe((i) => selections.push(i));
    await fixture.whenStable();
    const host: HTMLElement = fixture.nativeElement;
    const rowButton = (i: number) => host.querySelectorAll<HTMLElement>('[data-testid="primitive-select"]')[i];
    const key = (i: number, k: string, altKey = false) =>
      rowButton(i).dispatchEvent(new KeyboardEvent('keydown', { key: k, altKey, bubbles: true }));
    return { fixture, host, moves, selections, key };
  }

  it('marks the selected row, removal mode and rows with a problem', async () => {
    const { host } = await render();
    const rows = host.querySelectorAll('[data-testid="primitive-row"]');
    expect(rows[1].querySelector('[aria-current="true"]')).not.toBeNull();
    expect(rows[1].textContent).toContain('removes');
    expect(rows[2].querySelector('.tw-issue')).not.toBeNull();
    expect(rows[0].querySelector('.tw-issue')).toBeNull();
    // A point mass has no add/remove switch.
    expect(rows[2].querySelector('[data-testid="primitive-mode"]')).toBeNull();
  });

  it('selects with the arrow keys and moves with Alt+arrow, announcing the move', async () => {
    const { fixture, host, moves, selections, key } = await render();
    key(1, 'ArrowDown');
    key(1, 'ArrowUp');
    expect(selections).toEqual([2, 0]);
    key(1, 'ArrowUp', true);
    key(0, 'ArrowUp', true); // already first: nothing
    expect(moves).toEqual([{ index: 1, offset: -1 }]);
    await fixture.whenStable();
    expect(host.querySelector('[aria-live="polite"]')!.textContent).toContain('Moved bore to place 1 of 3.');
  });

  it('moves with the buttons and disables them at the ends', async () => {
    const { host, moves } = await render();
    const up = host.querySelectorAll<HTMLButtonElement>('[data-testid="primitive-up"]');
    const down = host.querySelectorAll<HTMLButtonElement>('[data-testid="primitive-down"]');
    expect(up[0].disabled).toBe(true);
    expect(down[2].disabled).toBe(true);
    down[0].click();
    expect(moves).toEqual([{ index: 0, offset: 1 }]);
  });

  it('offers no editing buttons and no keyboard moves when read-only', async () => {
    const { host, moves, key } = await render(true);
    expect(host.querySelector('[data-testid="primitive-delete"]')).toBeNull();
    key(1, 'ArrowUp', true);
    expect(moves).toEqual([]);
  });
});
