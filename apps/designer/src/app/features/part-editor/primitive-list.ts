import { ChangeDetectionStrategy, Component, ElementRef, inject, input, output, signal } from '@angular/core';
import { MatIconButton } from '@angular/material/button';
import { MatTooltip } from '@angular/material/tooltip';
import type { FieldIssues } from './document-issues';
import type { DraftPrimitive } from './draft-document';
import { shapeLabel } from './primitive-fields';

/** A request to move a primitive by some places. */
export interface MoveRequest {
  index: number;
  offset: number;
}

/**
 * The primitives of the part in document order. Arrow keys change the selection; Alt+Arrow keys
 * (or the buttons) move the selected primitive; each row duplicates, deletes and switches between
 * adding and removing material.
 */
@Component({
  selector: 'tw-primitive-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIconButton, MatTooltip],
  templateUrl: './primitive-list.html',
  styleUrl: './primitive-list.scss',
})
export class PrimitiveList {
  /** The primitives. */
  readonly primitives = input.required<readonly DraftPrimitive[]>();
  /** Index of the selected one. */
  readonly selectedIndex = input(-1);
  /** Problems by JSON path (rows with a problem are marked). */
  readonly issues = input<FieldIssues>({});
  /** Hides the editing buttons. */
  readonly readonly = input(false);
  /** Emitted to select a primitive. */
  readonly selected = output<number>();
  /** Emitted to move a primitive. */
  readonly moved = output<MoveRequest>();
  /** Emitted to duplicate a primitive. */
  readonly duplicated = output<number>();
  /** Emitted to delete a primitive. */
  readonly removed = output<number>();
  /** Emitted to switch a primitive between adding and removing material. */
  readonly modeSwitched = output<{ index: number; mode: 'add' | 'remove' }>();

  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  /** What the last keyboard move did, for screen readers. */
  protected readonly announcement = signal('');

  /** The shape's name on screen. */
  protected shapeName(shape: string): string {
    return shapeLabel(shape);
  }

  /** Whether the schema or the server found a problem in the primitive at `index`. */
  protected hasIssue(index: number): boolean {
    const prefix = `primitives[${index}]`;
    return Object.keys(this.issues()).some((path) => path === prefix || path.startsWith(`${prefix}.`));
  }

  /** Arrow keys select; Alt+Arrow keys move the primitive. */
  protected handleKey(event: KeyboardEvent, index: number): void {
    const offset = event.key === 'ArrowUp' ? -1 : event.key === 'ArrowDown' ? 1 : 0;
    if (!offset) return;
    event.preventDefault();
    const target = index + offset;
    if (target < 0 || target >= this.primitives().length) return;
    if (event.altKey && !this.readonly()) this.move(index, offset);
    else {
      this.selected.emit(target);
      this.focusRow(target);
    }
  }

  /** Moves a primitive and keeps the focus on it. */
  protected move(index: number, offset: number): void {
    const target = index + offset;
    if (target < 0 || target >= this.primitives().length) return;
    const id = this.primitives()[index].id;
    this.moved.emit({ index, offset });
    this.announcement.set(`Moved ${id} to place ${target + 1} of ${this.primitives().length}.`);
    this.focusRow(target);
  }

  /** Selects the primitive at `index`. */
  protected select(index: number): void {
    this.selected.emit(index);
  }

  /** Duplicates the primitive at `index`. */
  protected duplicate(index: number): void {
    this.duplicated.emit(index);
  }

  /** Deletes the primitive at `index`. */
  protected remove(index: number): void {
    this.removed.emit(index);
  }

  /** Switches the primitive between adding and removing material. */
  protected switchMode(index: number, primitive: DraftPrimitive): void {
    this.modeSwitched.emit({ index, mode: primitive['mode'] === 'remove' ? 'add' : 'remove' });
  }

  private focusRow(index: number): void {
    queueMicrotask(() => setTimeout(() => this.host.nativeElement.querySelector<HTMLElement>(`[data-row-index="${index}"]`)?.focus()));
  }
}
